/**
 * One chosen measurement held against the live simulation, whichever its kind, and the curve it adds to the bench's
 * plots: a frequency response is aligned and drawn on the Bode plot; a noise spectrum is compared as measured and
 * drawn on the noise density plot in V/√Hz (the plot's unit), converted back from the stored dBV/√Hz. Pure.
 */
import { type ComparisonResult, compareMeasurement, type Curve } from "./compare";
import { compareNoise, type NoiseComparisonResult } from "./compare-noise";

export type MeasurementKind = "frequency_response" | "noise_spectrum";

export interface SimulatedNoise {
  frequency: readonly number[];
  /** total output noise density, V/√Hz */
  output_density: readonly number[];
}

export interface ComparisonBand {
  fromHz: number;
  toHz: number;
  /** where a response is aligned; a noise spectrum is not aligned */
  alignHz: number;
}

export type ChosenComparison =
  | { kind: "frequency_response"; result: ComparisonResult }
  | { kind: "noise_spectrum"; result: NoiseComparisonResult };

export type MeasurementOverlay =
  | { kind: "frequency_response"; id: string; label: string; frequency: number[]; level_db: number[] }
  | { kind: "noise_spectrum"; id: string; label: string; frequency: number[]; density_v: number[] };

/** dBV/√Hz → V/√Hz, the inverse of 20·log10 (dBV definition, common practice). */
export const dbvToDensity = (dbv: number) => 10 ** (dbv / 20);

const NO_RESPONSE = "The simulation has no response yet to compare with. Wait for the solve, or fix the circuit's errors.";
const NO_NOISE = "The simulation has no noise analysis to compare a noise spectrum with. Add a noise analysis to the circuit's analyses.";

export function compareChosen(
  kind: MeasurementKind,
  measured: Curve,
  simulated: { response: Curve | null; noise: SimulatedNoise | null },
  band: ComparisonBand,
): ChosenComparison {
  if (kind === "noise_spectrum") {
    if (!simulated.noise) return { kind, result: { ok: false, message: NO_NOISE } };
    return { kind, result: compareNoise(simulated.noise, measured, band) };
  }
  if (!simulated.response) return { kind, result: { ok: false, message: NO_RESPONSE } };
  return { kind, result: compareMeasurement(simulated.response, measured, band) };
}

const signed = (v: number) => (v >= 0 ? `+${v.toFixed(1)}` : `−${Math.abs(v).toFixed(1)}`);

/** The curve a comparison adds to the plots, named after the measurement; null when the comparison failed. */
export function overlayOf(chosen: ChosenComparison, measurement: { id: string; name: string }): MeasurementOverlay | null {
  const id = `measurement-${measurement.id}`;
  if (chosen.kind === "noise_spectrum") {
    if (!chosen.result.ok) return null;
    const c = chosen.result.comparison;
    return { kind: "noise_spectrum", id, label: `${measurement.name} (measured)`, frequency: c.frequency, density_v: c.measured_dbv.map(dbvToDensity) };
  }
  if (!chosen.result.ok) return null;
  const c = chosen.result.comparison;
  return { kind: "frequency_response", id, label: `${measurement.name} (measured, ${signed(c.offset_db)} dB)`, frequency: c.frequency, level_db: c.measured_aligned_db };
}
