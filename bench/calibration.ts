/**
 * Calibration loop: one multiply-add per (position, pair) element in a tight Float64Array loop,
 * the floor any exact scan over every element is measured against. The pair loop is outside so
 * the accumulator stays in a register (the fastest of the plain arrangements on V8).
 */

/** sum: `Σ_i Σ_p p θ_i`, returned so the work cannot be optimised away. */
export function calibrationLoop(theta: Float64Array, span: number): number {
  let total = 0;
  for (const x of theta) {
    let acc = 0;
    for (let p = 0; p < span; p++) acc += p * x;
    total += acc;
  }
  return total;
}
