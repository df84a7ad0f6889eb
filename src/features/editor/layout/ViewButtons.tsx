import { Maximize } from 'lucide-react';
import { SHOW_ALL, VIEW_SHORTCUTS, withKey } from '../hooks/shortcutList';
import { useEditorStore } from '../store/editorStore';
import { ToolbarButton } from './ToolbarButton';

const COVERED = 'The tables cover the model: leave full width (Esc) to turn the camera';

/**
 * Camera presets and "Show all", with the same names as the plan control; the scene turns the
 * camera when the request's nonce changes. Off while something covers the model (`covered`).
 */
export function ViewButtons({ covered = false }: { covered?: boolean }) {
  const requestView = useEditorStore((state) => state.requestView);
  const requestFrame = useEditorStore((state) => state.requestFrame);
  const lastView = useEditorStore((state) => state.viewRequest?.view);
  return (
    <div className="flex items-center gap-0.5" role="group" aria-label="Camera">
      {VIEW_SHORTCUTS.map(({ view, label, key, action }) => (
        <ToolbarButton
          key={view}
          icon={null}
          label={label}
          aria-label={view === 'iso' ? 'Three-quarter view' : undefined}
          title={covered ? COVERED : withKey(action, key)}
          disabled={covered}
          aria-keyshortcuts={key}
          pressed={lastView === view}
          className="px-2"
          onClick={() => requestView(view)}
        />
      ))}
      <ToolbarButton
        icon={<Maximize aria-hidden className="size-4" />}
        label={SHOW_ALL.label}
        title={covered ? COVERED : withKey(SHOW_ALL.action, SHOW_ALL.key)}
        disabled={covered}
        aria-keyshortcuts={SHOW_ALL.key}
        onClick={() => requestFrame('all')}
      />
    </div>
  );
}
