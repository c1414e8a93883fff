/**
 * Shockley square-law JFET in the n-channel frame (contract). Vov = Vgs − pinch_off.
 *   cut-off (Vov ≤ 0): Id = 0
 *   saturation (Vds ≥ Vov): Id = idss·(Vov/Vp)²·(1 + λ·Vds)
 *   linear (0 ≤ Vds < Vov): Id = idss·(2·Vov·Vds − Vds²)/Vp²·(1 + λ·Vds)
 *   Vds < 0: drain and source swap roles, Id(Vgs, Vds) = −F(Vgs − Vds, −Vds).
 * Returns the drain current and its partial derivatives with respect to Vgs (gm) and Vds (gds).
 */
export type JfetRegion = "cut-off" | "linear" | "saturation";

export interface JfetPoint {
  id: number;
  gm: number;
  gds: number;
  region: JfetRegion;
  /** true when drain and source swapped roles (Vds < 0) */
  reversed: boolean;
}

export interface JfetParameters {
  idss: number;
  /** n-frame pinch-off, negative, V */
  pinchOff: number;
  lambda: number;
}

function forward(vgs: number, vds: number, m: JfetParameters): JfetPoint {
  const vp = m.pinchOff;
  const vov = vgs - vp;
  if (vov <= 0) return { id: 0, gm: 0, gds: 0, region: "cut-off", reversed: false };
  const clm = 1 + m.lambda * vds;
  const k = m.idss / (vp * vp);
  if (vds >= vov) {
    const base = k * vov * vov;
    return { id: base * clm, gm: 2 * k * vov * clm, gds: base * m.lambda, region: "saturation", reversed: false };
  }
  const base = k * (2 * vov * vds - vds * vds);
  return {
    id: base * clm,
    gm: 2 * k * vds * clm,
    gds: 2 * k * (vov - vds) * clm + base * m.lambda,
    region: "linear",
    reversed: false,
  };
}

export function jfetDrainCurrent(vgs: number, vds: number, m: JfetParameters): JfetPoint {
  if (vds >= 0) return forward(vgs, vds, m);
  const f = forward(vgs - vds, -vds, m);
  // Id = −F(Vgs − Vds, −Vds): ∂/∂Vgs = −F₁, ∂/∂Vds = F₁ + F₂
  return { id: -f.id, gm: -f.gm, gds: f.gm + f.gds, region: f.region, reversed: true };
}
