import { CloudOff, RefreshCw } from 'lucide-react';
import { pluralize } from '@/lib/format';
import type { BuildProgress } from '../hooks/useBuildProgress';

/** Says plainly when the page is offline and what is waiting to be sent. */
export function ConnectionBanner({ progress }: { progress: BuildProgress }) {
  const offline = !progress.online || progress.unreachable;
  if (!offline && progress.waiting.length === 0) return null;
  return (
    <div role="status" data-testid="connection-banner" className="flex items-center gap-3 rounded-lg border border-severity-warning bg-severity-warning-soft px-4 py-3 text-sm text-ink">
      {offline ? <CloudOff aria-hidden className="size-5 shrink-0" /> : <RefreshCw aria-hidden className="size-5 shrink-0 animate-spin" />}
      <p>
        {offline ? <strong>Offline. </strong> : <strong>Sending… </strong>}
        {progress.waiting.length > 0
          ? `${pluralize(progress.waiting.length, 'tick')} waiting to sync: ${progress.waiting.map((item) => `${item.kind} ${item.itemKey.split(':').slice(-1)[0]}`).slice(0, 4).join(', ')}${progress.waiting.length > 4 ? '…' : ''}.`
          : 'Nothing is waiting to sync.'}
        {offline ? ' Your ticks are kept on this device and sent when the connection returns.' : ''}
      </p>
    </div>
  );
}
