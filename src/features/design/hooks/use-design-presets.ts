import { useCallback, useEffect, useState } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import type { Preset } from '../../../../shared/schemas/preset';
import type { DesignLibrary, PresetOrigin } from '../lib/design-library';
import type { DesignValues } from '../lib/design-values';
import { chosenProfile, presetRequest, savedPresetText, settingsOf, valuesFromPreset } from '../lib/preset-values';

/** What saving the design as the next version of its preset ended in. */
export type VersionSave = { kind: 'saved'; preset: Preset } | { kind: 'conflict'; current: Preset };

const originOf = (preset: Preset): PresetOrigin => ({
  id: preset.id,
  name: preset.name,
  version: preset.version,
  settingsText: savedPresetText(preset),
});

const bodyOf = (values: DesignValues, library: DesignLibrary | null) => ({
  settings: settingsOf(presetRequest(values, library)),
  printerProfileId: chosenProfile(values, library)?.id ?? null,
});

/**
 * Presets on the design screen: load one into the form (the face stays), save the design as a new preset,
 * or save it as the next version of the preset it came from. The origin remembers which preset and version
 * the design came from, so downloads are recorded with it and a stale save is caught (409) instead of
 * overwriting someone else's version.
 */
export function useDesignPresets(form: UseFormReturn<DesignValues>, library: DesignLibrary | null) {
  const [origin, setOrigin] = useState<PresetOrigin | null>(null);

  const apply = useCallback(
    (preset: Preset) => {
      const values = valuesFromPreset(form.getValues(), preset, library);
      form.reset(values);
      setOrigin(originOf(preset));
    },
    [form, library],
  );

  const load = useCallback(
    async (id: string) => {
      if (!library) throw new Error('Sign in to use your team’s presets.');
      apply(await library.loadPreset(id));
    },
    [library, apply],
  );

  const saveNew = useCallback(
    async (fields: { name: string; description?: string }) => {
      if (!library) throw new Error('Sign in to save presets.');
      const values = form.getValues();
      const preset = await library.createPreset({ ...fields, ...bodyOf(values, library) });
      setOrigin(originOf(preset));
      return preset;
    },
    [library, form],
  );

  /** Saves over `baseVersion` (the origin's version, or the newer one a conflict showed). */
  const saveVersion = useCallback(
    async (baseVersion: number): Promise<VersionSave> => {
      if (!library || !origin) throw new Error('Load a preset first.');
      const values = form.getValues();
      const result = await library.updatePreset(origin.id, { baseVersion, ...bodyOf(values, library) });
      if ('conflict' in result) return { kind: 'conflict', current: result.conflict };
      setOrigin(originOf(result.saved));
      return { kind: 'saved', preset: result.saved };
    },
    [library, origin, form],
  );

  // A preset belongs to one team: after a switch, the design no longer comes from one of this team's presets.
  const teamId = library?.teamId ?? null;
  useEffect(() => setOrigin(null), [teamId]);

  const forget = useCallback(() => setOrigin(null), []);
  return { origin, load, apply, saveNew, saveVersion, forget };
}
