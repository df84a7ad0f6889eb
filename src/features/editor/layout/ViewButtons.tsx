import { Maximize } from 'lucide-react';
import { useEditorStore } from '../store/editorStore';
import type { EditorView } from '../store/types';
import { ToolbarButton } from './ToolbarButton';

const VIEWS: { view: EditorView; label: string; key: string }[] = [
  { view: 'front', label: 'Front', key: '1' },
  { view: 'top', label: 'Top', key: '2' },
  { view: 'side', label: 'Side', key: '3' },
  { view: 'iso', label: 'Angle', key: '4' },
];

/** Camera presets and "fit all"; the scene turns the camera when the request's nonce changes. */
export function ViewButtons() {
  const requestView = useEditorStore((state) => state.requestView);
  const requestFrame = useEditorStore((state) => state.requestFrame);
  const lastView = useEditorStore((state) => state.viewRequest?.view);
  return (
    <div className="flex items-center gap-0.5" role="group" aria-label="Camera">
      {VIEWS.map(({ view, label, key }) => (
        <ToolbarButton
          key={view}
          icon={null}
          label={label}
          title={`${label} view (${key})`}
          pressed={lastView === view}
          className="px-2"
          onClick={() => requestView(view)}
        />
      ))}
      <ToolbarButton icon={<Maximize aria-hidden className="size-4" />} label="Fit" title="Fit everything in view (F)" onClick={() => requestFrame('all')} />
    </div>
  );
}
