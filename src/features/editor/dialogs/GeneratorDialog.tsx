import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { WandSparkles } from 'lucide-react';
import { Button, Dialog, DialogActions } from '@/components/ui';
import { defaultCatalogue } from '@/domain/catalogue';
import { generators, type GeneratorDefinition } from '@/domain/design/generators';
import type { DesignDocument } from '@/domain/design/schema';
import { cn } from '@/lib/cn';
import { operationCommand } from '../commands';
import { besideOffset } from '../commands/insertDesignCommand';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import type { DisplayUnits } from '../store/types';
import { defaultFormValues, generatorFields, generatorFormSchema, type GeneratorFieldSpec, type GeneratorFormValues } from './generatorFields';

type Placement = 'replace' | 'insert';

/** Frame starters: pick a parametric frame, type its sizes in your units, then replace the design or add it beside. */
export function GeneratorDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const [kind, setKind] = useState<string>(generators[0].id);
  const units = useEditorStore((state) => state.units);
  const systemId = useEditorStore((state) => state.design.systemId);
  const generator = (generators as readonly GeneratorDefinition[]).find((candidate) => candidate.id === kind) ?? generators[0];
  return (
    <Dialog open={open} title="Frame starters" description="A complete frame with joints, panels and feet, sized by you. Both choices can be undone." onClose={onClose}>
      <div role="radiogroup" aria-label="Frame kind" className="mb-3 grid grid-cols-3 gap-2">
        {(generators as readonly GeneratorDefinition[]).map((candidate) => (
          <button
            key={candidate.id}
            type="button"
            role="radio"
            aria-checked={candidate.id === kind}
            onClick={() => setKind(candidate.id)}
            title={candidate.description}
            className={cn(
              'min-h-11 rounded-lg border px-3 py-2 text-left text-sm focus-ring',
              candidate.id === kind ? 'border-accent bg-accent-soft font-medium text-accent-strong' : 'border-paper-line hover:bg-paper-sunk',
            )}
          >
            {candidate.name}
          </button>
        ))}
      </div>
      <GeneratorForm key={`${kind}:${units}`} generator={generator} units={units} systemId={systemId} onDone={onClose} />
    </Dialog>
  );
}

function GeneratorForm({ generator, units, systemId, onDone }: { generator: GeneratorDefinition; units: DisplayUnits; systemId: string; onDone: () => void }) {
  const store = useEditorStoreApi();
  const hasParts = useEditorStore((state) => state.design.profiles.length + state.design.panels.length > 0);
  const [placement, setPlacement] = useState<Placement>(hasParts ? 'insert' : 'replace');
  const [failure, setFailure] = useState<string | null>(null);
  const fields = useMemo(() => generatorFields(generator), [generator]);
  const schema = useMemo(() => generatorFormSchema(generator, fields, units), [generator, fields, units]);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<GeneratorFormValues>({
    defaultValues: defaultFormValues(generator, fields, units, systemId),
    resolver: zodResolver(schema as never),
    mode: 'onSubmit',
    reValidateMode: 'onChange',
  });

  const onSubmit = handleSubmit((params) => {
    let generated: DesignDocument;
    try {
      generated = generator.generate(params as never, defaultCatalogue);
    } catch (error) {
      return setFailure(error instanceof Error ? error.message : 'The frame could not be made from these sizes.');
    }
    const current = store.getState().design;
    // One command: the starter runs as a frame group that keeps its parameters, so it can be resized later.
    const command = operationCommand(placement === 'replace' ? `Replace with a ${generator.name.toLowerCase()}` : `Add a ${generator.name.toLowerCase()}`, {
      type: 'addFrameGroup',
      payload: {
        group: {
          generatorId: generator.id,
          params: jsonParams(params),
          placement: placement === 'replace' ? 'replace' : 'beside',
          ...(placement === 'replace' ? {} : { origin: besideOffset(current, generated) }),
        },
      },
    });
    if (!store.getState().execute(command)) return setFailure(store.getState().lastRefusal?.message ?? 'The frame could not be added.');
    store.getState().clearSelection();
    store.getState().setTool('select');
    store.getState().requestFrame('all');
    onDone();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <p className="text-xs text-ink-soft">{generator.description}</p>
      {/* The sizes scroll inside the dialog so its buttons stay on screen at 1440 × 900 and below. */}
      <div className="grid max-h-[min(40vh,360px)] grid-cols-2 gap-3 overflow-y-auto pr-1" data-testid="generator-fields">
        {fields.map((field) => (
          <GeneratorField key={field.name} field={field} register={register} error={errors[field.name]?.message as string | undefined} />
        ))}
      </div>
      <fieldset className="flex flex-row flex-wrap gap-x-4">
        <legend className="text-sm font-medium text-ink">Where it goes</legend>
        <label className="flex min-h-11 items-center gap-2 text-sm">
          <input type="radio" name="placement" className="size-4 accent-accent" checked={placement === 'replace'} onChange={() => setPlacement('replace')} />
          Replace the design
        </label>
        <label className="flex min-h-11 items-center gap-2 text-sm">
          <input type="radio" name="placement" className="size-4 accent-accent" checked={placement === 'insert'} onChange={() => setPlacement('insert')} />
          Add it beside
        </label>
      </fieldset>
      {failure ? (
        <p role="alert" className="text-sm text-severity-error">
          {failure}
        </p>
      ) : null}
      <DialogActions>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" pending={isSubmitting} icon={<WandSparkles aria-hidden className="size-4" />}>
          {placement === 'replace' ? 'Replace design' : 'Add frame'}
        </Button>
      </DialogActions>
    </form>
  );
}

/** Starter parameters as plain JSON values (mm, counts, ids, switches). */
export function jsonParams(params: Record<string, unknown>): Record<string, number | string | boolean | null> {
  const out: Record<string, number | string | boolean | null> = {};
  for (const [key, value] of Object.entries(params)) {
    if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean' || value === null) out[key] = value;
  }
  return out;
}

export function GeneratorField({
  field,
  register,
  error,
  idPrefix = 'generator',
}: {
  field: GeneratorFieldSpec;
  register: ReturnType<typeof useForm<GeneratorFormValues>>['register'];
  error?: string;
  idPrefix?: string;
}) {
  const id = `${idPrefix}-${field.name}`;
  const errorId = `${id}-error`;
  const describedBy = error ? errorId : undefined;
  const control =
    field.type === 'check' ? (
      <label htmlFor={id} className="flex min-h-11 items-center gap-2 text-sm text-ink">
        <input id={id} type="checkbox" className="size-4 accent-accent" aria-describedby={describedBy} {...register(field.name)} />
        {field.label}
      </label>
    ) : field.type === 'select' ? (
      <select id={id} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className="min-h-11 w-full rounded-lg border border-paper-line bg-paper-raised px-2 text-sm focus-ring" {...register(field.name)}>
        {field.options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    ) : (
      <input
        id={id}
        type="text"
        inputMode={field.type === 'count' ? 'numeric' : 'decimal'}
        autoComplete="off"
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cn(
          'min-h-11 w-full rounded-lg border border-paper-line bg-paper-raised px-2.5 text-sm text-ink focus-ring aria-[invalid=true]:border-severity-error',
          'text-right tabular-nums',
        )}
        {...register(field.name)}
      />
    );
  return (
    <div className={cn('flex flex-col gap-1', field.type === 'check' && 'justify-end')}>
      {field.type === 'check' ? null : (
        <label htmlFor={id} className="text-xs font-medium text-ink-soft">
          {field.label}
        </label>
      )}
      {control}
      {error ? (
        <p id={errorId} role="alert" className="text-xs text-severity-error">
          {error}
        </p>
      ) : null}
    </div>
  );
}
