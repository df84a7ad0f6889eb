import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useNavigate } from 'react-router';
import { z } from 'zod';
import { Button, Dialog, DialogActions, ErrorNotice, SelectField, TextField } from '@/components/ui';
import { lengthUnitSchema } from '@/domain/contracts';
import { LENGTH_UNITS } from '@/domain/units';
import { useUnits } from '@/lib/session/useUnits';
import { applyServerFieldErrors, messageOf } from '@/lib/formErrors';
import { useCreateDesign } from '../api/createDesign';
import { PROFILE_SYSTEMS } from '../profileSystems';

const newDesignSchema = z.object({
  name: z.string().trim().min(1, 'Give the design a name.').max(120, 'Keep the name under 120 characters.'),
  systemId: z.string().min(1, 'Choose a profile system.'),
  units: lengthUnitSchema,
});
type NewDesignValues = z.infer<typeof newDesignSchema>;
const FIELDS = ['name', 'systemId', 'units'] as const;

const systemOptions = PROFILE_SYSTEMS.map((system) => ({ value: system.id, label: system.name }));

/** Creates an empty design on the server, then opens it in the editor. */
export function NewDesignDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title="New design" description="Start from an empty frame; you can add profiles in the editor.">
      {/* Mounted only while open, so every opening starts from fresh values. */}
      <NewDesignForm onCancel={onClose} />
    </Dialog>
  );
}

function NewDesignForm({ onCancel }: { onCancel: () => void }) {
  const navigate = useNavigate();
  const { units } = useUnits();
  const createDesign = useCreateDesign();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<NewDesignValues>({
    resolver: zodResolver(newDesignSchema),
    defaultValues: { name: '', systemId: units === 'in' ? 'inch-1.5' : 'metric-40', units },
  });

  const onSubmit = handleSubmit((values) =>
    createDesign.mutate(values, {
      onSuccess: (design) => navigate(`/designs/${design.id}`),
      onError: (error) => applyServerFieldErrors(error, setError, FIELDS),
    }),
  );

  const fieldErrorShown = Object.keys(errors).length > 0;
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {createDesign.error && !fieldErrorShown ? <ErrorNotice title="Not created" message={messageOf(createDesign.error)} /> : null}
      <TextField id="new-design-name" label="Name" autoComplete="off" placeholder="e.g. Bench-top printer enclosure" error={errors.name?.message} {...register('name')} />
      <SelectField id="new-design-system" label="Profile system" options={systemOptions} error={errors.systemId?.message} {...register('systemId')} />
      <fieldset className="flex flex-col gap-1.5">
        <legend className="mb-1.5 text-sm font-medium text-ink">Units shown in the editor</legend>
        <div className="flex gap-2">
          {LENGTH_UNITS.map((option) => (
            <label
              key={option}
              className="flex min-h-11 flex-1 cursor-pointer items-center gap-2 rounded-lg border border-paper-line bg-paper-raised px-3 text-sm has-[:checked]:border-accent has-[:checked]:bg-accent-soft has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-accent"
            >
              <input type="radio" value={option} className="size-4 accent-[#0b7a75]" {...register('units')} />
              {option === 'mm' ? 'Millimetres (mm)' : 'Inches (in)'}
            </label>
          ))}
        </div>
        {errors.units ? <p className="text-sm text-severity-error">Error: {errors.units.message}</p> : null}
      </fieldset>
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" pending={createDesign.isPending}>
          Create and open
        </Button>
      </DialogActions>
    </form>
  );
}
