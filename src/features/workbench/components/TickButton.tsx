import { Check } from 'lucide-react';
import { cn } from '@/lib/cn';

export interface TickButtonProps {
  done: boolean;
  label: string;
  onToggle: () => void;
  disabled?: boolean;
}

/** A 44 px tick box for gloves and arm's length: the whole square toggles. */
export function TickButton({ done, label, onToggle, disabled }: TickButtonProps) {
  return (
    <button
      type="button"
      role="checkbox"
      aria-checked={done}
      aria-label={label}
      disabled={disabled}
      onClick={onToggle}
      className={cn(
        'grid size-11 shrink-0 place-items-center rounded-lg border-2 focus-ring disabled:opacity-50',
        done ? 'border-accent bg-accent text-accent-ink' : 'border-paper-line bg-paper-raised text-transparent hover:border-accent',
      )}
    >
      <Check aria-hidden className="size-6" strokeWidth={3} />
    </button>
  );
}
