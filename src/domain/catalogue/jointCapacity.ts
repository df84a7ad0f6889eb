/**
 * Load capacity of a connector: tightening torque, screw preload, slip load per T-nut and screw
 * shear. Units: N, mm; torques in N·m.
 *
 * Preload from the torque by T = K·F·d with the nut factor K that VDI 2230's (R13) terms give for
 * the thread (μ_G = μ_K = 0.14, head bearing diameter 1.4·d; structure/bolting.ts). A T-nut clamps
 * the slot lips between itself and the connector, so one friction interface per T-nut:
 * slip = μ·F. Defer to the supplier's published slip loads where they exist.
 */
import { pitchDiameter, preloadFromTorque, screwShearResistance, slipLoad } from '../structure/bolting';
import type { Connector, ProfileSystem, ScrewSize } from './types';

export interface ScrewFigures {
  /** Nominal diameter, mm. */
  nominal: number;
  /** Thread pitch, mm (coarse series). */
  pitch: number;
  /** Tensile stress area, mm² (ISO 898-1 for metric; ASME B1.1 for inch; from memory). */
  stressArea: number;
  /** Tightening torque into a T-nut in an aluminium slot, N·m (from memory; the supplier's figure governs). */
  torqueNm: number;
}

/** Coarse threads used by the systems. Pitches: ISO 261/262 and ASME B1.1 (verified). */
export const SCREW_FIGURES: Partial<Record<ScrewSize, ScrewFigures>> = {
  M5: { nominal: 5, pitch: 0.8, stressArea: 14.2, torqueNm: 5 },
  M6: { nominal: 6, pitch: 1.0, stressArea: 20.1, torqueNm: 10 },
  M8: { nominal: 8, pitch: 1.25, stressArea: 36.6, torqueNm: 20 },
  M10: { nominal: 10, pitch: 1.5, stressArea: 58.0, torqueNm: 35 },
  '1/4': { nominal: 6.35, pitch: 25.4 / 20, stressArea: 20.5, torqueNm: 8 },
  '5/16': { nominal: 7.9375, pitch: 25.4 / 18, stressArea: 33.8, torqueNm: 15 },
};

/** Friction between a steel T-nut and an anodised aluminium slot lip (from memory; VDI 2230 Table A5 gives 0.10–0.16 for dry metal pairs). */
export const TNUT_SLOT_FRICTION = 0.15;
/** VDI 2230 friction assumed in the thread and under the head when deriving K. */
export const NUT_FACTOR_FRICTION = 0.14;
/** Head bearing friction diameter as a multiple of d (socket and button heads, from memory). */
export const HEAD_BEARING_DIAMETER_RATIO = 1.4;
/** Tensile strength of the property class 8.8 screws used, MPa (ISO 898-1, from memory). */
export const SCREW_TENSILE_STRENGTH = 800;

export const JOINT_CAPACITY_SOURCE =
  'Preload from the tightening torque by T = K·F·d (K from VDI 2230 (R13) with μ = 0.14); slip = μ·F per T-nut with μ = 0.15; torques, μ and stress areas from memory. Use the supplier’s published slip loads where they differ.';

/** Nut factor K for a screw from VDI 2230's terms (dimensionless). */
export function nutFactor(screw: ScrewFigures): number {
  const mu = NUT_FACTOR_FRICTION;
  const d2 = pitchDiameter(screw.nominal, screw.pitch);
  return (0.16 * screw.pitch + 0.58 * d2 * mu + (mu * HEAD_BEARING_DIAMETER_RATIO * screw.nominal) / 2) / screw.nominal;
}

export interface JointCapacity {
  torqueNm: number;
  nutFactor: number;
  /** N per screw. */
  preload: number;
  /** N per T-nut. */
  slipPerTNut: number;
  /** T-nuts holding one member: each member is checked on its own. */
  tNutsPerMember: number;
  /** N per screw, 0.6·f_ub·A_s. */
  screwShear: number;
  /** N the joint carries across one member before it slips (or the screw shears, for end screws), without a safety factor. */
  capacity: number;
  mode: 'slip' | 'screw-shear';
  source: string;
}

/** Capacity of one connector of a joint; null when its system's screw has no figures. */
export function jointCapacity(connector: Connector, system: ProfileSystem): JointCapacity | null {
  const screw = SCREW_FIGURES[system.screwSize];
  if (!screw) return null;
  const K = nutFactor(screw);
  const preload = preloadFromTorque(screw.torqueNm * 1000, K, screw.nominal);
  const slipPerTNut = slipLoad({ friction: TNUT_SLOT_FRICTION, preload, count: 1 });
  const screwShear = screwShearResistance(SCREW_TENSILE_STRENGTH, screw.stressArea);
  const tNutsPerMember = Math.floor(connector.tNutCount / 2);
  // End screws and concealed connectors: a screw in the profile's end or bore carries the shear;
  // the concealed connector's grip in the slot is friction again, taken as one T-nut.
  if (tNutsPerMember === 0) {
    const concealed = connector.kind === 'concealed-connector';
    return {
      torqueNm: screw.torqueNm,
      nutFactor: K,
      preload,
      slipPerTNut,
      tNutsPerMember: concealed ? 1 : 0,
      screwShear,
      capacity: concealed ? slipPerTNut : screwShear,
      mode: concealed ? 'slip' : 'screw-shear',
      source: JOINT_CAPACITY_SOURCE,
    };
  }
  return {
    torqueNm: screw.torqueNm,
    nutFactor: K,
    preload,
    slipPerTNut,
    tNutsPerMember,
    screwShear,
    capacity: slipPerTNut * tNutsPerMember,
    mode: 'slip',
    source: JOINT_CAPACITY_SOURCE,
  };
}
