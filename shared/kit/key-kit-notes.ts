import type { KeyOptions } from '../schemas/kit-key-options';

const pct = (s: number) => `${Math.round(s * 10000) / 100} %`;
const mm = (v: number) => `${Math.round(v * 1000) / 1000} mm`;

/**
 * Warnings a key kit adds to the fit engine's: a computed key scale below 80 %, a rect key whose scale
 * leaves a different gap along its length, a round key whose scale leaves less at its flat than around its
 * circle (the flat is nearer the centre, (1 − s)·(r − flat) instead of (1 − s)·r), a round key with no flat
 * (it rests on a narrow facet).
 *
 * @param key - resolved key options
 * @param keyScale - the print scale (1 for strategy "clearance")
 * @param clearancePerSide - the clearance across the key width, mm
 * @returns plain-words warnings with the numbers
 * @example
 * keyWarnings({ shape: 'round', flat: 0, … }, 1, 0.15); // ["round keys without a flat …"]
 */
export function keyWarnings(key: KeyOptions, keyScale: number, clearancePerSide: number): string[] {
  const warnings: string[] = [];
  if (keyScale < 0.8) {
    warnings.push(
      `a ${mm(clearancePerSide)} clearance needs the ${mm(key.width)} key printed at ${pct(keyScale)}; below 80 % the key is much weaker than the pocket`,
    );
  }
  if (key.strategy === 'scale' && key.shape === 'rect' && key.length !== undefined) {
    const along = ((1 - keyScale) * key.length) / 2;
    warnings.push(
      `a rect key scaled to ${pct(keyScale)} leaves ${mm(clearancePerSide)} per side across its ${mm(key.width)} width but ${mm(along)} per side along its ${mm(key.length)} length`,
    );
  }
  if (key.strategy === 'scale' && key.shape === 'round' && key.flat > 0) {
    const atFlat = (1 - keyScale) * (key.width / 2 - key.flat);
    warnings.push(
      `a round key scaled to ${pct(keyScale)} leaves ${mm(clearancePerSide)} per side around its ${mm(key.width)} circle but ${mm(atFlat)} at its ${mm(key.flat)} flat`,
    );
  }
  if (key.shape === 'round' && key.flat <= 0) {
    warnings.push(
      'round keys without a flat rest on one narrow facet when printed lying down: add a brim, or ask for a flat (it also stops the key turning)',
    );
  }
  return warnings;
}

/**
 * Print notes for a key kit: how many, which way up, and the scale.
 *
 * @param key - resolved key options
 * @param count - number of keys placed
 * @param keyScale - the print scale (1 for strategy "clearance")
 * @returns plain-words notes
 * @example
 * keyPrintNotes(key, 8, 1)[0]; // "print 8 keys from key.stl"
 */
export function keyPrintNotes(key: KeyOptions, count: number, keyScale: number): string[] {
  const notes = [
    `print ${count} keys from key.stl`,
    'print each key lying down exactly as it is in the file (long axis along x, on the bed at z = 0): the layers then run along the key, so it is strongest across the seam, where it is loaded',
    keyScale < 1
      ? `key.stl is already scaled to ${pct(keyScale)}: print it at 100 % in the slicer, do not scale it again`
      : 'print key.stl at 100 % scale: the clearance is already in the pockets',
  ];
  if (key.shape === 'round' && key.flat > 0)
    notes.push('round keys have a flat: print them resting on it, and line it up with the flat in each pocket');
  return notes;
}
