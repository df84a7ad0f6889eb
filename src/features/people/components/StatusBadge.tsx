import { Check, CircleDashed } from 'lucide-react';

/** Active or deactivated, in word and icon (not colour alone). */
export function StatusBadge({ active }: { active: boolean }) {
  return active ? (
    <span className="inline-flex items-center gap-1.5 rounded-full bg-severity-ok-soft px-2.5 py-1 text-xs font-medium text-severity-ok">
      <Check aria-hidden className="size-3.5" /> Active
    </span>
  ) : (
    <span className="inline-flex items-center gap-1.5 rounded-full bg-paper-sunk px-2.5 py-1 text-xs font-medium text-ink-soft">
      <CircleDashed aria-hidden className="size-3.5" /> Deactivated
    </span>
  );
}
