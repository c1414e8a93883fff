/**
 * The starting circuit of a design created without a file: a valid backplate/circuit file with no parts yet, the
 * output across ground, and the default analyses. The bench fills it in; the engine accepts it as it is.
 */
export function emptyCircuit(title: string) {
  return {
    format: "backplate/circuit",
    version: 1,
    title,
    parameters: {},
    parts: [],
    output: { plus: "0", minus: "0" },
    variants: [],
    analyses: { op: {}, ac: { from: 1, to: 100000, points_per_decade: 20 } },
  };
}
