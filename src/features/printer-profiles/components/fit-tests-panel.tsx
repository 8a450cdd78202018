import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import { calibrationOffsets } from '../../../../shared/fit/calibration-offsets';
import { deriveCalibration } from '../../../../shared/fit/derive-calibration';
import { formatMm } from '../../../../shared/fit/format-mm';
import { materialMatchesProcess } from '../../../../shared/fit/material-matches-process';
import { couponGrades } from '../../../../shared/geometry/coupon/coupon-grades';
import { couponRequestSchema } from '../../../../shared/schemas/coupon-request';
import type { FitTestAnswer, FitTestOutcome } from '../../../../shared/schemas/fit-test-answer';
import { materialSchema, type Material } from '../../../../shared/schemas/joint-options';
import type { PrinterProfile } from '../../../../shared/schemas/printer-profile';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { useDownloadCoupon } from '../api/download-coupon';
import { useRecordFitTest } from '../api/record-fit-test';
import { FitTestHistory } from './fit-test-history';

/** The coupon settings the panel edits: a key coupon, its material and its clearance range. */
interface CouponForm {
  joint: 'key';
  material: Material;
  process: PrinterProfile['process'];
  key: { shape: 'square' | 'round' | 'hex'; width: number; depth: number };
  clearanceFrom: number;
  clearanceTo: number;
  clearanceStep: number;
}

/** What a key did in a pocket, in the words people use at the bench; tightest first. */
export const outcomeWords: Record<FitTestOutcome, string> = {
  'no-entry': 'did not go in',
  forced: 'went in with force',
  snug: 'snug',
  free: 'slid freely',
  wobbly: 'wobbled',
};
const fitWords = { press: 'Press', snug: 'Snug', slide: 'Slide' } as const;

const cell = 'rounded-md border border-ink-faint bg-white px-2 py-1';
const num = { valueAsNumber: true } as const;

/**
 * A printer's fit-test loop: set up and download a key coupon, record what each pocket did, preview the
 * best clearance per fit class, save it as the printer's calibration (editors, owners) and the earlier tests.
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
  const form = useForm<CouponForm>({
    resolver: zodResolver(couponRequestSchema) as unknown as Resolver<CouponForm>,
    defaultValues: {
      joint: 'key',
      process: profile.process,
      material: materials[0]!,
      key: { shape: 'square', width: 8, depth: 4 },
      clearanceFrom: 0,
      clearanceTo: 0.4,
      clearanceStep: 0.05,
    },
    mode: 'onChange',
  });
  const { register, handleSubmit, control, formState } = form;
  const { errors } = formState;
  const headingId = useId();
  const download = useDownloadCoupon();
  const record = useRecordFitTest(teamId, profile.id);
  const [answers, setAnswers] = useState<Record<string, FitTestOutcome | ''>>({});
  const [savedId, setSavedId] = useState<string | null>(null);
  const values = useWatch({ control }) as CouponForm;
  const parsed = couponRequestSchema.safeParse(values);
  const request = parsed.success ? parsed.data : null;
  const pockets = request
    ? couponGrades(request.clearanceFrom, request.clearanceTo, request.clearanceStep).map((c, n) => ({
        mark: String(n + 1),
        clearancePerSide: c,
      }))
    : [];
  const answerKey = (p: { mark: string; clearancePerSide: number }) => `${p.mark}@${p.clearancePerSide}`;
  const given: FitTestAnswer[] = pockets.flatMap((p) => {
    const outcome = answers[answerKey(p)];
    return outcome ? [{ ...p, outcome }] : [];
  });
  const reading = given.length > 0 ? deriveCalibration(given) : null;
  const offsets = reading?.ok && request ? calibrationOffsets(profile.process, request.material, reading.best) : null;
  const canSave = !!request && !!reading?.ok && offsets?.problems.length === 0 && !record.isPending;

  const onDownload = handleSubmit(async (v) => {
    try {
      await download.mutateAsync(v);
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
        joint: 'key',
        coupon: request,
        answers: given,
      });
      setSavedId(test.id);
    } catch {
      // Shown from record.error.
    }
  };

  return (
    <div className="space-y-8">
      <section aria-labelledby={`${headingId}-coupon`} className="space-y-4">
        <h2 id={`${headingId}-coupon`} className="text-lead font-bold">
          1. Print a coupon
        </h2>
        <p className="text-ink-soft">
          A small plate with a row of numbered pockets, each a little looser than the one before, and keys at nominal
          size. Print it on {profile.name} without scaling in the slicer.
        </p>
        <form onSubmit={onDownload} noValidate className="space-y-4">
          <div className="grid gap-3 sm:grid-cols-4">
            <div className="flex flex-col gap-1">
              <label htmlFor={`${headingId}-material`} className="font-medium">
                Material
              </label>
              <select id={`${headingId}-material`} className={cell} {...register('material')}>
                {materials.map((m) => (
                  <option key={m}>{m}</option>
                ))}
              </select>
            </div>
            <div className="flex flex-col gap-1">
              <label htmlFor={`${headingId}-shape`} className="font-medium">
                Key shape
              </label>
              <select id={`${headingId}-shape`} className={cell} {...register('key.shape')}>
                <option value="square">Square</option>
                <option value="round">Round</option>
                <option value="hex">Hexagon</option>
              </select>
            </div>
            <TextField
              label="Key width, mm"
              type="number"
              step="any"
              registration={register('key.width', num)}
              error={errors.key?.width}
            />
            <TextField
              label="Key depth, mm"
              type="number"
              step="any"
              registration={register('key.depth', num)}
              error={errors.key?.depth}
            />
          </div>
          <fieldset className="grid gap-3 sm:grid-cols-3">
            <legend className="font-medium">Clearance per side to test</legend>
            <TextField
              label="From, mm"
              type="number"
              step="any"
              registration={register('clearanceFrom', num)}
              error={errors.clearanceFrom}
            />
            <TextField
              label="To, mm"
              type="number"
              step="any"
              registration={register('clearanceTo', num)}
              error={errors.clearanceTo}
            />
            <TextField
              label="Step, mm"
              type="number"
              step="any"
              registration={register('clearanceStep', num)}
              error={errors.clearanceStep}
            />
          </fieldset>
          <Button type="submit" disabled={download.isPending}>
            {download.isPending ? 'Preparing the coupon…' : 'Download the coupon (.zip)'}
          </Button>
          {download.error && <Notice tone="error">The coupon could not be made: {download.error.message}</Notice>}
        </form>
      </section>

      <section aria-labelledby={`${headingId}-answers`} className="space-y-4">
        <h2 id={`${headingId}-answers`} className="text-lead font-bold">
          2. Record what each pocket did
        </h2>
        {pockets.length === 0 ? (
          <p className="text-ink-soft">Correct the coupon settings above to list its pockets.</p>
        ) : (
          <table className="w-full max-w-2xl border-collapse text-left">
            <caption className="sr-only">What the key did in each pocket</caption>
            <thead>
              <tr className="border-b border-ink-faint">
                <th scope="col" className="py-2 pr-4">
                  Pocket
                </th>
                <th scope="col" className="py-2 pr-4">
                  Clearance per side
                </th>
                <th scope="col" className="py-2">
                  What the key did
                </th>
              </tr>
            </thead>
            <tbody>
              {pockets.map((p) => (
                <tr key={answerKey(p)} className="border-b border-ink-faint">
                  <th scope="row" className="py-2 pr-4 font-medium">
                    {p.mark}
                  </th>
                  <td className="py-2 pr-4">{formatMm(p.clearancePerSide)}</td>
                  <td className="py-2">
                    <select
                      className={cell}
                      aria-label={`What the key did in pocket ${p.mark}`}
                      value={answers[answerKey(p)] ?? ''}
                      onChange={(e) =>
                        setAnswers({ ...answers, [answerKey(p)]: e.target.value as FitTestOutcome | '' })
                      }
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
        <div aria-live="polite" data-testid="fit-test-preview" className="space-y-2">
          {reading && !reading.ok && (
            <Notice tone="warning">
              <p className="font-medium">These answers contradict each other:</p>
              <ul className="list-disc pl-5">
                {reading.problems.map((p) => (
                  <li key={p}>{p}</li>
                ))}
              </ul>
            </Notice>
          )}
          {offsets && (
            <>
              <table className="w-full max-w-2xl border-collapse text-left">
                <caption className="text-left font-medium">Best clearance per fit (mm per side)</caption>
                <thead>
                  <tr className="border-b border-ink-faint">
                    <th scope="col" className="py-2 pr-4">
                      Fit
                    </th>
                    <th scope="col" className="py-2 pr-4">
                      Measured
                    </th>
                    <th scope="col" className="py-2 pr-4">
                      Published default
                    </th>
                    <th scope="col" className="py-2">
                      Difference
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {(['press', 'snug', 'slide'] as const).map((fit) => {
                    const r = offsets.results[fit];
                    return (
                      <tr key={fit} className="border-b border-ink-faint">
                        <th scope="row" className="py-2 pr-4 font-medium">
                          {fitWords[fit]}
                        </th>
                        {r ? (
                          <>
                            <td className="py-2 pr-4">
                              {formatMm(r.clearancePerSide)} (pocket {r.mark})
                            </td>
                            <td className="py-2 pr-4">{formatMm(r.publishedDefault)}</td>
                            <td className="py-2">{formatMm(r.offsetMm, true)}</td>
                          </>
                        ) : (
                          <td colSpan={3} className="py-2 text-ink-soft">
                            not found on this coupon
                          </td>
                        )}
                      </tr>
                    );
                  })}
                </tbody>
              </table>
              {reading?.ok && reading.notes.length > 0 && (
                <ul className="list-disc pl-5 text-sm text-ink-soft">
                  {reading.notes.map((n) => (
                    <li key={n}>{n}</li>
                  ))}
                </ul>
              )}
              {offsets.problems.length > 0 && (
                <Notice tone="warning">
                  <ul className="list-disc pl-5">
                    {offsets.problems.map((p) => (
                      <li key={p}>{p}</li>
                    ))}
                  </ul>
                </Notice>
              )}
            </>
          )}
        </div>
        {canEdit ? (
          <div className="space-y-2">
            <Button onClick={onSave} disabled={!canSave}>
              {record.isPending ? 'Saving…' : 'Save to this printer'}
            </Button>
            {!reading && <p className="text-sm text-ink-soft">Record at least one pocket to save.</p>}
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
