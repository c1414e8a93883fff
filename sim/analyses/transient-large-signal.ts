/**
 * The large-signal analyses of one pass (transient, distortion, ripple), each linearised about / started from the
 * operating point at its own temperature, their outputs and figures written into `result`:
 * `transient` (+ settle_time_s from power-on), `distortion` (+ max_spl_db, max_spl_1pct_db, max_spl_limited_by on
 * a capsule circuit), `ripple` (+ supply_rejection_1khz_db). `control` carries a Web Worker's progress callback
 * and cancellation check to the long loops.
 */
import { expandFrequencies as expandFrequencyRequest } from "../circuit/frequencies";
import type { AnalysisRequests } from "../circuit/types";
import type { SimulationResult } from "../results";
import type { CompiledCircuit } from "./compile";
import { runDistortion } from "./distortion-analysis";
import type { OperatingPoint } from "./op";
import { runRipple } from "./ripple";
import type { RunControl } from "./transient";
import { runTransient } from "./transient-analysis";

export const LARGE_SIGNAL_FIGURES = [
  "max_spl_db",
  "max_spl_1pct_db",
  "max_spl_limited_by",
  "settle_time_s",
  "supply_rejection_1khz_db",
] as const;

export function solveLargeSignal(
  compiled: CompiledCircuit,
  operatingPointAt: (temperature: number) => OperatingPoint,
  analyses: AnalysisRequests,
  result: SimulationResult,
  control: RunControl = {},
): void {
  if (!analyses.transient && !analyses.distortion && !analyses.ripple) return;
  // the large-signal figures, each null where it does not apply (contract)
  for (const figure of LARGE_SIGNAL_FIGURES) result.figures[figure] = null;
  const asked = [analyses.transient, analyses.distortion].filter((a) => a !== undefined).length;
  let done = 0;
  const share = (): RunControl => {
    const offset = done;
    return {
      shouldStop: control.shouldStop,
      onProgress: control.onProgress && ((f) => control.onProgress!((offset + f) / Math.max(asked, 1))),
    };
  };
  if (analyses.transient) {
    const t = runTransient(compiled, operatingPointAt(analyses.transient.temperature), analyses.transient, share());
    result.transient = t.result;
    result.figures.settle_time_s = analyses.transient.from === "power-on" ? t.settleTimeS : null;
    done++;
  }
  if (analyses.distortion) {
    const d = runDistortion(compiled, operatingPointAt(analyses.distortion.temperature), analyses.distortion, share());
    result.distortion = d.points;
    Object.assign(result.figures, d.figures);
    done++;
  }
  if (analyses.ripple) {
    const frequencies = Array.from(expandFrequencyRequest(analyses.ripple.frequencies));
    const r = runRipple(compiled, operatingPointAt(analyses.ripple.temperature), frequencies);
    result.ripple = r.result;
    result.figures.supply_rejection_1khz_db = r.rejection1kHzDb;
  }
}
