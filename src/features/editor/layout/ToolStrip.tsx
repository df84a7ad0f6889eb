import { MousePointer2, PencilLine, SquareDashed, WandSparkles } from 'lucide-react';
import { useEditorStore } from '../store/editorStore';
import type { EditorTool } from '../store/types';
import { ToolbarButton } from './ToolbarButton';

const TOOLS: { tool: EditorTool; label: string; key: string; icon: typeof MousePointer2; hint: string }[] = [
  { tool: 'select', label: 'Pick', key: 'V', icon: MousePointer2, hint: 'Pick and move parts (V)' },
  { tool: 'draw-profile', label: 'Draw', key: 'D', icon: PencilLine, hint: 'Draw a profile between two points (D)' },
  { tool: 'fill-opening', label: 'Fill', key: 'O', icon: SquareDashed, hint: 'Fill a frame opening with a panel (O)' },
];

/** The left strip: the editing tools, then the frame starters. */
export function ToolStrip({ onOpenGenerators }: { onOpenGenerators: () => void }) {
  const tool = useEditorStore((state) => state.tool);
  const setTool = useEditorStore((state) => state.setTool);
  return (
    <nav aria-label="Editing tools" className="flex w-[72px] shrink-0 flex-col items-stretch gap-1 border-r border-paper-line bg-paper-raised p-1.5">
      {TOOLS.map(({ tool: id, label, icon: Icon, hint }) => (
        <ToolbarButton
          key={id}
          layout="stack"
          icon={<Icon aria-hidden className="size-5" />}
          label={label}
          title={hint}
          pressed={tool === id}
          onClick={() => setTool(id)}
        />
      ))}
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
