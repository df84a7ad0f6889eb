import { useState } from 'react';
import { PanelRightClose, PanelRightOpen } from 'lucide-react';
import { InspectorContent } from '../inspectors/InspectorContent';
import { PartsList } from '../inspectors/PartsList';
import { isNarrowWindow } from './outputsSize';
import { ToolbarButton } from './ToolbarButton';

/** The right column: the inspector for whatever is selected (or the tool in use); folds away to give the model room. */
export function InspectorColumn() {
  const [open, setOpen] = useState(() => !isNarrowWindow());
  if (!open) {
    return (
      <aside aria-label="Inspector" className="flex w-14 shrink-0 flex-col items-center border-l border-paper-line bg-paper-raised py-2">
        <ToolbarButton icon={<PanelRightOpen aria-hidden className="size-5" />} label="Show inspector" iconOnly onClick={() => setOpen(true)} />
      </aside>
    );
  }
  return (
    <aside aria-label="Inspector" className="flex w-[300px] shrink-0 flex-col border-l border-paper-line bg-paper-raised xl:w-[340px]">
      <div className="flex items-center justify-between border-b border-paper-line py-1 pl-4 pr-1">
        <h2 className="text-sm font-semibold text-ink">Inspector</h2>
        <ToolbarButton icon={<PanelRightClose aria-hidden className="size-5" />} label="Hide inspector" iconOnly onClick={() => setOpen(false)} />
      </div>
      <PartsList />
      <div className="min-h-0 flex-1 overflow-y-auto">
        <InspectorContent />
      </div>
    </aside>
  );
}
