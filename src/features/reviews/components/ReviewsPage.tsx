import { MessagesSquare } from 'lucide-react';
import { EmptyState, PageFrame, PageHeader } from '@/components/ui';

export default function ReviewsPage() {
  return (
    <PageFrame>
      <PageHeader title="Reviews" description="Designs the shop has shared with you for comments and approval." />
      <EmptyState icon={<MessagesSquare className="size-7" />} title="Nothing has been shared with you yet">
        When the shop shares a design with you, it appears here. You will be able to turn the model around, pin comments to parts, and approve the exact revision you want built.
      </EmptyState>
    </PageFrame>
  );
}
