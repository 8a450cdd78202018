/** Units the design screen shows and accepts. Everything is stored and sent in millimetres. */
export type LengthUnit = 'mm' | 'in';

export const MM_PER_INCH = 25.4;

/** Decimals shown per unit: 0.001 mm, and 0.0001 in (0.00254 mm), both finer than any printer. */
const DECIMALS: Record<LengthUnit, number> = { mm: 3, in: 4 };

/**
 * A length in mm as text in `unit`, without trailing zeros.
 *
 * @example
 * formatLength(25.4, 'in'); // "1"
 */
export function formatLength(mm: number, unit: LengthUnit): string {
  const value = unit === 'in' ? mm / MM_PER_INCH : mm;
  const factor = 10 ** DECIMALS[unit];
  const rounded = Math.round(value * factor) / factor;
  return String(rounded === 0 ? 0 : rounded);
}

/** A length with its unit symbol, for labels and drawings: "10 mm", "0.3937 in". */
export function withUnit(mm: number, unit: LengthUnit): string {
  return `${formatLength(mm, unit)} ${unit}`;
}

/**
 * Text typed in `unit` to mm. Empty text is `undefined` (the field is left unset); text that is not a
 * number is NaN, so the schema reports it as "must be a number".
 *
 * @example
 * parseLength('1', 'in'); // 25.4
 */
export function parseLength(text: string, unit: LengthUnit): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  const value = Number(trimmed);
  return unit === 'in' ? value * MM_PER_INCH : value;
}
