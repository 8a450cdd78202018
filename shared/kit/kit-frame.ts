/**
 * The coordinate frame of every kit file, in words, for the manifest and the README (issue 3).
 *
 * @example
 * KIT_FRAME.startsWith('Millimetres.'); // true
 */
export const KIT_FRAME =
  'Millimetres. The cut face lies in the plane z = 0, centred on the origin; half A of your model is below it ' +
  '(z ≤ 0), half B above it (z ≥ 0). Pocket and slot cutters are in place in this frame and reach 1 mm past ' +
  'z = 0 into the other half, so a subtraction leaves no thin skin on the face. Rails are in place on the face. ' +
  'Keys are laid on the print bed instead: lowest point at z = 0, long axis along x.';
