/** The preview's colours: Seamwright's palette, tuned to read on the bench-grey background. */
export const PREVIEW_COLORS = {
  background: '#e6e1d6',
  halfA: '#3f5f72',
  halfB: '#b0764a',
  key: '#3d6a4c',
  pocket: '#a8471f',
} as const;
