import { useEffect, useState } from 'react';
import { CircleAlert, CloudCheck, LoaderCircle } from 'lucide-react';
import { firstName, formatRelativeTime } from '@/lib/format';
import { useEditorStore } from '../store/editorStore';

/** "Saved 2 min ago by Tomasz · rev 4", "Unsaved changes" or "Saving…", refreshed every half minute. */
export function SaveStatus({ saving }: { saving: boolean }) {
  const dirty = useEditorStore((state) => state.dirty);
  const lastSaved = useEditorStore((state) => state.lastSaved);
  const baseRevision = useEditorStore((state) => state.baseRevision);
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const timer = setInterval(() => setNow(new Date()), 30_000);
    return () => clearInterval(timer);
  }, []);
  useEffect(() => setNow(new Date()), [lastSaved]);

  let icon = <CloudCheck aria-hidden className="size-4 shrink-0 text-severity-ok" />;
  let text: string;
  if (saving) {
    icon = <LoaderCircle aria-hidden className="size-4 shrink-0 animate-spin text-accent" />;
    text = 'Saving…';
  } else if (dirty) {
    icon = <CircleAlert aria-hidden className="size-4 shrink-0 text-severity-warning" />;
    text = `Unsaved changes · based on rev ${baseRevision}`;
  } else if (lastSaved) {
    const by = lastSaved.by ? ` by ${firstName(lastSaved.by)}` : '';
    text = `Saved ${formatRelativeTime(lastSaved.at, now)}${by} · rev ${lastSaved.revision}`;
  } else {
    text = `Rev ${baseRevision}`;
  }
  return (
    <p role="status" aria-live="polite" data-testid="save-status" className="flex min-w-0 items-center gap-1.5 text-xs text-ink-muted">
      {icon}
      <span className="truncate">{text}</span>
    </p>
  );
}
