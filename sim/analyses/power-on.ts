/**
 * Power-on settling (contract): `settle_time_s` is the time until every capsule's polarisation
 * (V(diaphragm) − V(backplate) + electret_voltage) is within POWER_ON_SETTLE_FRACTION (1 %) of its final value,
 * the DC operating point — the last time any capsule is outside that band (it stays inside afterwards), null
 * when a capsule is still outside at the end of the run or there is no capsule.
 */
export const POWER_ON_SETTLE_FRACTION = 0.01;

/**
 * @param time s, ascending
 * @param polarisation per capsule, V, one value per time
 * @param final per capsule, V
 */
export function settleTime(
  time: readonly number[],
  polarisation: readonly (readonly number[])[],
  final: readonly number[],
): number | null {
  if (polarisation.length === 0 || time.length === 0) return null;
  let settled = 0;
  for (let c = 0; c < polarisation.length; c++) {
    const band = POWER_ON_SETTLE_FRACTION * Math.abs(final[c]);
    const series = polarisation[c];
    if (Math.abs(series[series.length - 1] - final[c]) > band) return null;
    for (let i = series.length - 1; i >= 0; i--) {
      if (Math.abs(series[i] - final[c]) > band) {
        // the crossing between samples i and i + 1, by linear interpolation
        const a = Math.abs(series[i] - final[c]) - band;
        const b = band - Math.abs(series[i + 1] - final[c]);
        const t = time[i] + ((time[i + 1] - time[i]) * a) / (a + b || 1);
        settled = Math.max(settled, t);
        break;
      }
    }
  }
  return settled;
}
