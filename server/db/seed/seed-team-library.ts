import { eq } from 'drizzle-orm';
import type { Executor } from '../executor';
import type { SessionUser } from '../../auth/sessions';
import { kitDownloads, presets } from '../schema';
import { presetInputSchema } from '../../../shared/schemas/preset';
import { printerProfileInputSchema } from '../../../shared/schemas/printer-profile';
import { teamMaterialInputSchema } from '../../../shared/schemas/material';
import { recordKitSchema } from '../../../shared/schemas/kit-history';
import { PRESET_SETTINGS_VERSION } from '../../../shared/schemas/preset-settings-upgrades';
import { insertProfile } from '../../modules/printer-profiles/printer-profiles.repository';
import { insertMaterial } from '../../modules/materials/materials.repository';
import { createWithFirstVersion, saveVersion } from '../../modules/presets/preset-writes';
import { setArchived } from '../../modules/presets/presets.repository';
import { recordKit } from '../../modules/kit-history/record-kit.service';
import { inlineGeometry } from '../../geometry/inline-geometry';
import { demoKits, demoMaterials, demoPresets, demoPrinters } from './team-library-scenario';

const DAY_MS = 24 * 60 * 60 * 1000;

/** Fills the studio's library once; a studio that already has presets is left alone. */
export async function seedTeamLibrary(
  tx: Executor,
  teamId: string,
  people: { owner: SessionUser; editor: SessionUser },
) {
  const [existing] = await tx.select({ id: presets.id }).from(presets).where(eq(presets.teamId, teamId)).limit(1);
  if (existing) return;
  const { owner, editor } = people;
  const printerIds = new Map<string, string>();
  for (const p of demoPrinters)
    printerIds.set(p.name, await insertProfile(tx, teamId, owner.id, printerProfileInputSchema.parse(p)));
  for (const m of demoMaterials) await insertMaterial(tx, teamId, owner.id, teamMaterialInputSchema.parse(m));

  const presetIds = new Map<string, string>();
  for (const { preset, printer, edits = [], archived } of demoPresets) {
    const input = presetInputSchema.parse({ ...preset, printerProfileId: printer ? printerIds.get(printer) : null });
    const fields = {
      ...input,
      settings: input.settings as Record<string, unknown>,
      schemaVersion: PRESET_SETTINGS_VERSION,
    };
    const id = await createWithFirstVersion(tx, owner, teamId, fields);
    for (const [i, edit] of edits.entries()) {
      const change = presetInputSchema.partial().parse(edit);
      await saveVersion(tx, editor, teamId, id, i + 1, (current) => ({
        ...current,
        ...(change.settings ? { settings: change.settings as Record<string, unknown> } : {}),
      }));
    }
    if (archived) await setArchived(tx, teamId, id, true);
    presetIds.set(preset.name, id);
  }

  for (const kit of demoKits) {
    const source = demoPresets.find((p) => p.preset.name === kit.preset)!;
    // The kit is built from the preset's current version, the one the history names.
    const settings = source.edits?.at(-1)?.settings ?? source.preset.settings;
    const input = recordKitSchema.parse({
      request: { ...settings, face: kit.face },
      presetId: presetIds.get(kit.preset),
    });
    const { id } = await recordKit(tx, inlineGeometry, people[kit.by], teamId, input);
    await tx
      .update(kitDownloads)
      .set({ createdAt: new Date(Date.now() - kit.daysAgo * DAY_MS) })
      .where(eq(kitDownloads.id, id));
  }
}
