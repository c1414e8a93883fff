/**
 * The `transient` analysis request → its output document (contract): `{ time, output, nets: { NAME: [] } }` for
 * the probed nets, each capsule's polarisation against time, and — from power-on — `settle_time_s`
 * (power-on.ts). Every accepted time point is reported.
 */
import type { TransientRequest } from "../circuit/types";
import { SimError } from "../errors";
import type { SimWarning, TransientResult } from "../results";
import type { CompiledCircuit } from "./compile";
import { capsuleGapWarnings } from "./distortion";
import { Drive } from "./drive";
import type { OperatingPoint } from "./op";
import { settleTime } from "./power-on";
import { type RunControl, TransientRun } from "./transient";

export function runTransient(
  compiled: CompiledCircuit,
  op: OperatingPoint,
  request: TransientRequest,
  control: RunControl = {},
): { result: TransientResult; settleTimeS: number | null } {
  const netIndex = compiled.netIndex;
  request.probe.forEach((net, i) => {
    if (!netIndex.has(net)) {
      throw new SimError(
        "invalid_analysis",
        `analyses.transient.probe[${i}]: there is no net "${net}" in this circuit; probe one of its nets`,
        { field: `analyses.transient.probe[${i}]`, net },
      );
    }
  });
  const parts = compiled.circuit.parts;
  const drive = request.drive ? new Drive(request.drive, parts) : null;
  const warnings: SimWarning[] = [];
  if (drive && request.drive?.splDb !== undefined) {
    if (!parts.some((p) => p.kind === "capsule")) {
      throw new SimError(
        "invalid_analysis",
        'analyses.transient.drive.spl_db: this circuit has no capsule to drive; use "level" to drive its input sources',
        {
          field: "analyses.transient.drive.spl_db",
        },
      );
    }
    warnings.push(...capsuleGapWarnings(parts, drive.pressureAmplitude, drive.frequency));
  }
  const run = new TransientRun(compiled, op, {
    start: request.from === "power-on" ? "power-on" : "op",
    maxStep: request.step,
    drive,
  });
  const at = (x: Float64Array, i: number) => (i < 0 ? 0 : x[i]);
  const plus = netIndex.get(compiled.circuit.output.plus) ?? -1;
  const minus = netIndex.get(compiled.circuit.output.minus) ?? -1;
  const probes = request.probe.map((net) => netIndex.get(net) ?? -1);
  const capsules = parts
    .filter((p) => p.kind === "capsule")
    .map((p) => ({
      id: p.id,
      d: netIndex.get(p.pins.diaphragm) ?? -1,
      b: netIndex.get(p.pins.backplate) ?? -1,
      electret: p.values.electret_voltage as number,
    }));
  const result: TransientResult = { time: [], output: [], nets: {}, polarisation: {} };
  const nets: number[][] = request.probe.map(() => []);
  const polarisation: number[][] = capsules.map(() => []);
  const record = (t: number, x: Float64Array) => {
    result.time.push(t);
    result.output.push(at(x, plus) - at(x, minus));
    for (let k = 0; k < probes.length; k++) nets[k].push(at(x, probes[k]));
    for (let k = 0; k < capsules.length; k++) {
      const c = capsules[k];
      polarisation[k].push(at(x, c.d) - at(x, c.b) + c.electret);
    }
  };
  record(0, run.x);
  run.advance(request.stop, record, control);
  request.probe.forEach((net, k) => {
    result.nets[net] = nets[k];
  });
  capsules.forEach((c, k) => {
    result.polarisation![c.id] = polarisation[k];
  });
  if (capsules.length === 0) delete result.polarisation;
  if (warnings.length > 0) result.warnings = warnings;
  let settleTimeS: number | null = null;
  if (request.from === "power-on" && capsules.length > 0) {
    const final = capsules.map((c) => at(op.x, c.d) - at(op.x, c.b) + c.electret);
    settleTimeS = settleTime(result.time, polarisation, final);
    if (settleTimeS === null) {
      result.warnings = [
        ...(result.warnings ?? []),
        {
          message: `a capsule's polarisation is still more than 1 % from its final value at the end of the run (${request.stop} s); lengthen analyses.transient.stop to see it settle`,
        },
      ];
    }
  }
  return { result, settleTimeS };
}
