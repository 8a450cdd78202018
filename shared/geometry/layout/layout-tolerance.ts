/**
 * Slack, in mm, allowed when comparing a computed wall or gap with the requested margin.
 * Far below anything a printer resolves; it only absorbs floating-point noise, so a face exactly
 * 16.4 mm wide still takes a 10.4 mm pocket with 3 mm walls (10.4 + 2 × 3 = 16.400000000000002).
 */
export const LAYOUT_EPS_MM = 1e-7;
