/** The benchmark's RC ladder: a 1 V AC source into `sections` series-R / shunt-C sections (one net each). */
import { circuit, part } from "../analyses/test-circuits";
import type { ElaboratedCircuit, ElaboratedPart } from "../circuit/types";

export function rcLadder(nets: number): ElaboratedCircuit {
  // nets: "in" plus n1 … n(nets−1)
  const name = (i: number) => (i === 0 ? "in" : `n${i}`);
  const parts: ElaboratedPart[] = [part("V1", "vsource", { p: "in", n: "0" }, { ac: 1 })];
  for (let i = 1; i < nets; i++) {
    parts.push(part(`R${i}`, "resistor", { a: name(i - 1), b: name(i) }, { resistance: 1e3 }));
    parts.push(part(`C${i}`, "capacitor", { a: name(i), b: "0" }, { capacitance: 1e-9 }));
  }
  return circuit(parts, { plus: name(nets - 1) });
}
