import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { RefreshCw } from 'lucide-react';
import { Button } from '@/components/ui';
import { getGenerator } from '@/domain/design/generators';
import type { FrameGroup } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import { operationCommand } from '../commands';
import { GeneratorField, jsonParams } from '../dialogs/GeneratorDialog';
import { generatorFields, generatorFormSchema, type GeneratorFieldSpec, type GeneratorFormValues } from '../dialogs/generatorFields';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import type { DisplayUnits } from '../store/types';
import { InspectorSection } from './InspectorSection';

/** The group's parameters as form values, lengths in the person's units. */
function valuesOf(group: FrameGroup, fields: GeneratorFieldSpec[], units: DisplayUnits): GeneratorFormValues {
  const values: GeneratorFormValues = {};
  for (const field of fields) {
    const value = group.params[field.name];
    if (field.type === 'length') values[field.name] = typeof value === 'number' ? formatLength(value, units) : '';
    else if (field.type === 'count') values[field.name] = value === undefined || value === null ? '' : String(value);
    else if (field.type === 'check') values[field.name] = Boolean(value);
    else values[field.name] = value === undefined || value === null ? (field.options[0]?.value ?? '') : String(value);
  }
  return values;
}

/**
 * A frame group's parameters, editable: applying regenerates the group's parts as one undoable
 * command; parts added by hand stay where they still fit, and a finding lists the ones that do not.
 */
export function FrameGroupInspector({ group }: { group: FrameGroup }) {
  const units = useEditorStore((state) => state.units);
  const generator = getGenerator(group.generatorId);
  if (!generator) return null;
  // A new key resets the form whenever the group's parameters change (undo, another edit).
  return <FrameGroupForm key={`${group.id}:${units}:${JSON.stringify(group.params)}`} group={group} units={units} />;
}

function FrameGroupForm({ group, units }: { group: FrameGroup; units: DisplayUnits }) {
  const store = useEditorStoreApi();
  const generator = getGenerator(group.generatorId)!;
  const fields = useMemo(() => generatorFields(generator), [generator]);
  const schema = useMemo(() => generatorFormSchema(generator, fields, units), [generator, fields, units]);
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isDirty },
  } = useForm<GeneratorFormValues>({ defaultValues: valuesOf(group, fields, units), resolver: zodResolver(schema as never), mode: 'onSubmit', reValidateMode: 'onChange' });

  const onSubmit = handleSubmit((params) => {
    const ok = store.getState().execute(
      operationCommand(`Resize ${group.name}`, { type: 'regenerateFrameGroup', payload: { groupId: group.id, params: jsonParams(params as Record<string, unknown>) } }),
    );
    setFailure(ok ? null : (store.getState().lastRefusal?.message ?? 'The frame could not be made from these sizes.'));
  });

  return (
    <InspectorSection title={`Frame group: ${group.name}`}>
      <p className="text-xs text-ink-soft">
        Made by the {generator.name.toLowerCase()} starter. Change a size and apply: its parts are made again; parts you added stay where they still fit.
      </p>
      <form onSubmit={onSubmit} noValidate aria-label={`${group.name} sizes`} className="flex flex-col gap-3">
        <div className="grid grid-cols-2 gap-2">
          {fields.map((field) => (
            <GeneratorField key={field.name} field={field} register={register} error={errors[field.name]?.message as string | undefined} idPrefix={`group-${group.id}`} />
          ))}
        </div>
        {failure ? (
          <p role="alert" className="text-sm text-severity-error">
            {failure}
          </p>
        ) : null}
        <Button type="submit" variant={isDirty ? 'primary' : 'secondary'} icon={<RefreshCw aria-hidden className="size-4" />}>
          Apply sizes
        </Button>
      </form>
    </InspectorSection>
  );
}
