import { Link, useLocation } from 'react-router';
import { SearchX } from 'lucide-react';
import { EmptyState } from '@/components/ui';

export default function NotFoundPage() {
  const { pathname } = useLocation();
  return (
    <div className="px-4 py-10 md:px-8">
      <h1 className="sr-only">Page not found</h1>
      <EmptyState
        icon={<SearchX className="size-7" />}
        title="Nothing lives at this address"
        action={
          <Link to="/" className="inline-flex min-h-11 items-center rounded-lg bg-accent px-4 text-sm font-medium text-accent-ink hover:bg-accent-strong focus-ring">
            Go to the start page
          </Link>
        }
      >
        <p>
          Slotwise has no page at <code className="rounded bg-paper-sunk px-1.5 py-0.5 text-ink">{pathname}</code>. The link may be
          mistyped, or the design it pointed to was deleted.
        </p>
      </EmptyState>
    </div>
  );
}
