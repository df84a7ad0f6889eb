import { useId, useRef } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { LoadCase } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { formatLength } from '@/domain/units';
import { loadCaseFormSchema, toLoadCase, type LoadCaseFormValues, type LoadTargets } from './loadCaseFormSchema';
import { cn } from '@/lib/cn';

export interface LoadCaseFormProps {
  units: LengthUnit;
  targets: LoadTargets;
  newId: string;
  defaultName: string;
  onAdd: (loadCase: LoadCase) => void;
}

const INPUT = 'min-h-[44px] rounded border border-paper-line bg-paper-raised px-2 focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent aria-[invalid=true]:border-severity-error';

/** A new load case on the selected profile (point) or panel (uniform); errors appear beside the field. */
export function LoadCaseForm({ units, targets, newId, defaultName, onAdd }: LoadCaseFormProps) {
  const formId = useId();
  const schemaRef = useRef(loadCaseFormSchema(units, targets));
  schemaRef.current = loadCaseFormSchema(units, targets);
  // The rules depend on the current selection, so the resolver reads the latest schema at submit time.
  const resolver: Resolver<LoadCaseFormValues> = (values, context, options) =>
    zodResolver(schemaRef.current)(values, context, options) as ReturnType<Resolver<LoadCaseFormValues>>;
  const {
    register,
    handleSubmit,
    watch,
    formState: { errors },
  } = useForm<LoadCaseFormValues>({
    resolver,
    defaultValues: {
      name: defaultName,
      kind: targets.profile || !targets.panel ? 'point' : 'uniform',
      position: targets.profile ? formatLength(targets.profile.length / 2, units, { withUnit: false }) : '',
      force: '',
      support: 'simple',
      tipOverHeight: '',
    },
  });
  const kind = watch('kind');
  const forceUnit = units === 'in' ? 'lbf' : 'N';
  const lengthUnit = units === 'in' ? 'in' : 'mm';

  const submit = handleSubmit((values) => {
    onAdd(toLoadCase(newId, values, units, targets));
  });

  const field = (name: keyof LoadCaseFormValues) => ({
    id: `${formId}-${name}`,
    'aria-invalid': errors[name] ? true : undefined,
    'aria-describedby': errors[name] ? `${formId}-${name}-error` : undefined,
  });
  const errorText = (name: keyof LoadCaseFormValues) =>
    errors[name]?.message ? (
      <span id={`${formId}-${name}-error`} role="alert" className="text-xs text-severity-error">
        {errors[name]?.message}
      </span>
    ) : null;

  return (
    <form onSubmit={submit} noValidate aria-label="New load case" className="grid gap-3">
      <div className="flex flex-col gap-0.5">
        <label htmlFor={`${formId}-name`} className="text-xs text-ink-soft">Name</label>
        <input {...register('name')} {...field('name')} className={INPUT} />
        {errorText('name')}
      </div>
      <fieldset className="flex flex-col gap-0.5">
        <legend className="text-xs text-ink-soft">Load</legend>
        <div className="flex flex-col">
          <label className="flex min-h-[44px] items-center gap-1.5 text-sm">
            <input type="radio" value="point" {...register('kind')} />
            Point load on the selected profile
          </label>
          <label className="flex min-h-[44px] items-center gap-1.5 text-sm">
            <input type="radio" value="uniform" {...register('kind')} />
            Spread on the selected panel
          </label>
        </div>
        <span className="text-xs text-ink-muted">
          {kind === 'point'
            ? targets.profile
              ? `Profile ${targets.profile.label ?? targets.profile.id}, ${formatLength(targets.profile.length, units)} long`
              : 'No profile selected.'
            : targets.panel
              ? `Panel ${targets.panel.label ?? targets.panel.id}`
              : 'No panel selected.'}
        </span>
        {errorText('kind')}
      </fieldset>
      {kind === 'point' && (
        <div className="flex flex-col gap-0.5">
          <label htmlFor={`${formId}-position`} className="text-xs text-ink-soft">Position from the profile's start ({lengthUnit})</label>
          <input {...register('position')} {...field('position')} inputMode="decimal" className={cn(INPUT, 'text-right tabular-nums')} />
          {errorText('position')}
        </div>
      )}
      <div className="flex flex-col gap-0.5">
        <label htmlFor={`${formId}-force`} className="text-xs text-ink-soft">Force ({forceUnit}){kind === 'uniform' ? ', total' : ''}</label>
        <input {...register('force')} {...field('force')} inputMode="decimal" className={cn(INPUT, 'text-right tabular-nums')} />
        {errorText('force')}
      </div>
      <div className="flex flex-col gap-0.5">
        <label htmlFor={`${formId}-support`} className="text-xs text-ink-soft">Beam ends</label>
        <select {...register('support')} {...field('support')} className={INPUT}>
          <option value="simple">Simply supported (conservative)</option>
          <option value="fixed">Fixed at both ends</option>
        </select>
      </div>
      <div className="flex flex-col gap-0.5">
        <label htmlFor={`${formId}-tipOverHeight`} className="text-xs text-ink-soft">Tip-over push height above the floor ({lengthUnit}, optional)</label>
        <input {...register('tipOverHeight')} {...field('tipOverHeight')} inputMode="decimal" className={cn(INPUT, 'text-right tabular-nums')} />
        {errorText('tipOverHeight')}
      </div>
      <div>
        <button type="submit" className="min-h-[44px] rounded bg-accent px-4 text-sm font-semibold text-accent-ink hover:bg-accent-strong focus-visible:outline focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent">
          Add load case
        </button>
      </div>
    </form>
  );
}
