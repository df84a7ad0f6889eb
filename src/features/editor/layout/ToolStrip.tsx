import { MousePointer2, PencilLine, Ruler, SquareDashed, WandSparkles } from 'lucide-react';
import { TOOL_SHORTCUTS, withKey } from '../hooks/shortcutList';
import { useEditorStore } from '../store/editorStore';
import type { EditorTool } from '../store/types';
import { ToolbarButton } from './ToolbarButton';

const ICONS: Record<EditorTool, typeof MousePointer2> = { select: MousePointer2, 'draw-profile': PencilLine, 'fill-opening': SquareDashed, measure: Ruler };

/** The left strip: the editing tools, then the frame starters. Names and keys come from the shortcut list. */
export function ToolStrip({ onOpenGenerators }: { onOpenGenerators: () => void }) {
  const tool = useEditorStore((state) => state.tool);
  const setTool = useEditorStore((state) => state.setTool);
  return (
    <nav aria-label="Editing tools" className="flex w-16 shrink-0 flex-col items-stretch gap-1 border-r border-paper-line bg-paper-raised p-1 lg:w-[72px] lg:p-1.5">
      {TOOL_SHORTCUTS.map(({ tool: id, label, key, action }) => {
        const Icon = ICONS[id];
        return (
          <ToolbarButton
            key={id}
            layout="stack"
            icon={<Icon aria-hidden className="size-5" />}
            label={label}
            title={withKey(action, key)}
            aria-keyshortcuts={key}
            pressed={tool === id}
            onClick={() => setTool(id)}
          />
        );
      })}
      <div className="my-1 border-t border-paper-line" />
      <ToolbarButton
        layout="stack"
        icon={<WandSparkles aria-hidden className="size-5" />}
        label="Frame starters"
        title="Start from a box frame, table, shelf unit, cabinet or enclosure"
        onClick={onOpenGenerators}
      />
    </nav>
  );
}
