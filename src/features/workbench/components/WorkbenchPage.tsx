import { Hammer } from 'lucide-react';
import { EmptyState, PageFrame, PageHeader } from '@/components/ui';

export default function WorkbenchPage() {
  return (
    <PageFrame>
      <PageHeader title="Workbench" description="Builds assigned to you, ready to cut and assemble." />
      <EmptyState icon={<Hammer className="size-7" />} title="No builds assigned to you yet">
        When a designer assigns you a build, it appears here: the parts kit with tick boxes, the cut list with machining, and the step-by-step assembly. Your progress is saved, so a second device or a second builder sees where you are.
      </EmptyState>
    </PageFrame>
  );
}
