import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { kitRequestSchema, type KitRequest } from '../../../../../shared/schemas/kit-request';
import { withoutFace } from '../../../../../shared/schemas/preset-settings';
import type { PrinterProfile } from '../../../../../shared/schemas/printer-profile';
import { DEFAULT_DESIGN, toKitRequest } from '../../../../../src/features/design/lib/design-values';
import {
  kitRequestOf,
  presetRequest,
  presetText,
  savedPresetText,
  valuesFromStarter,
  type TeamChoices,
  valuesFromPreset,
  withProfileCalibration,
} from '../../../../../src/features/design/lib/preset-values';
import { applyCalibration } from '../../../../../server/modules/kit-history/kit-calibration';
import { applyTeamMaterial } from '../../../../../server/modules/kit-history/kit-material';
import type { TeamMaterial } from '../../../../../shared/schemas/material';
import { STARTER_SETUPS } from '../../../../../src/features/design/lib/starter-setups';
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

const greyPla = {
  id: '00000000-0000-4000-8000-000000000002',
  name: 'Grey matte PLA',
  baseMaterial: 'PLA',
  clearanceAdjustments: { press: 0.01, snug: 0.03, slide: 0.05 },
} as const;
const team: TeamChoices = { printerProfiles: [benchFdm], teamMaterials: [greyPla] };

const extrasArb = fc.record({
  offset: fc.integer({ min: -50, max: 50 }).map((n) => n / 1000),
  source: fc.option(fc.constantFrom('fit test of the corner printer', 'entered by hand'), { nil: undefined }),
  tuning: fc.option(
    fc.record({
      name: fc.constantFrom('Chalk-white PLA', 'Night-blue PETG'),
      clearanceAdjustment: fc.integer({ min: -50, max: 50 }).map((n) => n / 1000),
    }),
    { nil: undefined },
  ),
});

describe('valuesFromPreset', () => {
  it('puts every saved setting back, so the form sends the preset’s settings unchanged', () => {
    fc.assert(
      fc.property(fc.oneof(keyRequestArb, dovetailRequestArb), extrasArb, (base: KitRequest, extras) => {
        // What only presets carry: whose correction it was, and a team material's tuning.
        const sent = {
          ...base,
          ...(extras.source ? { calibrationOffset: extras.offset, calibrationSource: extras.source } : {}),
          ...(extras.tuning ? { materialTuning: extras.tuning } : {}),
        };
        const parsed = kitRequestSchema.safeParse(sent);
        fc.pre(parsed.success);
        if (!parsed.success) return;
        const settings = withoutFace(parsed.data);
        const values = valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: null }, null);
        const again = kitRequestSchema.parse(toKitRequest(values));
        expect(withoutFace(again)).toEqual(settings);
        // …so the screen calls the design unchanged.
        expect(presetText(values, null)).toBe(savedPresetText({ settings, printerProfileId: null }));
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
    const values = valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: null }, null);
    expect(values.face).toEqual(DEFAULT_DESIGN.face);
    expect(values.key).toEqual(DEFAULT_DESIGN.key);
    expect(values.dovetail.rootWidth).toBe(8);
  });

  it('chooses the preset’s printer profile only when the team still has it for that process', () => {
    const settings = withoutFace(kitRequestSchema.parse(toKitRequest(DEFAULT_DESIGN)));
    expect(valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: benchFdm.id }, team).printerProfileId).toBe(
      benchFdm.id,
    );
    expect(valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: benchFdm.id }, null).printerProfileId).toBe(
      '',
    );
    const resin = { ...benchFdm, process: 'resin' } as PrinterProfile;
    expect(
      valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: resin.id }, { ...team, printerProfiles: [resin] })
        .printerProfileId,
    ).toBe('');
  });
});

describe('presetText', () => {
  it('changes with a saved setting or the printer profile, not with the face', () => {
    const base = presetText(DEFAULT_DESIGN, team);
    expect(presetText({ ...DEFAULT_DESIGN, face: { ...DEFAULT_DESIGN.face, width: 120 } }, team)).toBe(base);
    expect(presetText({ ...DEFAULT_DESIGN, fit: 'press' }, team)).not.toBe(base);
    expect(presetText({ ...DEFAULT_DESIGN, printerProfileId: benchFdm.id }, team)).not.toBe(base);
    expect(presetText({ ...DEFAULT_DESIGN, teamMaterialId: greyPla.id }, team)).not.toBe(base);
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

describe('team materials', () => {
  const design = { ...DEFAULT_DESIGN, teamMaterialId: greyPla.id, printerProfileId: benchFdm.id };

  it('saves the team material’s tuning for the fit class with a preset, but not the calibration', () => {
    const request = presetRequest(design, team);
    expect(request.materialTuning).toEqual({ name: 'Grey matte PLA', clearanceAdjustment: 0.03 });
    expect(request.calibrationOffset).toBeUndefined();
  });

  it('ignores a team material of another base material', () => {
    expect(presetRequest({ ...design, material: 'PETG' }, team).materialTuning).toBeUndefined();
  });

  it('finds the team material of a loaded preset by name, or keeps the saved tuning when it is gone', () => {
    const settings = withoutFace(kitRequestSchema.parse(presetRequest(design, team)));
    expect(valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: null }, team)).toMatchObject({
      teamMaterialId: greyPla.id,
      materialTuning: undefined,
    });
    const gone = valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: null }, null);
    expect(gone.teamMaterialId).toBe('');
    expect(toKitRequest(gone).materialTuning).toEqual({ name: 'Grey matte PLA', clearanceAdjustment: 0.03 });
  });

  it('builds the preview from the same request the server builds the kit from', () => {
    const preview = kitRequestSchema.parse(kitRequestOf(design, team));
    const server = applyCalibration(
      applyTeamMaterial(kitRequestSchema.parse(toKitRequest(design)), { ...greyPla, process: 'fdm' } as TeamMaterial),
      benchFdm,
    ).request;
    expect(kitRequestSchema.parse(server)).toEqual(preview);
    // 0.16 mm published snug default on FDM (REFERENCES §7.2) + 0.03 team material − 0.03 printer calibration.
    expect(preview.materialTuning?.clearanceAdjustment).toBe(0.03);
    expect(preview.calibrationOffset).toBe(-0.03);
  });
});

describe('savedPresetText', () => {
  it('shows a loaded preset as changed when the form could not keep its printer profile', () => {
    const settings = withoutFace(kitRequestSchema.parse(toKitRequest(DEFAULT_DESIGN)));
    const saved = { settings, printerProfileId: benchFdm.id };
    expect(presetText(valuesFromPreset(DEFAULT_DESIGN, saved, team), team)).toBe(savedPresetText(saved));
    expect(presetText(valuesFromPreset(DEFAULT_DESIGN, saved, null), null)).not.toBe(savedPresetText(saved));
  });

  it('shows it as changed when its team material’s adjustment changed since it was saved', () => {
    const settings = withoutFace(
      kitRequestSchema.parse({
        ...toKitRequest(DEFAULT_DESIGN),
        materialTuning: { name: greyPla.name, clearanceAdjustment: 0.01 },
      }),
    );
    const saved = { settings, printerProfileId: null };
    expect(presetText(valuesFromPreset(DEFAULT_DESIGN, saved, team), team)).not.toBe(savedPresetText(saved));
  });

  it('drops whose correction it was once the correction is typed anew', () => {
    const settings = withoutFace(
      kitRequestSchema.parse({
        ...toKitRequest(DEFAULT_DESIGN),
        calibrationOffset: -0.02,
        calibrationSource: 'fit test',
      }),
    );
    const values = valuesFromPreset(DEFAULT_DESIGN, { settings, printerProfileId: null }, null);
    expect(toKitRequest(values).calibrationSource).toBe('fit test');
    expect(toKitRequest({ ...values, calibrationOffset: -0.04 }).calibrationSource).toBeUndefined();
  });
});

describe('valuesFromStarter', () => {
  it('takes the setup’s face and settings and keeps a printer of the same process', () => {
    const figure = STARTER_SETUPS.find((s) => s.id === 'figure-seam')!;
    const values = valuesFromStarter({ ...DEFAULT_DESIGN, printerProfileId: benchFdm.id }, figure, team);
    expect(values.face).toMatchObject({ shape: 'rect', width: 40, height: 30 });
    expect(values.printerProfileId).toBe(benchFdm.id);
    const resin = STARTER_SETUPS.find((s) => s.id === 'resin-detail')!;
    expect(valuesFromStarter({ ...DEFAULT_DESIGN, printerProfileId: benchFdm.id }, resin, team).printerProfileId).toBe(
      '',
    );
  });
});
