/**
 * Noise analysis (contract): the output noise density at `output` (V/√Hz), each part's contribution (V/√Hz; the
 * contributions sum in power to the total), and `rms` and `rms_a_weighted` — √(trapezoid rule of the power
 * density, linear in f, over the sorted points, both ends included), the second with the IEC 61672-1 A-weighting
 * squared at each point (sim/acoustics/weighted-rms.ts, the one integrator the contract names).
 *
 * Every generator is carried to the output by the one adjoint solve per frequency (noise-adjoint.ts): its output
 * power density is |y[n+] − y[n−]|²·psd(f). Generators are uncorrelated (each device declares independent
 * mechanisms), so powers add.
 */
import { rmsFromPowerDensity } from "../acoustics/weighted-rms";
import { SWEEP_LANES } from "../mna/sparse-lu-complex-lanes";
import type { NoiseResult } from "../results";
import type { AdjointNoiseSystem } from "./noise-adjoint";

/** The noise analysis's numbers before they become the contract's document (power densities, V²/Hz). */
export interface NoiseSpectrum {
  frequency: number[];
  /** total output power density at each frequency, V²/Hz */
  outputPower: Float64Array;
  /** part id → its output power density at each frequency, V²/Hz (parts in circuit order) */
  partPower: Map<string, Float64Array>;
}

/** Output noise power of every part at every frequency (ascending, as expandFrequencies gives them). */
export function noiseSpectrum(system: AdjointNoiseSystem, frequencies: readonly number[]): NoiseSpectrum {
  const count = frequencies.length;
  const partPower = new Map<string, Float64Array>();
  const generators = system.generators;
  const target: Float64Array[] = generators.map((g) => {
    let arr = partPower.get(g.part);
    if (!arr) {
      arr = new Float64Array(count);
      partPower.set(g.part, arr);
    }
    return arr;
  });
  const outputPower = new Float64Array(count);
  // Four frequencies per factorisation (noise-adjoint.ts solveLanes); a lane whose static pivots failed is solved
  // again on its own through the dense fallback.
  for (let start = 0; start < count; start += SWEEP_LANES) {
    const failed = system.solveLanes(frequencies, start);
    const used = Math.min(SWEEP_LANES, count - start);
    for (let b = 0; b < used; b++) {
      const i = start + b;
      const f = frequencies[i];
      const single = (failed & (1 << b)) !== 0;
      if (single) system.solveAt(f);
      let total = 0;
      for (let k = 0; k < generators.length; k++) {
        const g = generators[k];
        const p = (single ? system.transferSquared(g) : system.laneTransferSquared(g, b)) * g.psd(f);
        target[k][i] += p;
        total += p;
      }
      outputPower[i] = total;
    }
  }
  return { frequency: frequencies.slice(), outputPower, partPower };
}

/** √ of each element (power density → amplitude density). */
function amplitude(power: Float64Array): number[] {
  return Array.from(power, (p) => Math.sqrt(p));
}

/** RMS over the spectrum's band, flat and A-weighted, V. */
export function noiseRms(spectrum: NoiseSpectrum): { rms: number; rmsAWeighted: number } {
  return {
    rms: rmsFromPowerDensity(spectrum.frequency, spectrum.outputPower),
    rmsAWeighted: rmsFromPowerDensity(spectrum.frequency, spectrum.outputPower, "A"),
  };
}

/** The contract's `noise` document. */
export function noiseDocument(spectrum: NoiseSpectrum): NoiseResult {
  const contributions: Record<string, number[]> = {};
  for (const [part, power] of spectrum.partPower) contributions[part] = amplitude(power);
  const { rms, rmsAWeighted } = noiseRms(spectrum);
  return {
    frequency: spectrum.frequency.slice(),
    output_density: amplitude(spectrum.outputPower),
    contributions,
    rms,
    rms_a_weighted: rmsAWeighted,
  };
}

/** Run the noise analysis on an adjoint system over `frequencies` (Hz, ascending). */
export function runNoise(system: AdjointNoiseSystem, frequencies: readonly number[]): NoiseResult {
  return noiseDocument(noiseSpectrum(system, frequencies));
}
