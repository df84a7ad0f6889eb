import { CircleExclamationPoint, RotateCw } from 'lucide-react';
import { Button } from './Button';

/** A refused or failed request, in words, with a retry when one makes sense. */
export function ErrorNotice({ title = 'Error', message, onRetry }: { title?: string; message: string; onRetry?: () => void }) {
  return (
    <div role="alert" className="flex flex-wrap items-start gap-3 rounded-card border border-severity-error/40 bg-severity-error-soft p-4 text-sm text-ink">
      <CircleExclamationPoint aria-hidden className="mt-0.5 size-5 shrink-0 text-severity-error" />
      <div className="flex min-w-0 flex-1 flex-col gap-1">
        <p className="font-semibold text-severity-error">{title}</p>
        <p>{message}</p>
      </div>
      {onRetry ? (
        <Button variant="secondary" icon={<RotateCw aria-hidden className="size-4" />} onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}
