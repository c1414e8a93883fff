/** A harmonic's level in dB relative to the fundamental → percent of the fundamental (20·log10 of an amplitude ratio). */
export function harmonicPercent(db: number): number {
  return 100 * 10 ** (db / 20);
}
