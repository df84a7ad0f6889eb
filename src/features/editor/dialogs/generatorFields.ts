import { z } from 'zod';
import { defaultCatalogue } from '@/domain/catalogue';
import type { GeneratorDefinition } from '@/domain/design/generators';
import { formatLength, parseLength, type LengthUnit } from '@/domain/units';

export type GeneratorFieldSpec =
  | { name: string; label: string; type: 'length' }
  | { name: string; label: string; type: 'count' }
  | { name: string; label: string; type: 'select'; options: { value: string; label: string }[] }
  | { name: string; label: string; type: 'check' };

const materials = () => defaultCatalogue.panelMaterials.map((material) => ({ value: material.id, label: material.name }));
const material = (name: string, label: string): GeneratorFieldSpec => ({ name, label, type: 'select', options: materials() });

/** The fields each frame starter asks for, beyond system, size and feet. Names match the generator's parameters. */
const EXTRA_FIELDS: Record<string, () => GeneratorFieldSpec[]> = {
  'box-frame': () => [
    { name: 'panels', label: 'Panels', type: 'select', options: [{ value: 'none', label: 'Open frame' }, { value: 'walls', label: 'Four walls' }, { value: 'closed', label: 'Closed box' }] },
    material('panelMaterialId', 'Panel material'),
  ],
  table: () => [
    material('topMaterialId', 'Top material'),
    { name: 'topThickness', label: 'Top thickness', type: 'length' },
    { name: 'lowerFrame', label: 'Lower frame', type: 'check' },
    { name: 'lowerFrameHeight', label: 'Lower frame height', type: 'length' },
    { name: 'lowerShelf', label: 'Lower shelf', type: 'check' },
    material('shelfMaterialId', 'Shelf material'),
  ],
  'shelf-unit': () => [
    { name: 'shelves', label: 'Shelves', type: 'count' },
    material('shelfMaterialId', 'Shelf material'),
    { name: 'walls', label: 'Walls', type: 'select', options: [{ value: 'none', label: 'None' }, { value: 'back', label: 'Back' }, { value: 'back-and-sides', label: 'Back and sides' }] },
    material('wallMaterialId', 'Wall material'),
  ],
  cabinet: () => [
    { name: 'shelves', label: 'Inner shelves', type: 'count' },
    material('panelMaterialId', 'Wall material'),
    material('shelfMaterialId', 'Shelf material'),
    { name: 'doors', label: 'Doors', type: 'check' },
    material('doorMaterialId', 'Door material'),
    { name: 'doorThickness', label: 'Door thickness', type: 'length' },
  ],
  enclosure: () => [
    { name: 'compartments', label: 'Compartments', type: 'count' },
    material('wallMaterialId', 'Wall material'),
    material('shelfMaterialId', 'Shelf material'),
    material('doorMaterialId', 'Door material'),
    { name: 'doorThickness', label: 'Door thickness', type: 'length' },
  ],
};

/** Every field of a frame starter's form, common ones first. */
export function generatorFields(generator: GeneratorDefinition): GeneratorFieldSpec[] {
  return [
    { name: 'systemId', label: 'Profile system', type: 'select', options: defaultCatalogue.systems.map((system) => ({ value: system.id, label: system.name })) },
    { name: 'width', label: 'Width (X)', type: 'length' },
    { name: 'depth', label: 'Depth (Z)', type: 'length' },
    { name: 'height', label: 'Height (Y)', type: 'length' },
    { name: 'feet', label: 'Under the legs', type: 'select', options: [{ value: 'leveling-foot', label: 'Leveling feet' }, { value: 'caster', label: 'Casters' }, { value: 'none', label: 'Nothing' }] },
    ...(EXTRA_FIELDS[generator.id]?.() ?? []),
  ];
}

export type GeneratorFormValues = Record<string, string | boolean>;

/**
 * A metric default restated as an inch size a shop would pick, mm: sizes of a foot or more to the
 * nearest 6 in (1200 mm → 48 in), smaller ones to the nearest 1/4 in (18 mm → 3/4 in).
 */
export function roundedForInches(mm: number): number {
  const inches = mm / 25.4;
  const step = inches >= 12 ? 6 : 0.25;
  return Math.max(step, Math.round(inches / step) * step) * 25.4;
}

/** Form values from the generator's defaults, lengths written in the person's units. */
export function defaultFormValues(generator: GeneratorDefinition, fields: GeneratorFieldSpec[], units: LengthUnit, systemId: string): GeneratorFormValues {
  const defaults = generator.defaults as Record<string, unknown>;
  const values: GeneratorFormValues = {};
  for (const field of fields) {
    const value = field.name === 'systemId' ? systemId : defaults[field.name];
    if (field.type === 'length') values[field.name] = typeof value === 'number' ? formatLength(units === 'in' ? roundedForInches(value) : value, units) : '';
    else if (field.type === 'count') values[field.name] = value === undefined ? '' : String(value);
    else if (field.type === 'check') values[field.name] = Boolean(value);
    else values[field.name] = value === undefined ? (field.options[0]?.value ?? '') : String(value);
  }
  return values;
}

/**
 * The form's zod schema: lengths read in the person's units (refused with the reason), counts as
 * whole numbers, then piped into the generator's own parameter schema so its rules (minimum sizes,
 * too many shelves) land beside the field they concern.
 */
export function generatorFormSchema(generator: GeneratorDefinition, fields: GeneratorFieldSpec[], units: LengthUnit) {
  const shape: Record<string, z.ZodType> = {};
  for (const field of fields) {
    if (field.type === 'length') {
      shape[field.name] = z.string().transform((text, ctx) => {
        const parsed = parseLength(text, units);
        if (!parsed.ok) {
          ctx.addIssue({ code: 'custom', message: parsed.error });
          return z.NEVER;
        }
        if (parsed.mm <= 0) {
          ctx.addIssue({ code: 'custom', message: `${field.label} must be more than zero.` });
          return z.NEVER;
        }
        return parsed.mm;
      });
    } else if (field.type === 'count') {
      shape[field.name] = z.string().transform((text, ctx) => {
        const value = Number(text.trim());
        if (text.trim() === '' || !Number.isInteger(value)) {
          ctx.addIssue({ code: 'custom', message: `${field.label}: enter a whole number.` });
          return z.NEVER;
        }
        return value;
      });
    } else if (field.type === 'check') {
      shape[field.name] = z.boolean();
    } else {
      shape[field.name] = z.string();
    }
  }
  return z.object(shape).pipe(generator.paramsSchema as z.ZodType<unknown, Record<string, unknown>>);
}
