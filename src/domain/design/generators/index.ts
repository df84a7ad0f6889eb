/**
 * Parametric generators: box frame, table, shelf unit, cabinet from sub-assemblies, enclosure.
 * `generateDesign(kind, params)` validates the parameters (mm) and returns a complete design;
 * `tryGenerateDesign` returns the validation errors instead of throwing.
 */
import { defaultCatalogue } from '../../catalogue';
import type { Catalogue } from '../../catalogue/types';
import { designDocumentSchema, type DesignDocument } from '../schema';
import { boxFrameGenerator } from './boxFrame';
import { cabinetGenerator } from './cabinet';
import { enclosureGenerator } from './enclosure';
import { shelfUnitGenerator } from './shelfUnit';
import { tableGenerator } from './table';
import type { GeneratorDefinition } from './types';

export type { GeneratorDefinition } from './types';
export { fittingThickness, capturedSheet } from './frameBuilder';
export { SLOT_THICKNESS_CLEARANCE_MM } from '../slotLimits';
export { boxFrameGenerator, tableGenerator, shelfUnitGenerator, cabinetGenerator, enclosureGenerator };

export const generators = [boxFrameGenerator, tableGenerator, shelfUnitGenerator, cabinetGenerator, enclosureGenerator] as const;
export type GeneratorKind = (typeof generators)[number]['id'];
export const GENERATOR_KINDS = generators.map((g) => g.id) as GeneratorKind[];

export class GeneratorParamsError extends Error {
  constructor(public readonly errors: { path: string; message: string }[]) {
    super(errors.map((e) => (e.path ? `${e.path}: ${e.message}` : e.message)).join('; '));
    this.name = 'GeneratorParamsError';
  }
}

export function getGenerator(kind: string): GeneratorDefinition | undefined {
  return (generators as readonly GeneratorDefinition[]).find((g) => g.id === kind);
}

export type GenerateResult = { ok: true; design: DesignDocument } | { ok: false; errors: { path: string; message: string }[] };

export function tryGenerateDesign(kind: string, params: unknown, catalogue: Catalogue = defaultCatalogue): GenerateResult {
  const generator = getGenerator(kind);
  if (!generator) return { ok: false, errors: [{ path: '', message: `Unknown generator "${kind}"; use one of ${GENERATOR_KINDS.join(', ')}` }] };
  const parsed = generator.paramsSchema.safeParse(params);
  if (!parsed.success) {
    return { ok: false, errors: parsed.error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message })) };
  }
  // Parsing puts every object's keys in schema order, so export and import give identical text.
  return { ok: true, design: designDocumentSchema.parse(generator.generate(parsed.data, catalogue)) };
}

/** A complete design from a generator; throws GeneratorParamsError with messages on bad parameters. */
export function generateDesign(kind: string, params: unknown, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const result = tryGenerateDesign(kind, params, catalogue);
  if (!result.ok) throw new GeneratorParamsError(result.errors);
  return result.design;
}
