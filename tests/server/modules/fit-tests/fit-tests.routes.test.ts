import { describe, expect, it } from 'vitest';
import { useAuthApp } from '../../../helpers/auth-app';
import { benchFdm, libraryTeam } from '../presets/library-helpers';
import { answersOf, cleanAnswers, fitTestBody, range } from './fit-test-fixtures';

interface Entry {
  material: string;
  fit: string;
  offsetMm: number;
  measuredOn: string;
  source: string;
}
const today = () => new Date().toISOString().slice(0, 10);
const offsets = (calibration: Entry[]) =>
  Object.fromEntries(calibration.filter((e) => e.material === 'PLA').map((e) => [e.fit, e.offsetMm]));

// PLA on FDM, published defaults from shared/fit/clearance-defaults.ts: press 0.10, snug 0.16, slide 0.25 mm.
const cases = [
  {
    name: 'writes press, snug and slide offsets when the answers are clean',
    answers: cleanAnswers,
    status: 201,
    results: {
      press: { clearancePerSide: 0.05, publishedDefault: 0.1, offsetMm: -0.05, mark: '2' },
      snug: { clearancePerSide: 0.15, publishedDefault: 0.16, offsetMm: -0.01, mark: '4' },
      slide: { clearancePerSide: 0.25, publishedDefault: 0.25, offsetMm: 0, mark: '6' },
    },
    calibration: { press: -0.05, snug: -0.01, slide: 0 },
    notes: [],
  },
  {
    name: 'writes only the classes found and keeps the older snug entry when no pocket was snug',
    answers: answersOf('no-entry', 'forced', 'forced', 'free', 'free', 'wobbly'),
    status: 201,
    results: {
      press: { clearancePerSide: 0.05, publishedDefault: 0.1, offsetMm: -0.05, mark: '2' },
      slide: { clearancePerSide: 0.15, publishedDefault: 0.25, offsetMm: -0.1, mark: '4' },
    },
    // The profile's hand-entered PLA snug −0.03 mm stays.
    calibration: { press: -0.05, snug: -0.03, slide: -0.1 },
    notes: [expect.stringContaining('no pocket gave a snug fit: it lies between 0.10 mm')],
  },
  {
    name: 'refuses contradictory answers with both marks and writes nothing',
    answers: answersOf('no-entry', 'forced', 'snug', 'forced', 'free'),
    status: 422,
    problem: 'pocket 3 (0.10 mm) was snug but the looser pocket 4 (0.15 mm) went in only with force',
    calibration: { snug: -0.03 },
  },
] as const;

describe('fit test routes', () => {
  const { app, db } = useAuthApp();

  async function team() {
    const t = await libraryTeam(app, db);
    const profile = (await t.owner.agent.post(`${t.base}/printer-profiles`).send(benchFdm)).body;
    return { ...t, profile, tests: `${t.base}/printer-profiles/${profile.id}/fit-tests` };
  }

  for (const c of cases) {
    it(`${c.name}`, async () => {
      const { editor, viewer, base, profile, tests } = await team();
      const res = await editor.agent.post(tests).send(fitTestBody([...c.answers]));
      expect(res.status, JSON.stringify(res.body)).toBe(c.status);
      const after = (await viewer.agent.get(`${base}/printer-profiles/${profile.id}`)).body;
      expect(offsets(after.calibration)).toEqual(c.calibration);
      const list = (await viewer.agent.get(tests)).body.items;
      if (c.status === 422) {
        expect(res.body.error.code).toBe('UNPROCESSABLE');
        expect(res.body.error.message).toContain(c.problem);
        expect(list).toEqual([]);
        return;
      }
      expect(res.body).toMatchObject({ material: 'PLA', joint: 'key', coupon: range, current: true });
      expect(res.body.results).toEqual(c.results);
      expect(res.body.notes).toEqual(c.notes);
      for (const fit of Object.keys(c.results)) {
        expect(after.calibration).toContainEqual({
          material: 'PLA',
          fit,
          offsetMm: c.calibration[fit as keyof typeof c.calibration],
          measuredOn: today(),
          source: `fit test ${res.body.id}`,
        });
      }
      expect(list).toEqual([res.body]);
      expect((await viewer.agent.get(`${tests}/${res.body.id}`)).body).toEqual(res.body);
    });
  }

  it('lets a viewer read fit tests but not record one or make one current', async () => {
    const { editor, viewer, tests } = await team();
    const recorded = await editor.agent.post(tests).send(fitTestBody(cleanAnswers));
    expect((await viewer.agent.get(tests)).status).toBe(200);
    const refused = await viewer.agent.post(tests).send(fitTestBody(cleanAnswers));
    expect(refused.status).toBe(403);
    expect((await viewer.agent.post(`${tests}/${recorded.body.id}/make-current`)).status).toBe(403);
    expect((await viewer.agent.get(tests)).body.items).toHaveLength(1);
  });

  it('refuses repeated marks, no answers, and a material the printer does not print', async () => {
    const { editor, tests } = await team();
    const twice = await editor.agent
      .post(tests)
      .send(fitTestBody([cleanAnswers[0]!, { ...cleanAnswers[1]!, mark: '1' }]));
    expect(twice.status).toBe(400);
    expect(twice.body.error.issues).toContainEqual({ path: 'answers.1.mark', message: 'Pocket 1 is answered twice.' });
    expect((await editor.agent.post(tests).send(fitTestBody([]))).body.error.issues[0].path).toBe('answers');
    const resin = await editor.agent.post(tests).send(fitTestBody(cleanAnswers, 'resin-standard'));
    expect(resin.status).toBe(400);
    expect(resin.body.error.issues[0].path).toBe('material');
    const outside = await editor.agent
      .post(tests)
      .send(fitTestBody([{ mark: '1', clearancePerSide: 0.6, outcome: 'free' }]));
    expect(outside.body.error.issues[0].path).toBe('answers.0.clearancePerSide');
  });

  it('accepts the whole coupon request and refuses one made for another material', async () => {
    const { editor, tests } = await team();
    const coupon = { joint: 'key', material: 'PLA', key: { shape: 'square', width: 8, depth: 4 }, ...range };
    const ok = await editor.agent.post(tests).send({ ...fitTestBody(cleanAnswers), coupon });
    expect(ok.status, JSON.stringify(ok.body)).toBe(201);
    expect(ok.body.coupon).toMatchObject({ ...range, request: { joint: 'key', material: 'PLA', process: 'fdm' } });
    const other = await editor.agent
      .post(tests)
      .send({ ...fitTestBody(cleanAnswers), coupon: { ...coupon, material: 'PETG' } });
    expect(other.status).toBe(400);
    expect(other.body.error.issues[0].path).toBe('coupon');
  });

  it('refuses a result more than 0.5 mm from the published default and writes nothing', async () => {
    const { editor, viewer, base, profile, tests } = await team();
    const wide = { clearanceFrom: 0.6, clearanceTo: 0.9, clearanceStep: 0.3 };
    const answers = [
      { mark: '1', clearancePerSide: 0.6, outcome: 'forced' },
      { mark: '2', clearancePerSide: 0.9, outcome: 'free' },
    ];
    const res = await editor.agent.post(tests).send({ ...fitTestBody([]), coupon: wide, answers });
    expect(res.status).toBe(422);
    // Press at 0.6 mm is +0.5 mm from 0.1 mm: still an offset; slide at 0.9 mm is +0.65 mm from 0.25 mm.
    expect(res.body.error.message).toContain(
      'the slide fit came out at 0.9 mm (pocket 2), +0.65 mm from the published 0.25 mm',
    );
    expect(offsets((await viewer.agent.get(`${base}/printer-profiles/${profile.id}`)).body.calibration)).toEqual({
      snug: -0.03,
    });
  });

  it('makes an older result current again', async () => {
    const { editor, viewer, base, profile, tests } = await team();
    const first = (await editor.agent.post(tests).send(fitTestBody(cleanAnswers))).body;
    const looser = answersOf('no-entry', 'no-entry', 'forced', 'forced', 'snug', 'free', 'free', 'wobbly');
    const second = (await editor.agent.post(tests).send(fitTestBody(looser))).body;
    const profileUrl = `${base}/printer-profiles/${profile.id}`;
    expect(offsets((await viewer.agent.get(profileUrl)).body.calibration)).toEqual({ press: 0, snug: 0.04, slide: 0 });
    expect(
      (await viewer.agent.get(tests)).body.items.map((t: { id: string; current: boolean }) => [t.id, t.current]),
    ).toEqual([
      [second.id, true],
      [first.id, false],
    ]);

    const restored = await editor.agent.post(`${tests}/${first.id}/make-current`);
    expect(restored.status, JSON.stringify(restored.body)).toBe(200);
    expect(restored.body).toMatchObject({ id: first.id, current: true });
    const calibration: Entry[] = (await viewer.agent.get(profileUrl)).body.calibration;
    expect(offsets(calibration)).toEqual({ press: -0.05, snug: -0.01, slide: 0 });
    expect(calibration.filter((e) => e.material === 'PLA').map((e) => e.source)).toEqual([
      `fit test ${first.id}`,
      `fit test ${first.id}`,
      `fit test ${first.id}`,
    ]);
    expect((await viewer.agent.get(`${tests}/${second.id}`)).body.current).toBe(false);
  });

  it('answers 404 for a test of another profile', async () => {
    const { editor, owner, base, tests } = await team();
    const recorded = (await editor.agent.post(tests).send(fitTestBody(cleanAnswers))).body;
    const other = (await owner.agent.post(`${base}/printer-profiles`).send({ ...benchFdm, name: 'Other FDM' })).body;
    const wrong = `${base}/printer-profiles/${other.id}/fit-tests/${recorded.id}`;
    expect((await editor.agent.get(wrong)).status).toBe(404);
    expect((await editor.agent.post(`${wrong}/make-current`)).status).toBe(404);
  });
});
