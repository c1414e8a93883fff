/** What is selected on the canvas: parts, ground symbols, net labels and wires, by id. */
export interface Selection {
  parts: string[];
  grounds: string[];
  labels: string[];
  wires: string[];
}

export const EMPTY_SELECTION: Selection = { parts: [], grounds: [], labels: [], wires: [] };

export function isEmptySelection(selection: Selection): boolean {
  return selection.parts.length + selection.grounds.length + selection.labels.length + selection.wires.length === 0;
}

/** A canvas item that can be moved. */
export type ItemRef = { kind: "part"; id: string } | { kind: "ground"; id: string } | { kind: "label"; id: string };
