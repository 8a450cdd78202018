import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import { calibrationOffsets } from '../../../shared/fit/calibration-offsets';
import { deriveCalibration } from '../../../shared/fit/derive-calibration';
import { materialMatchesProcess } from '../../../shared/fit/material-matches-process';
import { fitTestSource, type FitTest, type ParsedFitTestInput } from '../../../shared/schemas/fit-test';
import type { PrinterProfile } from '../../../shared/schemas/printer-profile';
import { recordAudit } from '../audit/audit.service';
import { requireTeamRole } from '../teams/team-access';
import { findProfile } from '../printer-profiles/printer-profiles.repository';
import * as repo from './fit-tests.repository';
import { mergeCalibration } from './merge-calibration';

const NO_PROFILE = 'There is no such printer profile in this team.';
const NO_TEST = 'There is no such fit test for this printer profile.';
const processWords = (p: string) => (p === 'fdm' ? 'an FDM' : 'a resin');
const dayOf = (d: Date) => d.toISOString().slice(0, 10);

/** A stored test as the API answers it: offsets against today's published defaults, and whether it is current. */
function toFitTest(t: repo.StoredFitTest, profile: PrinterProfile): FitTest {
  const source = fitTestSource(t.id);
  return {
    ...t,
    results: calibrationOffsets(profile.process, t.material, t.best).results,
    current: profile.calibration.some((e) => e.source === source),
    createdAt: t.createdAt.toISOString(),
  };
}

async function profileOf(ctx: AppContext, teamId: string, profileId: string): Promise<PrinterProfile> {
  const profile = await findProfile(ctx.db, teamId, profileId);
  if (!profile) throw new AppError('NOT_FOUND', NO_PROFILE);
  return profile;
}

function requireMaterialFits(profile: PrinterProfile, input: ParsedFitTestInput): void {
  if (!materialMatchesProcess(input.material, profile.process)) {
    throw new AppError(
      'VALIDATION_FAILED',
      `${input.material} is not printed on ${processWords(profile.process)} printer.`,
      [{ path: 'material', message: `Choose a material that "${profile.name}" prints.` }],
    );
  }
  const couponProcess = input.coupon.request?.process;
  if (couponProcess !== undefined && couponProcess !== profile.process) {
    throw new AppError('VALIDATION_FAILED', `The coupon was made for ${processWords(String(couponProcess))} printer.`, [
      { path: 'coupon.process', message: `"${profile.name}" is ${processWords(profile.process)} printer.` },
    ]);
  }
}

/** The profile's fit tests, newest first; any member. */
export async function listFitTests(ctx: AppContext, user: SessionUser, teamId: string, profileId: string) {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const profile = await profileOf(ctx, teamId, profileId);
  const tests = await repo.listFitTests(ctx.db, teamId, profileId);
  return { items: tests.map((t) => toFitTest(t, profile)) };
}

/** One fit test; any member. */
export async function getFitTest(ctx: AppContext, user: SessionUser, teamId: string, profileId: string, id: string) {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const profile = await profileOf(ctx, teamId, profileId);
  const test = await repo.findFitTest(ctx.db, teamId, profileId, id);
  if (!test) throw new AppError('NOT_FOUND', NO_TEST);
  return toFitTest(test, profile);
}

/**
 * Records a printed coupon's answers; editors and owners. Contradictory answers, or a result too far from
 * the published default to be an offset, answer 422 with the reasons and write nothing. Otherwise one
 * transaction stores the test and writes its offsets into the profile's calibration (dated today, linked
 * to the test); a class the coupon did not find keeps its older entry and the notes say what to test next.
 */
export async function recordFitTest(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  profileId: string,
  input: ParsedFitTestInput,
): Promise<FitTest> {
  await requireTeamRole(ctx.db, teamId, user, 'editor');
  const profile = await profileOf(ctx, teamId, profileId);
  requireMaterialFits(profile, input);
  const reading = deriveCalibration(input.answers);
  if (!reading.ok) throw refused('The answers contradict each other', reading.problems);
  const id = await ctx.db.transaction(async (tx) => {
    if (!(await repo.lockProfile(tx, teamId, profileId))) throw new AppError('NOT_FOUND', NO_PROFILE);
    const locked = (await findProfile(tx, teamId, profileId))!;
    requireMaterialFits(locked, input);
    const { results, problems } = calibrationOffsets(locked.process, input.material, reading.best);
    if (problems.length > 0) throw refused('The result is too far from the published default', problems);
    const testId = await repo.insertFitTest(tx, {
      teamId,
      printerProfileId: profileId,
      ...input,
      best: reading.best,
      notes: reading.notes,
      createdBy: user.id,
    });
    const calibration = mergeCalibration(
      locked.calibration,
      input.material,
      results,
      dayOf(new Date()),
      fitTestSource(testId),
    );
    await repo.setCalibration(tx, teamId, profileId, user.id, calibration);
    await recordAudit(tx, teamId, user, 'fit_test.recorded', locked.name, { material: input.material, testId });
    return testId;
  });
  return getFitTest(ctx, user, teamId, profileId, id);
}

/**
 * Makes an older fit test current again; editors and owners: its offsets (against today's published
 * defaults) replace the profile's entries for its material and the classes it measured, dated the day
 * the test was recorded.
 */
export async function makeFitTestCurrent(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  profileId: string,
  id: string,
): Promise<FitTest> {
  await requireTeamRole(ctx.db, teamId, user, 'editor');
  await ctx.db.transaction(async (tx) => {
    if (!(await repo.lockProfile(tx, teamId, profileId))) throw new AppError('NOT_FOUND', NO_PROFILE);
    const profile = (await findProfile(tx, teamId, profileId))!;
    const test = await repo.findFitTest(tx, teamId, profileId, id);
    if (!test) throw new AppError('NOT_FOUND', NO_TEST);
    // The profile may have changed process since: its calibration would then not apply.
    if (!materialMatchesProcess(test.material, profile.process)) {
      throw refused(`${test.material} is not printed on ${processWords(profile.process)} printer any more`, []);
    }
    const { results, problems } = calibrationOffsets(profile.process, test.material, test.best);
    if (problems.length > 0) throw refused('The result is too far from the published default', problems);
    const calibration = mergeCalibration(
      profile.calibration,
      test.material,
      results,
      dayOf(test.createdAt),
      fitTestSource(id),
    );
    await repo.setCalibration(tx, teamId, profileId, user.id, calibration);
    await recordAudit(tx, teamId, user, 'fit_test.made_current', profile.name, { material: test.material, testId: id });
  });
  return getFitTest(ctx, user, teamId, profileId, id);
}

function refused(summary: string, problems: string[]): AppError {
  const message = problems.length > 0 ? `${summary}: ${problems.join('; ')}` : `${summary}.`;
  return new AppError(
    'UNPROCESSABLE',
    message,
    problems.map((p) => ({ path: 'answers', message: p })),
  );
}
