import { useEffect, useState } from 'react';
import { CircleAlert, X } from 'lucide-react';
import { useEditorStore } from '../store/editorStore';

/** Says why the last edit was refused, at the bottom of the model, until dismissed or a few seconds pass. */
export function RefusalNotice() {
  const refusal = useEditorStore((state) => state.lastRefusal);
  const [hiddenNonce, setHiddenNonce] = useState<number | null>(null);
  useEffect(() => {
    if (!refusal) return;
    const timer = setTimeout(() => setHiddenNonce(refusal.nonce), 8000);
    return () => clearTimeout(timer);
  }, [refusal]);
  if (!refusal || hiddenNonce === refusal.nonce) return null;
  return (
    <div role="alert" className="absolute bottom-3 left-1/2 z-10 flex max-w-lg -translate-x-1/2 items-start gap-2 rounded-card border border-severity-error/40 bg-severity-error-soft px-3 py-2 text-sm text-ink shadow-md">
      <CircleAlert aria-hidden className="mt-0.5 size-4 shrink-0 text-severity-error" />
      <p>
        <span className="font-semibold text-severity-error">Not applied: </span>
        {refusal.label}. {refusal.message}
      </p>
      <button type="button" aria-label="Dismiss" onClick={() => setHiddenNonce(refusal.nonce)} className="-m-1 grid size-8 place-items-center rounded focus-ring">
        <X aria-hidden className="size-4" />
      </button>
    </div>
  );
}
