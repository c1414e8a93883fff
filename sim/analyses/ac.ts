/**
 * AC analysis (contract): the small-signal response V(plus) − V(minus) at every requested frequency, linearised
 * at the operating point, as { frequency, re, im, magnitude_db, phase_deg }. Warnings: a capsule whose gap the
 * drive closes by more than CAPSULE_GAP_WARNING_FRACTION (the linear capsule model no longer holds).
 */
import { numberValue } from "../devices/device";
import type { AcResult, SimWarning } from "../results";
import type { SmallSignalModel } from "./small-signal";

/** Contract: warn when the drive closes a capsule gap by more than 10 %. */
export const CAPSULE_GAP_WARNING_FRACTION = 0.1;

export function toDecibels(magnitude: number): number {
  return 20 * Math.log10(magnitude);
}

export function runAc(model: SmallSignalModel, frequencies: number[], pressure: number): AcResult {
  const count = frequencies.length;
  const result: AcResult = {
    frequency: frequencies.slice(),
    re: new Array<number>(count),
    im: new Array<number>(count),
    magnitude_db: new Array<number>(count),
    phase_deg: new Array<number>(count),
  };
  const value = { re: 0, im: 0 };
  for (let i = 0; i < count; i++) {
    model.response(frequencies[i], pressure, value);
    result.re[i] = value.re;
    result.im[i] = value.im;
    result.magnitude_db[i] = toDecibels(Math.hypot(value.re, value.im));
    result.phase_deg[i] = (Math.atan2(value.im, value.re) * 180) / Math.PI;
  }
  const warnings = capsuleWarnings(model, pressure);
  if (warnings.length > 0) result.warnings = warnings;
  return result;
}

export function capsuleWarnings(model: SmallSignalModel, pressure: number): SimWarning[] {
  const out: SimWarning[] = [];
  for (const d of model.compiled.devices) {
    if (d.part.kind !== "capsule") continue;
    const closure = Math.abs(numberValue(d.part, "strain_per_pa") * pressure);
    if (closure > CAPSULE_GAP_WARNING_FRACTION) {
      out.push({
        part: d.part.id,
        message: `${d.part.id}: a drive of ${pressure} Pa closes the gap by ${(closure * 100).toFixed(0)} % (more than ${CAPSULE_GAP_WARNING_FRACTION * 100} %); the linear capsule model no longer holds — lower the pressure`,
      });
    }
  }
  return out;
}
