import { GraduationCap } from 'lucide-react';
import { EmptyState, PageFrame, PageHeader } from '@/components/ui';

export default function ClassesPage() {
  return (
    <PageFrame>
      <PageHeader title="Classes" description="Read-only links you publish for your students." />
      <EmptyState icon={<GraduationCap className="size-7" />} title="No class links yet">
        Read-only links you publish for a class will be listed here, with how often students open them. Students follow a link to view the model and step through the build without signing in.
      </EmptyState>
    </PageFrame>
  );
}
