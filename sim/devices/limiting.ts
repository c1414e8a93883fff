/**
 * Newton step limiting for nonlinear devices. A full Newton step on an exponential junction can overshoot to
 * voltages whose exp() overflows; a step across a square law's cut-off boundary can land where the derivative
 * is zero. Limiting replaces the proposed junction voltage by a safer one; the device then linearises there and
 * the iteration is marked as not converged.
 */

/**
 * Exponential-junction limiting (the logarithmic compression used since the first Newton-based circuit
 * programs; textbook method): above the critical voltage Vcrit, where the diode's curvature makes the linear
 * prediction unreliable, a forward step of more than 2·Vt is replaced by the voltage at which the exponential would
 * have grown by the same current as the linear prediction.
 */
export function limitJunctionVoltage(proposed: number, previous: number, vt: number, vcrit: number): number {
  if (proposed > vcrit && Math.abs(proposed - previous) > 2 * vt) {
    if (previous > 0) {
      const arg = 1 + (proposed - previous) / vt;
      return arg > 0 ? previous + vt * Math.log(arg) : vcrit;
    }
    return vt * Math.log(proposed / vt);
  }
  return proposed;
}

/** Vcrit = Vt·ln(Vt / (√2·Is)): where the junction's current curvature starts to dominate. */
export function criticalJunctionVoltage(vt: number, saturationCurrent: number): number {
  return vt * Math.log(vt / (Math.SQRT2 * saturationCurrent));
}

/** Plain step clamp: |proposed − previous| ≤ maxStep. */
export function limitStep(proposed: number, previous: number, maxStep: number): number {
  const step = proposed - previous;
  if (step > maxStep) return previous + maxStep;
  if (step < -maxStep) return previous - maxStep;
  return proposed;
}
