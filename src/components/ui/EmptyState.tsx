import type { ReactNode } from 'react';

export interface EmptyStateProps {
  icon: ReactNode;
  title: string;
  children: ReactNode;
  /** An optional call to action (usually a Button). */
  action?: ReactNode;
}

/** Says honestly what will appear here and, where possible, how to get there. */
export function EmptyState({ icon, title, children, action }: EmptyStateProps) {
  return (
    <section className="mx-auto flex max-w-lg flex-col items-center gap-3 rounded-card border border-dashed border-paper-line bg-paper-raised px-6 py-12 text-center">
      <div aria-hidden className="grid size-14 place-items-center rounded-full bg-accent-soft text-accent-strong">
        {icon}
      </div>
      <h2 className="text-lg font-semibold text-ink">{title}</h2>
      <div className="text-sm leading-6 text-ink-soft">{children}</div>
      {action ? <div className="mt-2">{action}</div> : null}
    </section>
  );
}
