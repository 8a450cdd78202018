/** Taylor terms summed: with |angle| ≤ π the 30th term is below 1e-50, far under rounding. */
const TERMS = 30;

/**
 * The unit vector at a fraction of a full turn, [cos 2πf, sin 2πf], from plain arithmetic (a
 * Taylor series on the angle reduced to [−π, π]) rather than Math.cos / Math.sin, whose last bits
 * may differ between JavaScript engines: layouts must match in the browser and on the server.
 *
 * @param turns - the angle as a fraction of a full turn (0.25 is a quarter turn)
 * @returns [cos, sin], each within about 1e-15 of the exact value
 * @example
 * turnVector(0.25); // [≈0, 1]
 */
export function turnVector(turns: number): [number, number] {
  const a = 2 * Math.PI * (turns - Math.round(turns));
  const a2 = a * a;
  let cos = 1;
  let sin = a;
  let c = 1;
  let s = a;
  for (let n = 1; n <= TERMS; n++) {
    c *= -a2 / ((2 * n - 1) * (2 * n));
    s *= -a2 / (2 * n * (2 * n + 1));
    cos += c;
    sin += s;
  }
  return [cos, sin];
}
