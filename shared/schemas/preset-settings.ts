import { z } from 'zod';
import { kitRequestSchema, type KitRequest, type ResolvedKitRequest } from './kit-request';

type OmitFace<T> = T extends unknown ? Omit<T, 'face'> : never;

/** A preset's settings as sent: a kit request without its face, defaults optional. */
export type PresetSettingsInput = OmitFace<KitRequest>;
/** A preset's settings as stored and sent back: every default applied, no face. */
export type PresetSettings = OmitFace<ResolvedKitRequest>;

// No refinement of the kit request looks at the face, so any valid face stands in for the part that will
// be cut later; it is removed again before the settings are stored.
const STAND_IN_FACE = { shape: 'rect', width: 100, height: 100 } as const;

/**
 * A preset's settings: a kit request without its `face` (joint, process, material, fit, clearance,
 * calibration offset, key or dovetail options, format, chord tolerance), checked by the kit request's own
 * rules so a preset never holds settings a kit would refuse. A `face`, if sent, is dropped. The result has
 * every default applied, so a later change of a default never moves an existing preset's geometry.
 *
 * @example
 * presetSettingsSchema.parse({ joint: 'key', material: 'PLA', fit: 'snug',
 *   key: { shape: 'square', width: 10, depth: 8 } }).process; // "fdm"
 */
export const presetSettingsSchema = z.unknown().transform((input, ctx): PresetSettings => {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    ctx.addIssue({ code: 'custom', message: 'settings must be an object: a kit request without its face' });
    return z.NEVER;
  }
  const { face: _ignored, ...rest } = input as Record<string, unknown>;
  const parsed = kitRequestSchema.safeParse({ ...rest, face: STAND_IN_FACE });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
    return z.NEVER;
  }
  return withoutFace(parsed.data);
});

/**
 * The settings of a resolved kit request (its face removed).
 *
 * @param request - a resolved kit request
 * @returns the same request without `face`
 */
export function withoutFace(request: ResolvedKitRequest): PresetSettings {
  const { face: _face, ...settings } = request;
  return settings as PresetSettings;
}
