/**
 * Screw preload from tightening torque, and the slip and shear capacity of a screwed T-nut.
 * Units: N, mm, N·mm (torques in N·m where the name says so).
 *
 * VDI 2230 Part 1 (2003/2015) eq. (R13): M_A = F_M·(0.16·P + 0.58·d₂·μ_G + μ_K·D_Km/2), with pitch P,
 * pitch diameter d₂ = d − 0.6495·P (ISO 724), head bearing friction diameter D_Km. The short form
 * T = K·F·d uses a nut factor K; for steel screws, dry or lightly oiled, K ≈ 0.2 (common practice,
 * no source). Slotwise uses the short form with the K that VDI 2230's terms give for the screw.
 */

/** Pitch diameter d₂ of an ISO metric thread, mm (ISO 724: d₂ = d − 0.649519·P). */
export function pitchDiameter(nominal: number, pitch: number): number {
  return nominal - 0.649519 * pitch;
}

/** VDI 2230 (R13): tightening torque in N·mm for preload F in N. */
export function vdiTighteningTorque(i: { preload: number; nominal: number; pitch: number; threadFriction: number; headFriction: number; bearingDiameter: number }): number {
  const d2 = pitchDiameter(i.nominal, i.pitch);
  return i.preload * (0.16 * i.pitch + 0.58 * d2 * i.threadFriction + (i.headFriction * i.bearingDiameter) / 2);
}

/** VDI 2230 (R13) solved for the preload: N from a torque in N·mm. */
export function vdiPreload(i: { torque: number; nominal: number; pitch: number; threadFriction: number; headFriction: number; bearingDiameter: number }): number {
  return i.torque / vdiTighteningTorque({ ...i, preload: 1 });
}

/** Short form T = K·F·d: preload in N from torque in N·mm, nut factor K and nominal diameter in mm. */
export function preloadFromTorque(torque: number, nutFactor: number, nominal: number): number {
  if (!(nutFactor > 0) || !(nominal > 0)) throw new Error('The nut factor and diameter must be positive.');
  return torque / (nutFactor * nominal);
}

/** Friction slip load of a clamped joint: μ·F·n, in N (n friction interfaces × screws). */
export function slipLoad(i: { friction: number; preload: number; count: number }): number {
  return i.friction * i.preload * i.count;
}

/**
 * Shear resistance of one screw through its threads, in N: 0.6·f_ub·A_s (EN 1993-1-8 Table 3.4,
 * α_v = 0.6 for property classes 4.6, 5.6 and 8.8; from memory), without a partial factor.
 */
export function screwShearResistance(tensileStrength: number, stressArea: number): number {
  return 0.6 * tensileStrength * stressArea;
}
