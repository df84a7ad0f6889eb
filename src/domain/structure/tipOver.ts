/**
 * Tip-over by a horizontal push, from statics (derived, no published figure): the frame starts to
 * tip about its edge when the push's moment F·h equals the weight's restoring moment W·d.
 * Assumes the frame does not slide first and nothing is fixed to the floor or wall.
 */

/** Horizontal force in N that starts tipping: F = W·d/h, with weight in N, lever arm and push height in mm. */
export function tipOverForce(i: { weight: number; leverArm: number; pushHeight: number }): number {
  if (!(i.pushHeight > 0)) throw new Error('The push height must be greater than 0 mm.');
  if (!(i.weight >= 0)) throw new Error('The weight cannot be negative.');
  return (i.weight * Math.max(0, i.leverArm)) / i.pushHeight;
}

/** Tilt angle in degrees at which the centre of mass passes over the tipping edge: atan(d / h_cm), mm in. */
export function tipOverAngleDegrees(i: { leverArm: number; centreOfMassHeight: number }): number {
  if (!(i.centreOfMassHeight > 0)) throw new Error('The centre of mass height must be greater than 0 mm.');
  return (Math.atan2(Math.max(0, i.leverArm), i.centreOfMassHeight) * 180) / Math.PI;
}
