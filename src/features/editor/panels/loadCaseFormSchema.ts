import { z } from 'zod';
import type { LoadCase } from '@/domain/design/schema';
import { parseLength, poundsForceToNewtons, type LengthUnit } from '@/domain/units';

export interface LoadCaseFormValues {
  name: string;
  kind: 'point' | 'uniform';
  position: string;
  force: string;
  support: 'simple' | 'fixed';
  tipOverHeight: string;
}

export interface LoadTargets {
  /** The selected profile, for a point load. */
  profile: { id: string; length: number; label?: string } | null;
  /** The selected panel, for a uniform load. */
  panel: { id: string; label?: string } | null;
}

function readForce(text: string): number | null {
  const value = Number(text.trim().replace(',', '.'));
  return text.trim() !== '' && Number.isFinite(value) ? value : null;
}

/** Form rules; lengths are typed in the design's units, forces in N (lbf for inch users). */
export function loadCaseFormSchema(units: LengthUnit, targets: LoadTargets) {
  const forceUnit = units === 'in' ? 'lbf' : 'N';
  return z
    .object({
      name: z.string().trim().min(1, 'Give the load case a name.').max(80, 'At most 80 characters.'),
      kind: z.enum(['point', 'uniform']),
      position: z.string(),
      force: z.string(),
      support: z.enum(['simple', 'fixed']),
      tipOverHeight: z.string(),
    })
    .superRefine((values, ctx) => {
      const force = readForce(values.force);
      if (force === null) ctx.addIssue({ code: 'custom', path: ['force'], message: `Enter a force in ${forceUnit}, for example ${units === 'in' ? '90' : '400'}.` });
      else if (force < 0) ctx.addIssue({ code: 'custom', path: ['force'], message: `A force cannot be negative: enter its size in ${forceUnit}; it acts downward.` });
      else if (force === 0) ctx.addIssue({ code: 'custom', path: ['force'], message: 'Enter a force greater than zero.' });

      if (values.kind === 'point') {
        if (!targets.profile) {
          ctx.addIssue({ code: 'custom', path: ['position'], message: 'Select one profile in the model to load it.' });
        } else {
          const position = parseLength(values.position, units);
          if (!position.ok) ctx.addIssue({ code: 'custom', path: ['position'], message: position.error });
          else if (position.mm < 0 || position.mm > targets.profile.length)
            ctx.addIssue({ code: 'custom', path: ['position'], message: 'The position must lie on the profile, between its start and its end.' });
        }
      } else if (!targets.panel) {
        ctx.addIssue({ code: 'custom', path: ['kind'], message: 'Select one panel in the model to spread a load on it.' });
      }

      if (values.tipOverHeight.trim() !== '') {
        const height = parseLength(values.tipOverHeight, units);
        if (!height.ok) ctx.addIssue({ code: 'custom', path: ['tipOverHeight'], message: height.error });
        else if (height.mm <= 0) ctx.addIssue({ code: 'custom', path: ['tipOverHeight'], message: 'The push height must be above the floor.' });
      }
    });
}

/** Turns valid form values into a document load case (mm, N). */
export function toLoadCase(id: string, values: LoadCaseFormValues, units: LengthUnit, targets: LoadTargets): LoadCase {
  const typedForce = readForce(values.force) ?? 0;
  const force = units === 'in' ? poundsForceToNewtons(typedForce) : typedForce;
  const height = values.tipOverHeight.trim() === '' ? undefined : parseLength(values.tipOverHeight, units);
  const load: LoadCase['loads'][number] =
    values.kind === 'point'
      ? {
          kind: 'point',
          profileId: targets.profile!.id,
          along: (parseLength(values.position, units) as { ok: true; mm: number }).mm,
          force,
          direction: [0, -1, 0],
        }
      : { kind: 'uniform', panelId: targets.panel!.id, totalForce: force };
  return {
    id,
    name: values.name.trim(),
    loads: [load],
    support: values.support,
    ...(height && height.ok ? { tipOverHeight: height.mm } : {}),
  };
}
