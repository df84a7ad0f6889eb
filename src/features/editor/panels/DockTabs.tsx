import { useRef, type KeyboardEvent } from 'react';
import { cn } from '@/lib/cn';

export interface DockTab {
  id: string;
  label: string;
}

/** A tablist with roving tabindex: arrows, Home and End move and activate; only the active tab is tabbable. */
export function DockTabs({ tabs, active, onChange, idPrefix, label }: { tabs: DockTab[]; active: string; onChange: (id: string) => void; idPrefix: string; label: string }) {
  const refs = useRef<Record<string, HTMLButtonElement | null>>({});
  function onKeyDown(event: KeyboardEvent<HTMLButtonElement>) {
    const index = tabs.findIndex((tab) => tab.id === active);
    const target =
      event.key === 'ArrowRight' ? (index + 1) % tabs.length
      : event.key === 'ArrowLeft' ? (index - 1 + tabs.length) % tabs.length
      : event.key === 'Home' ? 0
      : event.key === 'End' ? tabs.length - 1
      : -1;
    if (target < 0) return;
    event.preventDefault();
    const next = tabs[target];
    onChange(next.id);
    refs.current[next.id]?.focus();
  }
  return (
    <div role="tablist" aria-label={label} className="flex min-w-0 flex-nowrap gap-x-1 overflow-x-auto">
      {tabs.map((tab) => {
        const selected = tab.id === active;
        return (
          <button
            key={tab.id}
            ref={(element) => {
              refs.current[tab.id] = element;
            }}
            type="button"
            role="tab"
            id={`${idPrefix}-tab-${tab.id}`}
            aria-selected={selected}
            aria-controls={`${idPrefix}-panel-${tab.id}`}
            tabIndex={selected ? 0 : -1}
            onClick={() => onChange(tab.id)}
            onKeyDown={onKeyDown}
            className={cn(
              'min-h-[44px] whitespace-nowrap rounded-t px-3 text-sm focus-visible:outline focus-visible:outline-2 focus-visible:-outline-offset-2 focus-visible:outline-accent',
              selected ? 'border-b-2 border-accent font-semibold text-accent-strong' : 'text-ink-soft hover:text-ink',
            )}
          >
            {tab.label}
          </button>
        );
      })}
    </div>
  );
}
