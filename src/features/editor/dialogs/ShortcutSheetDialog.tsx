import { Dialog } from '@/components/ui';
import { editorShortcuts, type ShortcutEntry } from '../hooks/shortcutList';

const GROUP_ORDER: ShortcutEntry['group'][] = ['Tools', 'Selection', 'History', 'View', 'File'];

/** Slotwise's own list of editor keys, grouped by what they act on. */
export function ShortcutSheetDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const shortcuts = editorShortcuts();
  return (
    <Dialog open={open} title="Editor keys" description="Keys work while the pointer or focus is in the editor, not while typing in a field." onClose={onClose}>
      <div className="flex flex-col gap-5">
        {GROUP_ORDER.map((group) => (
          <section key={group} aria-label={group}>
            <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-muted">{group}</h3>
            <dl className="flex flex-col gap-1.5">
              {shortcuts
                .filter((entry) => entry.group === group)
                .map((entry) => (
                  <div key={entry.action} className="flex items-center justify-between gap-4 text-sm">
                    <dt className="text-ink">{entry.action}</dt>
                    <dd className="flex shrink-0 gap-1">
                      {entry.keys.map((key, index) => (
                        <span key={key} className="flex items-center gap-1">
                          {index > 0 ? <span className="text-xs text-ink-muted">or</span> : null}
                          <kbd className="rounded-md border border-paper-line bg-paper-sunk px-1.5 py-0.5 font-sans text-xs font-medium text-ink">{key}</kbd>
                        </span>
                      ))}
                    </dd>
                  </div>
                ))}
            </dl>
          </section>
        ))}
      </div>
    </Dialog>
  );
}
