import type { ReactNode } from 'react';

/** A titled card on the account page. */
export function Section({ id, title, description, children }: { id: string; title: string; description?: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-4 rounded-card border border-paper-line bg-paper-raised p-6">
      <div className="flex flex-col gap-1">
        <h2 id={id} className="text-lg font-semibold text-ink">
          {title}
        </h2>
        {description ? <p className="text-sm text-ink-soft">{description}</p> : null}
      </div>
      {children}
    </section>
  );
}

/** A short confirmation at the point of action ("Saved."). */
export function SavedNote({ children }: { children: ReactNode }) {
  return (
    <p role="status" className="text-sm font-medium text-severity-ok">
      {children}
    </p>
  );
}
