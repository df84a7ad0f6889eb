import { forwardRef, type ComponentProps, type ReactNode } from 'react';
import { cn } from '@/lib/cn';

export interface ToolbarButtonProps extends ComponentProps<'button'> {
  icon: ReactNode;
  /** Visible text beside (or under, in a strip) the icon. */
  label: string;
  /** Hide the text visually (it stays the accessible name); use only where the icon is plain. */
  iconOnly?: boolean;
  pressed?: boolean;
  layout?: 'row' | 'stack';
}

/** A 44 px toolbar control with an icon, a label and a tooltip; `pressed` marks the active tool or view. */
export const ToolbarButton = forwardRef<HTMLButtonElement, ToolbarButtonProps>(function ToolbarButton(
  { icon, label, iconOnly = false, pressed, layout = 'row', className, title, ...rest },
  ref,
) {
  return (
    <button
      ref={ref}
      type="button"
      title={title ?? label}
      aria-pressed={pressed}
      aria-label={iconOnly ? label : undefined}
      className={cn(
        'inline-flex min-h-11 min-w-11 items-center justify-center rounded-lg text-ink-soft transition-colors focus-ring',
        'hover:bg-paper-sunk hover:text-ink disabled:cursor-not-allowed disabled:opacity-40 disabled:hover:bg-transparent',
        layout === 'stack' ? 'w-full flex-col gap-0.5 px-1 py-1.5 text-[11px] font-medium leading-tight' : 'gap-1.5 px-2.5 text-sm',
        pressed && 'bg-accent-soft text-accent-strong hover:bg-accent-soft hover:text-accent-strong',
        className,
      )}
      {...rest}
    >
      {icon}
      {iconOnly ? null : <span>{label}</span>}
    </button>
  );
});
