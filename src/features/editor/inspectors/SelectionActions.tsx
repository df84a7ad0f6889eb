import { useId, useState } from 'react';
import { Copy, FlipHorizontal2, Grid3x3, RotateCw, Trash2 } from 'lucide-react';
import type { Axis } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import { Button } from '@/components/ui';
import { arrayPartsCommand, mirrorPartsCommand, rotatePartsCommand } from '../commands/selectionCommands';
import { executeAndSelectAdded, useSelectionActions } from '../hooks/useSelectionActions';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { InspectorSection, InspectorSelect } from './InspectorSection';
import { LengthInput } from './LengthInput';

const AXES: Axis[] = ['x', 'y', 'z'];

/** Actions on the selected parts: duplicate, mirror, array, quarter turns and delete — each one undoable command. */
export function SelectionActions({ ids }: { ids: string[] }) {
  const store = useEditorStoreApi();
  const units = useEditorStore((state) => state.units);
  const { deleteSelection, duplicateSelection } = useSelectionActions();
  const mirrorAxisId = useId();
  const mirrorThroughId = useId();
  const arrayAxisId = useId();
  const countId = useId();
  const [mirrorAxis, setMirrorAxis] = useState<Axis>('x');
  const [mirrorThrough, setMirrorThrough] = useState<'frame' | 'selection'>('frame');
  const [keepOriginal, setKeepOriginal] = useState(true);
  const [arrayAxis, setArrayAxis] = useState<Axis>('x');
  const [countText, setCountText] = useState('3');
  const [spacing, setSpacing] = useState(200);
  const [arrayError, setArrayError] = useState<string | null>(null);

  const runArray = () => {
    const total = Number(countText);
    if (!Number.isInteger(total) || total < 2) return setArrayError('Enter a whole number of 2 or more (the originals count as the first).');
    if (total > 500) return setArrayError('An array is limited to 500 in all.');
    setArrayError(null);
    if (!executeAndSelectAdded(store, arrayPartsCommand(ids, total, arrayAxis, spacing))) {
      setArrayError(store.getState().lastRefusal?.message ?? 'The array was refused.');
    }
  };

  return (
    <>
      <InspectorSection title="Copy and remove">
        <div className="grid grid-cols-2 gap-2">
          <Button icon={<Copy aria-hidden className="size-4" />} onClick={duplicateSelection} title="Duplicate (Ctrl+D)">
            Duplicate
          </Button>
          <Button variant="secondary" className="text-severity-error" icon={<Trash2 aria-hidden className="size-4" />} onClick={deleteSelection} title="Delete (Delete)">
            Delete
          </Button>
        </div>
      </InspectorSection>
      <InspectorSection title="Mirror">
        <div className="grid grid-cols-2 gap-2">
          <InspectorSelect id={mirrorAxisId} label="Across the plane normal to" value={mirrorAxis} onChange={(value) => setMirrorAxis(value as Axis)}>
            {AXES.map((axis) => (
              <option key={axis} value={axis}>
                {axis.toUpperCase()}
              </option>
            ))}
          </InspectorSelect>
          <InspectorSelect id={mirrorThroughId} label="Through the centre of" value={mirrorThrough} onChange={(value) => setMirrorThrough(value as 'frame' | 'selection')}>
            <option value="frame">the frame</option>
            <option value="selection">the selection</option>
          </InspectorSelect>
        </div>
        <label className="flex min-h-11 items-center gap-2 text-sm text-ink">
          <input type="checkbox" className="size-4 accent-accent" checked={keepOriginal} onChange={(event) => setKeepOriginal(event.target.checked)} />
          Keep the originals (mirror a copy)
        </label>
        <Button
          icon={<FlipHorizontal2 aria-hidden className="size-4" />}
          onClick={() => executeAndSelectAdded(store, mirrorPartsCommand(store.getState().design, ids, mirrorAxis, mirrorThrough, keepOriginal))}
        >
          Mirror
        </Button>
      </InspectorSection>
      <InspectorSection title="Row of copies">
        <div className="grid grid-cols-3 gap-2">
          <div className="flex flex-col gap-1">
            <label htmlFor={countId} className="text-xs font-medium text-ink-soft">
              How many in all
            </label>
            <input
              id={countId}
              inputMode="numeric"
              value={countText}
              aria-invalid={arrayError ? true : undefined}
              onChange={(event) => setCountText(event.target.value)}
              className="min-h-11 w-full rounded-lg border border-paper-line bg-paper-raised px-2.5 text-right text-sm tabular-nums focus-ring aria-[invalid=true]:border-severity-error"
            />
          </div>
          <LengthInput compact label="Spacing" valueMm={spacing} units={units} onCommit={(mm) => setSpacing(mm)} />
          <InspectorSelect id={arrayAxisId} label="Along" value={arrayAxis} onChange={(value) => setArrayAxis(value as Axis)}>
            {AXES.map((axis) => (
              <option key={axis} value={axis}>
                {axis.toUpperCase()}
              </option>
            ))}
          </InspectorSelect>
        </div>
        {arrayError ? (
          <p role="alert" className="text-xs text-severity-error">
            <span className="font-semibold">Not made: </span>
            {arrayError}
          </p>
        ) : null}
        <Button icon={<Grid3x3 aria-hidden className="size-4" />} onClick={runArray}>
          Make {countText || '…'} in a row, {formatLength(spacing, units)} apart
        </Button>
      </InspectorSection>
      <InspectorSection title="Quarter turn">
        <div className="grid grid-cols-3 gap-2">
          {AXES.map((axis) => (
            <Button
              key={axis}
              icon={<RotateCw aria-hidden className="size-4" />}
              title={`Turn 90° about the ${axis.toUpperCase()} axis through the selection's centre`}
              onClick={() => store.getState().execute(rotatePartsCommand(store.getState().design, ids, axis))}
            >
              {axis.toUpperCase()}
            </Button>
          ))}
        </div>
      </InspectorSection>
    </>
  );
}
