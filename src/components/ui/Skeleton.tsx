import { cn } from '@/lib/cn';

/** A calm grey block standing in for content that is loading. */
export function Skeleton({ className }: { className?: string }) {
  return <div aria-hidden className={cn('animate-pulse rounded-md bg-paper-sunk', className)} />;
}

/** A page-shaped placeholder used while a route's code or data loads. */
export function PageSkeleton({ label = 'Loading page' }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex flex-col gap-6 p-6 md:p-8">
      <span className="sr-only">{label}…</span>
      <Skeleton className="h-9 w-56" />
      <Skeleton className="h-5 w-96 max-w-full" />
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2 xl:grid-cols-3">
        {[0, 1, 2].map((key) => (
          <Skeleton key={key} className="h-56" />
        ))}
      </div>
    </div>
  );
}
