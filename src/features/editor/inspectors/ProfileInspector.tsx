import { useId } from 'react';
import { defaultCatalogue, getVariant } from '@/domain/catalogue';
import type { ProfileChanges } from '@/domain/design/operations';
import type { Profile, Vec3 } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import { operationCommand } from '../commands/operationCommand';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { describeDirection } from './describeDirection';
import { InspectorSection, InspectorSelect, ValueRow } from './InspectorSection';
import { LengthInput } from './LengthInput';
import { MACHINING_NAMES } from './partNames';

const ROLLS = [0, 90, 180, 270] as const;
const AXIS_LABELS = ['X', 'Y', 'Z'] as const;

/** One profile's properties: length, start point, profile variant and roll, each change one undoable command. */
export function ProfileInspector({ profile }: { profile: Profile }) {
  const store = useEditorStoreApi();
  const units = useEditorStore((state) => state.units);
  const variantFieldId = useId();
  const rollFieldId = useId();
  const catalogue = defaultCatalogue;
  const variant = getVariant(catalogue, profile.variantId);
  const sameSystem = catalogue.variants.filter((candidate) => candidate.systemId === variant?.systemId);

  /** Runs one update; returns the refusal message for the field, if any. */
  const update = (label: string, changes: ProfileChanges): string | null => {
    const applied = store.getState().execute(operationCommand(label, { type: 'updateProfile', payload: { profileId: profile.id, changes } }));
    return applied ? null : (store.getState().lastRefusal?.message ?? 'The change was refused.');
  };

  const setStart = (axis: 0 | 1 | 2, mm: number) => {
    const start = [...profile.start] as Vec3;
    start[axis] = mm;
    return update(`Move ${profile.id} start ${AXIS_LABELS[axis]} to ${formatLength(mm, units)}`, { start });
  };

  return (
    <>
      <InspectorSection title={`Profile ${profile.label ?? formatLength(profile.length, units)}`}>
        <dl className="flex flex-col gap-1.5">
          <ValueRow name="Profile" value={variant?.name ?? profile.variantId} />
          <ValueRow name="Runs" value={describeDirection(profile.direction)} />
          {variant ? <ValueRow name="Mass" value={`${((variant.massPerMetre * profile.length) / 1000).toFixed(2)} kg`} /> : null}
        </dl>
        <LengthInput
          label="Length"
          valueMm={profile.length}
          units={units}
          onCommit={(mm) => update(`Set length of ${profile.label ?? "the profile"} to ${formatLength(mm, units)}`, { length: mm })}
          hint={units === 'in' ? 'Type 23-7/16, 23 7/16 in or 595 mm.' : 'Type 595, 595 mm or 23-7/16 in.'}
        />
      </InspectorSection>
      <InspectorSection title="Start point">
        <div className="grid grid-cols-3 gap-2">
          {AXIS_LABELS.map((axisLabel, axis) => (
            <LengthInput
              key={axisLabel}
              compact
              label={axisLabel}
              accept="any"
              valueMm={profile.start[axis]}
              units={units}
              onCommit={(mm) => setStart(axis as 0 | 1 | 2, mm)}
            />
          ))}
        </div>
      </InspectorSection>
      <InspectorSection title="Section">
        <InspectorSelect
          id={variantFieldId}
          label="Profile variant"
          value={profile.variantId}
          onChange={(variantId) => update(`Change ${profile.id} to ${getVariant(catalogue, variantId)?.name ?? variantId}`, { variantId })}
        >
          {sameSystem.map((option) => (
            <option key={option.id} value={option.id}>
              {option.name}
            </option>
          ))}
        </InspectorSelect>
        <InspectorSelect
          id={rollFieldId}
          label="Roll about its own axis"
          value={String(normaliseRoll(profile.rollDeg))}
          onChange={(value) => update(`Roll ${profile.id} to ${value}°`, { rollDeg: Number(value) })}
        >
          {ROLLS.map((roll) => (
            <option key={roll} value={roll}>
              {roll}°
            </option>
          ))}
        </InspectorSelect>
      </InspectorSection>
      {profile.machining.length > 0 ? (
        <InspectorSection title="Machining">
          <ul className="flex flex-col gap-1 text-sm">
            {profile.machining.map((operation) => (
              <li key={operation.id} className="flex justify-between gap-2">
                <span className="text-ink">{MACHINING_NAMES[operation.kind]}</span>
                <span className="text-right tabular-nums text-ink-soft">
                  {operation.kind === 'end-tap' ? `${operation.fromEnd} end` : `${formatLength(operation.offset, units)} from ${operation.fromEnd}`}
                </span>
              </li>
            ))}
          </ul>
        </InspectorSection>
      ) : null}
    </>
  );
}

function normaliseRoll(roll: number): number {
  const snapped = Math.round(roll / 90) * 90;
  return ((snapped % 360) + 360) % 360;
}
