/** The kinds of machining, joints and accessories the catalogue offers; the design document uses these words. */
import { z } from 'zod';

export const machiningKindSchema = z.enum(['access-counterbore', 'access-hole', 'end-tap', 'drill']);
export type MachiningKind = z.infer<typeof machiningKindSchema>;

export const jointKindSchema = z.enum([
  'corner-bracket',
  'gusset-plate',
  'concealed-connector',
  'end-screw',
  'corner-cube',
  'hinge',
]);
export type JointKind = z.infer<typeof jointKindSchema>;

export const accessoryKindSchema = z.enum([
  'leveling-foot',
  'caster',
  'end-cap',
  'door-track',
  'handle',
  'latch',
  'hinge',
  'gasket',
  'slot-cover',
]);
export type AccessoryKind = z.infer<typeof accessoryKindSchema>;
