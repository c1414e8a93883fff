/**
 * Ebers–Moll transport model, npn frame (contract), Vt = kT/q:
 *   IF = is·(exp(Vbe/Vt) − 1), IR = is·(exp(Vbc/Vt) − 1)
 *   Ic = IF·(1 + Vce/vaf) − IR·(1 + 1/beta_r)        (Early factor on the forward transport current only)
 *   Ib = IF/beta + IR/beta_r                          (base current not scaled)
 * with Vce = Vbe − Vbc. Returns currents and partial derivatives with respect to Vbe and Vbc.
 */
export interface BjtParameters {
  is: number;
  beta: number;
  betaR: number;
  /** forward Early voltage, V (Infinity for none) */
  vaf: number;
}

export interface BjtPoint {
  ic: number;
  ib: number;
  dIcDvbe: number;
  dIcDvbc: number;
  dIbDvbe: number;
  dIbDvbc: number;
  forwardTransport: number;
  reverseTransport: number;
}

export function bjtCurrents(vbe: number, vbc: number, vt: number, m: BjtParameters): BjtPoint {
  const ef = Math.exp(vbe / vt);
  const er = Math.exp(vbc / vt);
  const iF = m.is * (ef - 1);
  const iR = m.is * (er - 1);
  const gF = (m.is * ef) / vt;
  const gR = (m.is * er) / vt;
  const inverseVaf = Number.isFinite(m.vaf) ? 1 / m.vaf : 0;
  const early = 1 + (vbe - vbc) * inverseVaf;
  const reverseFactor = 1 + 1 / m.betaR;
  return {
    ic: iF * early - iR * reverseFactor,
    ib: iF / m.beta + iR / m.betaR,
    dIcDvbe: gF * early + iF * inverseVaf,
    dIcDvbc: -iF * inverseVaf - gR * reverseFactor,
    dIbDvbe: gF / m.beta,
    dIbDvbc: gR / m.betaR,
    forwardTransport: iF,
    reverseTransport: iR,
  };
}
