/**
 * The `distortion` analysis request → its output (contract): for each `spl_db` (capsules driven) or `levels`
 * entry (input sources driven, drive.ts), the settled distortion at `frequency` (distortion.ts); and, on a circuit
 * with a capsule, the maximum-SPL figures (max-spl.ts) at the same frequency.
 */
import type { DistortionRequest } from "../circuit/types";
import { SimError } from "../errors";
import type { DistortionPoint, Figures } from "../results";
import type { CompiledCircuit } from "./compile";
import { capsuleGapWarnings, type DistortionSetup, distortionAtLevel } from "./distortion";
import { inputSources, phasorSolution, splAmplitudePa } from "./drive";
import { findMaxSpl } from "./max-spl";
import type { OperatingPoint } from "./op";
import type { RunControl } from "./transient";

function setupFor(
  compiled: CompiledCircuit,
  op: OperatingPoint,
  frequency: number,
  mode: "spl" | "level",
): DistortionSetup {
  const inputs = new Set(inputSources(compiled.circuit.parts).map((p) => p.id));
  const drivers = compiled.devices.filter((d) => (mode === "spl" ? d.part.kind === "capsule" : inputs.has(d.part.id)));
  // phasors of a sine: sources read their own ac∠phase, capsules 1 Pa; scaled per level
  const unitPhasor = phasorSolution(compiled, op, frequency, drivers, mode === "spl" ? 1 : 0);
  return { compiled, op, frequency, mode, unitPhasor };
}

export function runDistortion(
  compiled: CompiledCircuit,
  op: OperatingPoint,
  request: DistortionRequest,
  control: RunControl = {},
): { points: DistortionPoint[]; figures: Figures } {
  const parts = compiled.circuit.parts;
  const hasCapsule = parts.some((p) => p.kind === "capsule");
  const mode = request.splDb ? "spl" : "level";
  if (mode === "spl" && !hasCapsule) {
    throw new SimError(
      "invalid_analysis",
      'analyses.distortion.spl_db: this circuit has no capsule to drive; use "levels" to drive its input sources',
      {
        field: "analyses.distortion.spl_db",
      },
    );
  }
  if (mode === "level" && inputSources(parts).length === 0) {
    throw new SimError(
      "invalid_analysis",
      'analyses.distortion.levels: no source to drive — mark a source with "role": "input" (or give one a non-zero "ac")',
      { field: "analyses.distortion.levels" },
    );
  }
  const setup = setupFor(compiled, op, request.frequency, mode);
  const amounts = request.splDb ?? request.levels ?? [];
  const points: DistortionPoint[] = amounts.map((amount, i) => {
    const r = distortionAtLevel(setup, amount, {
      shouldStop: control.shouldStop,
      onProgress:
        control.onProgress && ((f) => control.onProgress!((hasCapsule ? 0.5 : 1) * ((i + f) / amounts.length))),
    });
    const point: DistortionPoint = {
      ...(mode === "spl" ? { spl_db: amount } : { level: amount }),
      fundamental: r.figures.fundamental,
      harmonics_db: r.figures.harmonics_db,
      thd_percent: r.figures.thd_percent,
    };
    const warnings = mode === "spl" ? capsuleGapWarnings(parts, splAmplitudePa(amount), request.frequency) : [];
    if (!r.settled) {
      warnings.push({
        message: `distortion at ${amount}${mode === "spl" ? " dB SPL" : ""}: the waveform did not become periodic within ${r.periods} periods; the harmonics are those of the last period`,
      });
    }
    if (warnings.length > 0) point.warnings = warnings;
    return point;
  });
  const figures: Figures = {};
  if (hasCapsule) {
    const spl = mode === "spl" ? setup : setupFor(compiled, op, request.frequency, "spl");
    const m = findMaxSpl(spl, {
      shouldStop: control.shouldStop,
      onProgress: control.onProgress && ((f) => control.onProgress!(0.5 + 0.5 * f)),
    });
    figures.max_spl_db = m.max_spl_db;
    figures.max_spl_1pct_db = m.max_spl_1pct_db;
    figures.max_spl_limited_by = m.max_spl_limited_by as unknown as Record<string, unknown> | null;
  }
  return { points, figures };
}
