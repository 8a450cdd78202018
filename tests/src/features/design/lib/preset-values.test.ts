import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { kitRequestSchema, type KitRequest } from '../../../../../shared/schemas/kit-request';
import { withoutFace } from '../../../../../shared/schemas/preset-settings';
import type { PrinterProfile } from '../../../../../shared/schemas/printer-profile';
import { DEFAULT_DESIGN, toKitRequest } from '../../../../../src/features/design/lib/design-values';
import {
  presetText,
  valuesFromPreset,
  withProfileCalibration,
} from '../../../../../src/features/design/lib/preset-values';
import { applyCalibration } from '../../../../../server/modules/kit-history/kit-calibration';
import { dovetailRequestArb, keyRequestArb } from '../../../../shared/kit/kit-request-arbitrary';

const benchFdm = {
  id: '00000000-0000-4000-8000-000000000001',
  name: 'Bench FDM',
  process: 'fdm',
  calibration: [
    { material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-11-02', source: 'fit test' },
    { material: 'PETG', fit: 'slide', offsetMm: 0.04, measuredOn: '2026-11-03', source: 'entered by hand' },
  ],
} as unknown as PrinterProfile;

describe('valuesFromPreset', () => {
  it('puts every saved setting back, so the form sends the preset’s settings unchanged', () => {
    fc.assert(
      fc.property(fc.oneof(keyRequestArb, dovetailRequestArb), (sent: KitRequest) => {
        const parsed = kitRequestSchema.safeParse(sent);
        fc.pre(parsed.success);
        if (!parsed.success) return;
        const settings = withoutFace(parsed.data);
        const values = valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: null }, []);
        const again = kitRequestSchema.parse(toKitRequest(values));
        expect(withoutFace(again)).toEqual(settings);
      }),
      { numRuns: 200 },
    );
  });

  it('keeps the face on screen and the other joint’s settings', () => {
    const settings = withoutFace(
      kitRequestSchema.parse({
        joint: 'dovetail',
        material: 'PETG',
        fit: 'slide',
        face: { shape: 'rect', width: 50, height: 50 },
        dovetail: { rootWidth: 8, height: 5 },
      }),
    );
    const values = valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: null }, []);
    expect(values.face).toEqual(DEFAULT_DESIGN.face);
    expect(values.key).toEqual(DEFAULT_DESIGN.key);
    expect(values.dovetail.rootWidth).toBe(8);
  });

  it('chooses the preset’s printer profile only when the team still has it for that process', () => {
    const settings = withoutFace(kitRequestSchema.parse(toKitRequest(DEFAULT_DESIGN)));
    expect(
      valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: benchFdm.id }, [benchFdm]).printerProfileId,
    ).toBe(benchFdm.id);
    expect(valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: benchFdm.id }, []).printerProfileId).toBe('');
    const resin = { ...benchFdm, process: 'resin' } as PrinterProfile;
    expect(valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: resin.id }, [resin]).printerProfileId).toBe(
      '',
    );
  });
});

describe('presetText', () => {
  it('changes with a saved setting or the printer profile, not with the face', () => {
    const base = presetText(DEFAULT_DESIGN);
    expect(presetText({ ...DEFAULT_DESIGN, face: { ...DEFAULT_DESIGN.face, width: 120 } })).toBe(base);
    expect(presetText({ ...DEFAULT_DESIGN, fit: 'press' })).not.toBe(base);
    expect(presetText({ ...DEFAULT_DESIGN, printerProfileId: benchFdm.id })).not.toBe(base);
  });
});

describe('withProfileCalibration', () => {
  const request = toKitRequest({ ...DEFAULT_DESIGN, printerProfileId: benchFdm.id, calibrationOffset: 0.2 });

  it('drops the typed correction when a profile is chosen and applies its entry for material and fit', () => {
    expect(request.calibrationOffset).toBeUndefined();
    const calibrated = withProfileCalibration(request, benchFdm);
    expect(calibrated.calibrationOffset).toBe(-0.03);
    expect(calibrated.calibrationSource).toContain('"Bench FDM"');
  });

  it('leaves the request alone when the profile has no entry for this material and fit', () => {
    expect(withProfileCalibration({ ...request, fit: 'press' }, benchFdm)).toEqual({ ...request, fit: 'press' });
  });

  it('gives the preview the same request the server builds the downloaded kit from', () => {
    for (const fit of ['press', 'snug', 'slide'] as const) {
      for (const material of ['PLA', 'PETG'] as const) {
        const sent = { ...request, fit, material };
        const preview = kitRequestSchema.parse(withProfileCalibration(sent, benchFdm));
        const server = applyCalibration(kitRequestSchema.parse(sent), benchFdm).request;
        expect(kitRequestSchema.parse(server)).toEqual(preview);
      }
    }
  });
});
