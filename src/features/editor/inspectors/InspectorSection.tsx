import type { ReactNode } from 'react';

/** A titled block in the inspector, on the 8 px grid. */
export function InspectorSection({ title, children, actions }: { title: string; children: ReactNode; actions?: ReactNode }) {
  return (
    <section aria-label={title} className="flex flex-col gap-3 border-b border-paper-line px-4 py-4 last:border-b-0">
      <div className="flex items-center justify-between gap-2">
        <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-muted">{title}</h3>
        {actions}
      </div>
      {children}
    </section>
  );
}

/** A small labelled native select for the inspector. */
export function InspectorSelect({
  id,
  label,
  value,
  onChange,
  children,
}: {
  id: string;
  label: string;
  value: string;
  onChange: (value: string) => void;
  children: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <select
        id={id}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        className="min-h-11 w-full rounded-lg border border-paper-line bg-paper-raised px-2.5 text-sm text-ink focus-ring"
      >
        {children}
      </select>
    </div>
  );
}

/** One "name … value" line with the value right-aligned in tabular figures. */
export function ValueRow({ name, value }: { name: string; value: ReactNode }) {
  return (
    <div className="flex items-baseline justify-between gap-3 text-sm">
      <dt className="text-ink-soft">{name}</dt>
      <dd className="text-right tabular-nums text-ink">{value}</dd>
    </div>
  );
}
