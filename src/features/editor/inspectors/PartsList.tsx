import { useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { Search } from 'lucide-react';
import { defaultCatalogue, getVariant } from '@/domain/catalogue';
import type { DesignDocument } from '@/domain/design/schema';
import { formatLength, type LengthUnit } from '@/domain/units';
import { countOf } from '@/domain/words';
import { cn } from '@/lib/cn';
import { useEditorStore } from '../store/editorStore';
import { JOINT_KIND_NAMES } from './partNames';

type Kind = 'Profiles' | 'Panels' | 'Joints' | 'Accessories';
interface Entry {
  id: string;
  kind: Kind;
  label: string;
  detail: string;
}

const KIND_ORDER: Kind[] = ['Profiles', 'Panels', 'Joints', 'Accessories'];
const words = (text: string) => text.replace(/-/g, ' ');

/** Every part with the name people read (its label, or what it is), grouped by kind. */
export function partEntries(design: DesignDocument, units: LengthUnit): Entry[] {
  const profileLabel = new Map(design.profiles.map((p) => [p.id, p.label ?? `${getVariant(defaultCatalogue, p.variantId)?.name ?? 'Profile'}, ${formatLength(p.length, units)}`]));
  return [
    ...design.profiles.map((p): Entry => ({ id: p.id, kind: 'Profiles', label: profileLabel.get(p.id)!, detail: formatLength(p.length, units) })),
    ...design.panels.map((p): Entry => ({
      id: p.id,
      kind: 'Panels',
      label: p.label ?? `${p.role === 'panel' ? 'Panel' : p.role === 'door' ? 'Door' : 'Shelf'}, ${formatLength(p.rect.width, units)} × ${formatLength(p.rect.height, units)}`,
      detail: `${formatLength(p.thickness, units)} thick`,
    })),
    ...design.joints.map((j): Entry => ({
      id: j.id,
      kind: 'Joints',
      label: `${JOINT_KIND_NAMES[j.kind]}: ${j.members.map((m) => profileLabel.get(m.profileId) ?? 'a missing profile').join(' + ')}`,
      detail: j.quantity > 1 ? `× ${j.quantity}` : '',
    })),
    ...design.accessories.map((a): Entry => ({
      id: a.id,
      kind: 'Accessories',
      label: `${words(a.kind).replace(/^./, (c) => c.toUpperCase())}${a.profileId ? ` on ${profileLabel.get(a.profileId) ?? 'a profile'}` : ''}`,
      detail: a.quantity > 1 ? `× ${a.quantity}` : '',
    })),
  ];
}

/**
 * The parts list beside the inspector: searchable, grouped by kind, with the labels people read.
 * It selects the same parts as the 3D view and works from the keyboard: ↓ from the search box
 * enters the list, ↑/↓ move, Enter or Space selects (Shift adds), Tab goes on to the inspector.
 */
export function PartsList() {
  const design = useEditorStore((state) => state.design);
  const units = useEditorStore((state) => state.units);
  const selection = useEditorStore((state) => state.selection);
  const select = useEditorStore((state) => state.select);
  const [query, setQuery] = useState('');
  const listRef = useRef<HTMLUListElement>(null);
  const entries = useMemo(() => partEntries(design, units), [design, units]);
  const shown = useMemo(() => {
    const q = query.trim().toLowerCase();
    return q ? entries.filter((e) => e.label.toLowerCase().includes(q) || e.kind.toLowerCase().includes(q)) : entries;
  }, [entries, query]);
  const selected = new Set(selection);

  const options = () => [...(listRef.current?.querySelectorAll<HTMLElement>('[role="option"]') ?? [])];
  const move = (from: HTMLElement | null, by: number) => {
    const all = options();
    if (!all.length) return;
    const index = from ? all.indexOf(from) : -1;
    all[Math.max(0, Math.min(all.length - 1, index + by))]?.focus();
  };
  const onListKey = (event: KeyboardEvent<HTMLElement>, id: string) => {
    if (event.key === 'ArrowDown' || event.key === 'ArrowUp') {
      event.preventDefault();
      move(event.currentTarget, event.key === 'ArrowDown' ? 1 : -1);
    } else if (event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      select([id], event.shiftKey ? 'add' : 'replace');
    } else if (event.key === 'Home' || event.key === 'End') {
      event.preventDefault();
      const all = options();
      all[event.key === 'Home' ? 0 : all.length - 1]?.focus();
    }
  };

  if (entries.length === 0) return null;
  return (
    <section aria-label="Parts list" className="flex max-h-[40%] min-h-0 shrink-0 flex-col border-b border-paper-line">
      <div className="flex items-center gap-2 px-3 pb-2 pt-3">
        <h2 className="text-xs font-semibold uppercase tracking-wide text-ink-muted">Parts</h2>
        <span className="text-xs tabular-nums text-ink-muted">{countOf(entries.length, 'part')}</span>
      </div>
      <label className="mx-3 mb-2 flex min-h-10 items-center gap-2 rounded-lg border border-paper-line bg-paper px-2 focus-within:outline focus-within:outline-2 focus-within:outline-accent">
        <Search aria-hidden className="size-4 text-ink-muted" />
        <span className="sr-only">Find a part</span>
        <input
          type="search"
          value={query}
          onChange={(event) => setQuery(event.target.value)}
          onKeyDown={(event) => {
            if (event.key === 'ArrowDown') {
              event.preventDefault();
              move(null, 1);
            }
          }}
          placeholder="Find a part"
          className="min-w-0 flex-1 bg-transparent text-sm outline-none"
        />
      </label>
      <ul ref={listRef} role="listbox" aria-label="Parts" aria-multiselectable="true" className="min-h-0 flex-1 overflow-y-auto pb-2">
        {KIND_ORDER.map((kind) => {
          const group = shown.filter((e) => e.kind === kind);
          if (!group.length) return null;
          return (
            <li key={kind} role="presentation">
              <div role="presentation" className="sticky top-0 bg-paper-raised px-3 py-1 text-[11px] font-semibold uppercase tracking-wide text-ink-muted">
                {kind} <span className="tabular-nums">({group.length})</span>
              </div>
              <ul role="group" aria-label={kind}>
                {group.map((entry) => (
                  <li
                    key={entry.id}
                    role="option"
                    aria-selected={selected.has(entry.id)}
                    tabIndex={-1}
                    onClick={(event) => select([entry.id], event.shiftKey || event.ctrlKey || event.metaKey ? 'add' : 'replace')}
                    onKeyDown={(event) => onListKey(event, entry.id)}
                    className={cn(
                      'flex min-h-8 cursor-pointer items-center justify-between gap-2 px-3 py-1 text-sm text-ink hover:bg-paper-sunk focus-visible:outline focus-visible:outline-2 focus-visible:-outline-offset-2 focus-visible:outline-accent',
                      selected.has(entry.id) && 'bg-accent-soft text-accent-strong hover:bg-accent-soft',
                    )}
                  >
                    <span className="truncate">{entry.label}</span>
                    {entry.detail ? <span className="shrink-0 text-xs tabular-nums text-ink-muted">{entry.detail}</span> : null}
                  </li>
                ))}
              </ul>
            </li>
          );
        })}
        {shown.length === 0 ? <li className="px-3 py-2 text-sm text-ink-muted">No part matches “{query}”.</li> : null}
      </ul>
    </section>
  );
}
