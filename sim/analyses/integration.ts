/**
 * Implicit integration formulas for the transient analysis, applied to every stored quantity q (a charge or a
 * flux) of the circuit: the derivative at the new point t_{n+1} = t_n + h is written as
 *   dq/dt ≈ a0·q_{n+1} + c1·q_n + c2·q_{n−1} + cd·(dq/dt)_n
 * so that a device's companion is a conductance a0·C (or −a0·L on a branch row) plus a known history term.
 * Textbook methods (e.g. Hairer & Wanner, "Solving Ordinary Differential Equations II", or any numerical-analysis
 * text):
 *   - backward Euler (order 1, L-stable): dq/dt = (q_{n+1} − q_n)/h — used for the first step and after every
 *     source edge, where there is no derivative history yet;
 *   - trapezoidal rule (order 2, A-stable, no numerical damping): dq/dt = 2(q_{n+1} − q_n)/h − (dq/dt)_n;
 *   - second-order Gear (BDF2, L-stable) with variable steps, ρ = h/h_prev:
 *     dq/dt = [(1+2ρ)/(1+ρ)·q_{n+1} − (1+ρ)·q_n + ρ²/(1+ρ)·q_{n−1}]/h — used where the trapezoidal rule rings.
 * Local truncation error constants (constant step): backward Euler h²q''/2, trapezoidal h³q'''/12, BDF2 2h³q'''/9.
 */

export type IntegrationMethod = "backward-euler" | "trapezoidal" | "gear2";

export interface IntegrationCoefficients {
  method: IntegrationMethod;
  /** 1/s */
  a0: number;
  c1: number;
  c2: number;
  cd: number;
  /** order of accuracy: 1 or 2 */
  order: number;
  /** local truncation error ≈ errorConstant · h^(order+1) · q^(order+1) */
  errorConstant: number;
}

export const BACKWARD_EULER_ERROR_CONSTANT = 1 / 2;
export const TRAPEZOIDAL_ERROR_CONSTANT = 1 / 12;
export const GEAR2_ERROR_CONSTANT = 2 / 9;

/** Coefficients for a step of h seconds after one of hPrevious seconds (used by BDF2 only). */
export function integrationCoefficients(
  method: IntegrationMethod,
  h: number,
  hPrevious: number,
  out: IntegrationCoefficients = {
    method,
    a0: 0,
    c1: 0,
    c2: 0,
    cd: 0,
    order: 1,
    errorConstant: BACKWARD_EULER_ERROR_CONSTANT,
  },
): IntegrationCoefficients {
  out.method = method;
  if (method === "backward-euler") {
    out.a0 = 1 / h;
    out.c1 = -1 / h;
    out.c2 = 0;
    out.cd = 0;
    out.order = 1;
    out.errorConstant = BACKWARD_EULER_ERROR_CONSTANT;
  } else if (method === "trapezoidal") {
    out.a0 = 2 / h;
    out.c1 = -2 / h;
    out.c2 = 0;
    out.cd = -1;
    out.order = 2;
    out.errorConstant = TRAPEZOIDAL_ERROR_CONSTANT;
  } else {
    const rho = h / hPrevious;
    out.a0 = (1 + 2 * rho) / ((1 + rho) * h);
    out.c1 = -(1 + rho) / h;
    out.c2 = (rho * rho) / ((1 + rho) * h);
    out.cd = 0;
    out.order = 2;
    out.errorConstant = GEAR2_ERROR_CONSTANT;
  }
  return out;
}

/**
 * The k-th divided difference of (t, x) over k+1 points, times k!: an estimate of the k-th derivative
 * (Newton's divided differences, any numerical-analysis text).
 */
export function derivativeEstimate(t: ArrayLike<number>, x: ArrayLike<number>, order: number): number {
  const d = new Array<number>(order + 1);
  for (let i = 0; i <= order; i++) d[i] = x[i];
  for (let level = 1; level <= order; level++) {
    for (let i = order; i >= level; i--) d[i] = (d[i] - d[i - 1]) / (t[i] - t[i - level]);
  }
  let factorial = 1;
  for (let k = 2; k <= order; k++) factorial *= k;
  return d[order] * factorial;
}
