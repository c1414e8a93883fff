/**
 * A microphone output driving a cable into a preamplifier input. The source is a Thévenin EMF behind R_src
 * (optionally ∥ C_src, e.g. an output stage's own capacitance in its feedback); the cable is lumped as its total
 * capacitance (valid while the cable is electrically short, i.e. at audio frequencies); the input is R_in ∥ C_in.
 * In admittances, H(jω) = Y_src / (Y_src + Y_load) with Y_src = 1/R_src + jωC_src and
 * Y_load = 1/R_in + jω(C_cable + C_in): a flat divider R_in/(R_src + R_in) and a pole at
 * 1/(2π·(R_src ∥ R_in)·C_total) when C_src = 0. SI units (Ω, F, m, Hz, dB).
 */
import { requireNonNegative, requirePositive } from "./validate";

/** Conductor-to-conductor capacitance of microphone cable, F/m (common practice: about 100 pF/m). */
export const TYPICAL_CABLE_CAPACITANCE_F_PER_M = 100e-12;

/** Frequency at which the loss is reported, Hz (IEC 60268-4 rates microphones at 1 kHz). */
export const LOSS_REFERENCE_FREQUENCY_HZ = 1000;

/** Capacitance of a cable run, F: capacitance per metre (F/m, default 100 pF/m) × length (m). */
export function cableCapacitance(lengthM: number, capacitancePerM: number = TYPICAL_CABLE_CAPACITANCE_F_PER_M): number {
  requirePositive("Cable length", lengthM, "m");
  requirePositive("Cable capacitance per metre", capacitancePerM, "F/m");
  return lengthM * capacitancePerM;
}

export interface CableLoadingCase {
  /** Source resistance R_src, Ω (> 0). */
  sourceResistanceOhm: number;
  /** Capacitance across the source resistance, F [0]. */
  sourceCapacitanceF?: number;
  /** Total cable capacitance, F (≥ 0; see `cableCapacitance`). */
  cableCapacitanceF: number;
  /** Input resistance R_in, Ω (> 0; Infinity for an unloaded input). */
  inputResistanceOhm: number;
  /** Input capacitance C_in, F [0]. */
  inputCapacitanceF?: number;
}

export interface CableLoading {
  /** Low-frequency divider loss 20·log10(R_in/(R_src + R_in)), dB (≤ 0). */
  dividerLossDb: number;
  /** Loss at 1 kHz, 20·log10 |H(j·2π·1 kHz)|, dB (≤ 0 when C_src = 0). */
  lossAt1kHzDb: number;
  /** Frequency where |H| is 3 dB below its low-frequency value, Hz; null when it never falls that far. */
  cornerHz: number | null;
  /** Total shunt capacitance at the input, C_cable + C_in, F. */
  totalCapacitanceF: number;
}

function validated(c: CableLoadingCase) {
  const rs = requirePositive("Source resistance", c.sourceResistanceOhm, "Ω");
  const rin = c.inputResistanceOhm;
  if (!(rin > 0))
    throw new RangeError(`Input resistance must be greater than 0 Ω (Infinity for none); got ${String(rin)}.`);
  const cs = requireNonNegative("Source capacitance", c.sourceCapacitanceF ?? 0, "F");
  const ct =
    requireNonNegative("Cable capacitance", c.cableCapacitanceF, "F") +
    requireNonNegative("Input capacitance", c.inputCapacitanceF ?? 0, "F");
  return { gs: 1 / rs, gin: 1 / rin, cs, ct };
}

/** |H(j·2π·f)| for a case, dimensionless. */
export function cableTransferMagnitude(c: CableLoadingCase, frequencyHz: number): number {
  requireNonNegative("Frequency", frequencyHz, "Hz");
  const { gs, gin, cs, ct } = validated(c);
  const w = 2 * Math.PI * frequencyHz;
  // |(a + jb) / (c + jd)| with a = Gs, b = ωCs, c = Gs + Gin, d = ω(Cs + Ct).
  return Math.hypot(gs, w * cs) / Math.hypot(gs + gin, w * (cs + ct));
}

/** Divider loss, loss at 1 kHz and −3 dB corner of a source driving a cable into an input (see module notes). */
export function cableLoading(c: CableLoadingCase): CableLoading {
  const { gs, gin, cs, ct } = validated(c);
  const g = gs + gin;
  const h0 = gs / g;
  // Solve |H(ω)|² = h0²/2: (Gs² + ω²Cs²)/(G² + ω²(Cs + Ct)²) = Gs²/(2G²)
  // → ω² · (Gs²(Cs + Ct)² − 2G²Cs²) = Gs²G². No real root when the bracket is ≤ 0 (C_src holds the response up).
  const bracket = gs * gs * (cs + ct) ** 2 - 2 * g * g * cs * cs;
  const cornerHz = bracket > 0 ? (gs * g) / Math.sqrt(bracket) / (2 * Math.PI) : null;
  return {
    dividerLossDb: 20 * Math.log10(h0),
    lossAt1kHzDb: 20 * Math.log10(cableTransferMagnitude(c, LOSS_REFERENCE_FREQUENCY_HZ)),
    cornerHz,
    totalCapacitanceF: ct,
  };
}
