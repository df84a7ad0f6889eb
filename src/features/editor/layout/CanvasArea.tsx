import { useEditorStore } from '../store/editorStore';
import { DrawSettingsCard } from './DrawSettingsCard';
import { EditorCanvas } from '../scene/EditorCanvas';

const TOOL_HINTS: Record<string, string> = {
  'fill-opening': 'Click a highlighted opening to fill it with a panel.',
  measure: 'Click two points to measure between them.',
};

/** The hero: the 3D view, with the active tool's settings floating at its top-left corner. */
export function CanvasArea() {
  const tool = useEditorStore((state) => state.tool);
  const hint = TOOL_HINTS[tool];
  return (
    <div className="relative min-h-0 flex-1 bg-[#e9ecea]" data-testid="editor-canvas-area">
      <EditorCanvas />
      <div className="pointer-events-none absolute left-3 top-3 flex flex-col gap-2">
        {tool === 'draw-profile' ? <DrawSettingsCard /> : null}
        {hint ? (
          <p role="status" className="rounded-lg border border-paper-line bg-paper-raised/95 px-3 py-2 text-sm text-ink shadow-sm">
            {hint}
          </p>
        ) : null}
      </div>
    </div>
  );
}

