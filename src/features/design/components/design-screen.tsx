import { useDeferredValue, useEffect, useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { kitRequestSchema, type KitRequest } from '../../../../shared/schemas/kit-request';
import { usePreviewBuild } from '../hooks/use-preview-build';
import { useUnits } from '../hooks/use-units';
import { useDesignPresets } from '../hooks/use-design-presets';
import type { DesignLibrary } from '../lib/design-library';
import { DEFAULT_DESIGN, designResolver, type DesignValues } from '../lib/design-values';
import { chosenProfile, chosenTeamMaterial, kitRequestOf, presetText, valuesFromStarter } from '../lib/preset-values';
import { DesignForm } from './design-form';
import { FaceDrawing } from './face-drawing';
import { FitExplanation } from './fit-explanation';
import { KitDownloads } from './kit-downloads';
import { PresetBar } from './preset-bar';
import { StarterPicker } from './starter-picker';
import { PreviewPanel } from './preview/preview-panel';
import { UnitSwitch } from './unit-switch';
import { WarningsAndCautions } from './warnings-and-cautions';

/**
 * The design screen: settings on the left (on top on a phone), the kit's preview, drawing, fit and files
 * beside them.
 *
 * @param library - the current team's presets and printer profiles when someone is signed in, else null
 */
export function DesignScreen({ library }: { library: DesignLibrary | null }) {
  const { unit, setUnit, saveError } = useUnits();
  const form = useForm<DesignValues>({ resolver: designResolver, defaultValues: DEFAULT_DESIGN, mode: 'onChange' });
  const values = useWatch({ control: form.control }) as DesignValues;
  const presets = useDesignPresets(form, library);
  // A printer profile or team material that is gone (deleted, another team's after a switch) is let go, so the
  // typed correction and the catalogue material show again instead of a choice the select cannot show.
  const staleProfile = Boolean(library?.ready && values.printerProfileId && !chosenProfile(values, library));
  const staleMaterial = Boolean(library?.ready && values.teamMaterialId && !chosenTeamMaterial(values, library));
  useEffect(() => {
    if (staleProfile) form.setValue('printerProfileId', '', { shouldValidate: true });
    if (staleMaterial) form.setValue('teamMaterialId', '', { shouldValidate: true });
  }, [form, staleProfile, staleMaterial]);
  // Keyed on the request's text, so a re-render that changes nothing never asks for a new build. The chosen
  // team material and printer profile's calibration are part of it, as in the kit the server builds.
  const requestText = JSON.stringify(kitRequestOf(values, library));
  const parsed = useMemo(() => kitRequestSchema.safeParse(JSON.parse(requestText)), [requestText]);
  const request = parsed.success ? parsed.data : null;
  const asSent = useMemo(
    () => (parsed.success ? (JSON.parse(requestText) as KitRequest) : null),
    [parsed, requestText],
  );
  const preview = usePreviewBuild(request);
  const origin = presets.origin;
  const currentText = presetText(values, library);
  const unchangedOrigin = origin && origin.settingsText === currentText ? origin : null;
  // The 3D view gets each build at once; the drawing, fit and file list follow a moment later, so a new
  // build reaches the screen without waiting for every panel to re-render.
  const kit = useDeferredValue(preview.built?.kit ?? null);
  const failure = useDeferredValue(request !== null ? preview.failure : null);

  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="space-y-1">
          <h1 className="text-title font-bold">Design a joint</h1>
          <p className="text-ink-soft">
            Change any setting and the preview follows. Lengths in {unit === 'mm' ? 'millimetres' : 'inches'}.
          </p>
        </div>
        <UnitSwitch unit={unit} onChange={setUnit} saveError={saveError} />
      </header>
      <div className="grid gap-8 lg:grid-cols-[minmax(20rem,26rem)_1fr]">
        <div className="space-y-6 rounded-card border border-paper-deep bg-white/50 p-4 sm:p-5">
          <StarterPicker
            onPick={(setup) => {
              form.reset(valuesFromStarter(form.getValues(), setup, library));
              // The design no longer comes from a team preset.
              presets.forget();
            }}
          />
          <PresetBar library={library} presets={presets} currentText={currentText} invalid={!request} />
          <DesignForm form={form} unit={unit} team={library} />
        </div>
        <div className="min-w-0 space-y-10">
          <PreviewPanel preview={preview} unit={unit} formInvalid={!request} />
          <FaceDrawing face={request?.face ?? null} kit={kit} failure={failure?.message ?? null} unit={unit} />
          {kit && !failure && <FitExplanation manifest={kit.manifest} unit={unit} />}
          {kit && !failure && <WarningsAndCautions warnings={kit.manifest.warnings} request={kit.manifest.request} />}
          <KitDownloads
            request={asSent}
            kit={kit}
            blocked={Boolean(failure)}
            stl={preview.stl}
            origin={{
              // A download is recorded with its preset only while the design still matches that version.
              presetId: unchangedOrigin?.id ?? null,
              presetVersion: unchangedOrigin?.version ?? null,
              printerProfileId: chosenProfile(values, library)?.id ?? null,
              teamMaterialId: chosenTeamMaterial(values, library)?.id ?? null,
            }}
          />
        </div>
      </div>
    </div>
  );
}
