/** The bench document: circuit file + layout, and the pure functions between the drawing and the circuit. */
export * from "./auto-layout";
export * from "./circuit";
export * from "./document";
export * from "./ids";
export * from "./import-file";
export * from "./layout";
export * from "./nets";
export * from "./part-defaults";
