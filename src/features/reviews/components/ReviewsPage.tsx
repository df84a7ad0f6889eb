import { Link } from 'react-router';
import { MessagesSquare } from 'lucide-react';
import { EmptyState, ErrorNotice, PageFrame, PageHeader, Skeleton } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { formatRelativeTime, pluralize } from '@/lib/format';
import { useReviews } from '../api/listReviews';
import { DecisionBadge } from './DecisionBadge';

export default function ReviewsPage() {
  const reviews = useReviews();
  return (
    <PageFrame>
      <PageHeader title="Reviews" description="Designs the shop has shared with you for comments and approval." />
      {reviews.isPending ? (
        <Skeleton className="h-32" />
      ) : reviews.error ? (
        <ErrorNotice title="Reviews could not be loaded" message={messageOf(reviews.error)} onRetry={() => void reviews.refetch()} />
      ) : reviews.data.length === 0 ? (
        <EmptyState icon={<MessagesSquare className="size-7" />} title="Nothing has been shared with you yet">
          When the shop shares a design with you, it appears here. You can turn the model around, pin comments to parts, and approve the exact revision you want built.
        </EmptyState>
      ) : (
        <ul aria-label="Shared designs" className="flex flex-col gap-3">
          {reviews.data.map((design) => (
            <li key={design.designId} className="rounded-card border border-paper-line bg-paper-raised p-4">
              <h2 className="text-base font-semibold">
                <Link to={`/reviews/${design.designId}`} className="text-ink underline-offset-2 hover:underline focus-ring">
                  {design.name}
                </Link>
              </h2>
              <p className="text-sm text-ink-soft">
                Revision {design.latestRevision} · updated {formatRelativeTime(design.updatedAt)} · {pluralize(design.commentCount, 'comment')}
              </p>
              <DecisionBadge decision={design.lastDecision} latestRevision={design.latestRevision} />
            </li>
          ))}
        </ul>
      )}
    </PageFrame>
  );
}
