/**
 * Supply ripple (contract): the small-signal transfer from the sources with role "supply" to the output with
 * every other drive off (no capsule pressure, no other source's ac), 20·log10 |Vout/Vsupply|. Each supply source
 * is driven by its own ac∠ac_phase; Vsupply is the largest supply `ac` magnitude. A supply source with ac = 0 is
 * driven at 1 (V or A) so the transfer is defined (and with several, each at its own value). Also
 * `supply_rejection_1khz_db`, the same at 1 kHz.
 */
import type { ElaboratedPart } from "../circuit/types";
import { SimError } from "../errors";
import type { RippleResult } from "../results";
import type { CompiledCircuit } from "./compile";
import { phasorSolution, supplySources } from "./drive";
import type { OperatingPoint } from "./op";

export const RIPPLE_FIGURE_FREQUENCY_HZ = 1000;

function withUnitAc(part: ElaboratedPart): ElaboratedPart {
  return part.values.ac === 0 ? { ...part, values: { ...part.values, ac: 1 } } : part;
}

export function runRipple(
  compiled: CompiledCircuit,
  op: OperatingPoint,
  frequencies: readonly number[],
): { result: RippleResult; rejection1kHzDb: number | null } {
  const supplies = supplySources(compiled.circuit.parts);
  if (supplies.length === 0) {
    throw new SimError(
      "invalid_analysis",
      'analyses.ripple: no source has "role": "supply"; mark the supply source(s) to see their rejection',
      {
        field: "analyses.ripple",
      },
    );
  }
  const ids = new Set(supplies.map((p) => p.id));
  const driven = compiled.devices.filter((d) => ids.has(d.part.id));
  // A source with ac = 0 is read through a copy of its part with ac = 1 (the device reads `part.values`).
  const restore = driven.map((d) => {
    const original = d.part;
    (d as { part: ElaboratedPart }).part = withUnitAc(original);
    return () => {
      (d as { part: ElaboratedPart }).part = original;
    };
  });
  const reference = Math.max(...driven.map((d) => Math.abs(d.part.values.ac as number)));
  const plus = compiled.netIndex.get(compiled.circuit.output.plus) ?? -1;
  const minus = compiled.netIndex.get(compiled.circuit.output.minus) ?? -1;
  const transferDb = (f: number): number => {
    const x = phasorSolution(compiled, op, f, driven, 0);
    const re = (plus < 0 ? 0 : x.re[plus]) - (minus < 0 ? 0 : x.re[minus]);
    const im = (plus < 0 ? 0 : x.im[plus]) - (minus < 0 ? 0 : x.im[minus]);
    return 20 * Math.log10(Math.hypot(re, im) / reference);
  };
  try {
    const rejection_db = frequencies.map(transferDb);
    const at1k = transferDb(RIPPLE_FIGURE_FREQUENCY_HZ);
    return {
      result: { frequency: [...frequencies], rejection_db },
      rejection1kHzDb: Number.isFinite(at1k) ? at1k : null,
    };
  } finally {
    for (const r of restore) r();
  }
}
