import type { z } from 'zod';
import type { Catalogue } from '../../catalogue/types';
import type { DesignDocument } from '../schema';

/** A parametric design generator: validated parameters in (mm), a complete design out. */
export interface GeneratorDefinition<S extends z.ZodType = z.ZodType> {
  id: string;
  name: string;
  description: string;
  paramsSchema: S;
  defaults: z.input<S>;
  generate(params: z.output<S>, catalogue: Catalogue): DesignDocument;
}
