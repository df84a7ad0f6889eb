import type { ComponentProps, ReactNode } from 'react';
import { LoaderCircle } from 'lucide-react';
import { cn } from '@/lib/cn';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';

const variantClasses: Record<Variant, string> = {
  primary: 'bg-accent text-accent-ink hover:bg-accent-strong border border-accent',
  secondary: 'bg-paper-raised text-ink border border-paper-line hover:bg-paper-sunk',
  ghost: 'bg-transparent text-ink-soft border border-transparent hover:bg-paper-sunk hover:text-ink',
  danger: 'bg-severity-error text-white border border-severity-error hover:brightness-95',
};

export interface ButtonProps extends ComponentProps<'button'> {
  variant?: Variant;
  /** Shows a spinner and blocks clicks while an action runs. */
  pending?: boolean;
  icon?: ReactNode;
}

/** The one button: 44 px tall, visible focus ring, an optional leading icon. */
export function Button({ variant = 'secondary', pending = false, icon, className, children, disabled, type = 'button', ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={cn(
        'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 text-sm font-medium transition-colors',
        'disabled:cursor-not-allowed disabled:opacity-60 focus-ring',
        variantClasses[variant],
        className,
      )}
      {...rest}
    >
      {pending ? <LoaderCircle aria-hidden className="size-4 animate-spin" /> : icon}
      {children}
    </button>
  );
}
