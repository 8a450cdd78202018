import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useRef, useState } from 'react';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import { calibrationOffsets } from '../../../../shared/fit/calibration-offsets';
import { deriveCalibration } from '../../../../shared/fit/derive-calibration';
import { formatMm } from '../../../../shared/fit/format-mm';
import { materialMatchesProcess } from '../../../../shared/fit/material-matches-process';
import { couponGrades } from '../../../../shared/geometry/coupon/coupon-grades';
import type { FitTestAnswer, FitTestOutcome } from '../../../../shared/schemas/fit-test-answer';
import { materialSchema } from '../../../../shared/schemas/joint-options';
import type { PrinterProfile } from '../../../../shared/schemas/printer-profile';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useDownloadCoupon } from '../api/download-coupon';
import { useRecordFitTest } from '../api/record-fit-test';
import { couponFormDefaults, couponFormSchema, type CouponForm } from '../lib/coupon-form';
import {
  clearFitTestDraft,
  readFitTestDraft,
  writeFitTestDraft,
  type DraftAnswers,
  type DraftStorage,
} from '../lib/fit-test-draft';
import { CouponSettings } from './coupon-settings';
import { FitTestHistory } from './fit-test-history';
import { FitTestPreview } from './fit-test-preview';

/** What a key (or rail) did in a pocket (or slot), in the words people use at the bench; tightest first. */
export const outcomeWords: Record<FitTestOutcome, string> = {
  'no-entry': 'did not go in',
  forced: 'went in with force',
  snug: 'snug',
  free: 'slid freely',
  wobbly: 'wobbled',
};

const cell = 'rounded-md border border-ink-faint bg-white px-2 py-1';
const words = {
  key: { part: 'pocket', Part: 'Pocket', piece: 'key' },
  dovetail: { part: 'slot', Part: 'Slot', piece: 'rail' },
} as const;
// The answers of each joint and pocket stay apart, so switching the joint never mixes them.
const answerKey = (joint: CouponForm['joint'], p: { mark: string; clearancePerSide: number }) =>
  `${joint}:${p.mark}@${p.clearancePerSide}`;
const sessionDraftStorage = (): DraftStorage | null => {
  try {
    return window.sessionStorage;
  } catch {
    return null;
  }
};

/**
 * A printer's fit-test loop: set up and download a key or dovetail coupon, record what each pocket or slot did,
 * preview the best clearance per fit class, save it as the printer's calibration (editors, owners) and the
 * earlier tests. Settings and answers not saved yet are kept per printer for the browser tab (sessionStorage).
 */
export function FitTestsPanel({
  teamId,
  profile,
  canEdit,
}: {
  teamId: string;
  profile: PrinterProfile;
  canEdit: boolean;
}) {
  const materials = materialSchema.options.filter((m) => materialMatchesProcess(m, profile.process));
  const [storage] = useState(sessionDraftStorage);
  const [draft] = useState(() => {
    const defaults = couponFormDefaults(profile.process, materials[0]!);
    return storage ? readFitTestDraft(storage, profile.id, defaults) : null;
  });
  const form = useForm<CouponForm>({
    resolver: zodResolver(couponFormSchema) as unknown as Resolver<CouponForm>,
    defaultValues: draft?.coupon ?? couponFormDefaults(profile.process, materials[0]!),
    mode: 'onChange',
  });
  const { handleSubmit, control } = form;
  const headingId = useId();
  const download = useDownloadCoupon();
  const record = useRecordFitTest(teamId, profile.id);
  const [answers, setAnswers] = useState<DraftAnswers>(draft?.answers ?? {});
  const [savedId, setSavedId] = useState<string | null>(null);
  const values = useWatch({ control }) as CouponForm;

  // Every change after the first render is the draft (the first is what was just read or the defaults).
  const draftText = JSON.stringify({ coupon: values, answers });
  const firstRender = useRef(true);
  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    if (storage) writeFitTestDraft(storage, profile.id, JSON.parse(draftText));
  }, [draftText, storage, profile.id]);

  const parsed = couponFormSchema.safeParse(values);
  const request = parsed.success ? parsed.data : null;
  const joint = values.joint ?? 'key';
  const w = words[joint];
  const pockets = request
    ? couponGrades(request.clearanceFrom, request.clearanceTo, request.clearanceStep).map((c, n) => ({
        mark: String(n + 1),
        clearancePerSide: c,
      }))
    : [];
  const given: FitTestAnswer[] = pockets.flatMap((p) => {
    const outcome = answers[answerKey(joint, p)];
    return outcome ? [{ ...p, outcome }] : [];
  });
  const reading = given.length > 0 ? deriveCalibration(given) : null;
  const offsets = reading?.ok && request ? calibrationOffsets(profile.process, request.material, reading.best) : null;
  const canSave = !!request && !!reading?.ok && offsets?.problems.length === 0 && !record.isPending;

  const onDownload = handleSubmit(async () => {
    if (!request) return;
    try {
      await download.mutateAsync(request);
    } catch {
      // The mutation's error is shown below the button.
    }
  });
  const onSave = async () => {
    if (!request || !canSave) return;
    setSavedId(null);
    try {
      const test = await record.mutateAsync({
        material: request.material,
        joint: request.joint,
        coupon: request,
        answers: given,
      });
      if (storage) clearFitTestDraft(storage, profile.id);
      setSavedId(test.id);
    } catch {
      // Shown from record.error; the draft stays.
    }
  };
  const answer = (key: string, outcome: FitTestOutcome | '') => {
    const next = { ...answers };
    if (outcome) next[key] = outcome;
    else delete next[key];
    setAnswers(next);
    setSavedId(null);
  };

  return (
    <div className="space-y-8">
      <section aria-labelledby={`${headingId}-coupon`} className="space-y-4">
        <h2 id={`${headingId}-coupon`} className="text-lead font-bold">
          1. Print a coupon
        </h2>
        <p className="text-ink-soft">
          {joint === 'dovetail'
            ? 'A block with a row of numbered slots, each a little looser than the one before, and one short rail at nominal size to slide into each.'
            : 'A small plate with a row of numbered pockets, each a little looser than the one before, and keys at nominal size.'}{' '}
          Print it on {profile.name} without scaling in the slicer.
        </p>
        <form onSubmit={onDownload} noValidate className="space-y-4">
          <CouponSettings form={form} materials={materials} />
          <Button type="submit" disabled={download.isPending}>
            {download.isPending ? 'Preparing the coupon…' : 'Download the coupon (.zip)'}
          </Button>
          {download.error && <Notice tone="error">The coupon could not be made: {download.error.message}</Notice>}
        </form>
      </section>

      <section aria-labelledby={`${headingId}-answers`} className="space-y-4">
        <h2 id={`${headingId}-answers`} className="text-lead font-bold">
          2. Record what each {w.part} did
        </h2>
        {pockets.length === 0 ? (
          <p className="text-ink-soft">Correct the coupon settings above to list its {w.part}s.</p>
        ) : (
          <table className="w-full max-w-2xl border-collapse text-left">
            <caption className="sr-only">
              What the {w.piece} did in each {w.part}
            </caption>
            <thead>
              <tr className="border-b border-ink-faint">
                <th scope="col" className="py-2 pr-4">
                  {w.Part}
                </th>
                <th scope="col" className="py-2 pr-4">
                  Clearance per side
                </th>
                <th scope="col" className="py-2">
                  What the {w.piece} did
                </th>
              </tr>
            </thead>
            <tbody>
              {pockets.map((p) => (
                <tr key={answerKey(joint, p)} className="border-b border-ink-faint">
                  <th scope="row" className="py-2 pr-4 font-medium">
                    {p.mark}
                  </th>
                  <td className="py-2 pr-4">{formatMm(p.clearancePerSide)}</td>
                  <td className="py-2">
                    <select
                      className={cell}
                      aria-label={`What the ${w.piece} did in ${w.part} ${p.mark}`}
                      value={answers[answerKey(joint, p)] ?? ''}
                      onChange={(e) => answer(answerKey(joint, p), e.target.value as FitTestOutcome | '')}
                    >
                      <option value="">not recorded</option>
                      {(Object.keys(outcomeWords) as FitTestOutcome[]).map((o) => (
                        <option key={o} value={o}>
                          {outcomeWords[o]}
                        </option>
                      ))}
                    </select>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <FitTestPreview reading={reading} offsets={offsets} part={w.part} />
        {canEdit ? (
          <div className="space-y-2">
            <Button onClick={onSave} disabled={!canSave}>
              {record.isPending ? 'Saving…' : 'Save to this printer'}
            </Button>
            {!reading && <p className="text-sm text-ink-soft">Record at least one {w.part} to save.</p>}
            {reading && !savedId && (
              <p className="text-sm text-ink-soft">Not saved yet: this tab keeps your answers until you save them.</p>
            )}
          </div>
        ) : (
          <p className="text-sm text-ink-soft">
            Viewers can read the fit tests; an editor or owner of the team records them.
          </p>
        )}
        {record.error && <Notice tone="error">The fit test was not saved: {record.error.message}</Notice>}
        {savedId && !record.error && (
          <Notice tone="success">Saved: the fit engine now uses this calibration for this printer.</Notice>
        )}
      </section>

      <FitTestHistory teamId={teamId} profileId={profile.id} canEdit={canEdit} />
    </div>
  );
}
