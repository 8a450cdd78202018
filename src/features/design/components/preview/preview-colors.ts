/** The preview's colours: Seamwright's palette, tuned to read on the bench-grey background. */
export const PREVIEW_COLORS = {
  background: '#e6e1d6',
  halfA: '#3f5f72',
  // #a86f44 on the background is 3.2:1, above the 3:1 WCAG asks of graphics (the gap next to half B).
  halfB: '#a86f44',
  key: '#3d6a4c',
  pocket: '#a8471f',
} as const;

/**
 * The "Cut through" view's flat fills: cut material takes its part's legend colour, unlit, so the halves, the key
 * and the empty gap between them (the background colour) read as a drawing. Dark fills on the light background keep
 * the gap at 3:1 or more against each neighbour (WCAG 2.1, 1.4.11).
 */
export const SECTION_COLORS = {
  halfA: PREVIEW_COLORS.halfA,
  halfB: PREVIEW_COLORS.halfB,
  key: PREVIEW_COLORS.key,
  empty: PREVIEW_COLORS.background,
} as const;
