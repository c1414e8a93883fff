/**
 * A statically chosen pivot is accepted when |pivot| ≥ STATIC_PIVOT_RELATIVE_TOLERANCE × (largest magnitude in its
 * original row). Below that, cancellation has eaten the pivot and the static order is not safe for these values:
 * the system is re-solved with dense partial pivoting. 1e-10 keeps about six significant digits in the worst
 * accepted case while never rejecting the well-scaled rows of ordinary circuits (a 1 GΩ node's row is judged
 * against its own 1 nS entries, not against a 1 S row elsewhere).
 */
export const STATIC_PIVOT_RELATIVE_TOLERANCE = 1e-10;

/**
 * Dense partial pivoting declares a column singular when its largest remaining candidate is below this fraction
 * of the largest magnitude in the whole original matrix (a scale-relative zero test).
 */
export const DENSE_SINGULAR_RELATIVE_TOLERANCE = 1e-14;
