// What the route fuzzer works on: a signed-in, confirmed owner of a shared team holding one of everything
// (preset, printer profile with a fit test, team material, recorded kit, a member, a pending invitation),
// so a fuzzed request with real ids gets past the role checks into body parsing and the services.
import request from 'supertest';
import type { Express } from 'express';
import type { Database } from '../../../server/db/client';
import { SESSION_COOKIE, type Sessions } from '../../../server/auth/sessions';
import { insertMember } from '../../../server/modules/teams/teams.repository';
import { PASSWORD, signUp, tokenFrom, uniqueEmail } from '../../helpers/auth-app';
import type { mailbox } from '../../helpers/mailbox';

/** A small key kit: builds in a fraction of a second, so geometry routes can be fuzzed often. */
export const smallKit = {
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  face: { shape: 'rect', width: 40, height: 30 },
  key: { shape: 'square', width: 6, depth: 5, count: 2 },
};

/** A small dovetail kit on a polygon face. */
export const smallDovetailKit = {
  joint: 'dovetail',
  material: 'PETG',
  fit: 'slide',
  face: {
    shape: 'polygon',
    points: [
      [-30, -20],
      [30, -20],
      [30, 20],
      [-30, 20],
    ],
  },
  dovetail: { rootWidth: 10, height: 5, slope: 6, count: 1 },
};

const presetSettings = { joint: 'key', material: 'PLA', fit: 'snug', key: { shape: 'square', width: 10, depth: 8 } };

const printerProfile = {
  name: 'Fuzz FDM',
  process: 'fdm',
  buildVolume: { x: 256, y: 256, z: 256 },
  nozzleDiameter: 0.4,
  layerHeight: 0.2,
  notes: 'bench printer',
  calibration: [{ material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-01-12', source: 'fit test' }],
};

const fitTest = {
  material: 'PLA',
  joint: 'key',
  coupon: { clearanceFrom: 0, clearanceTo: 0.2, clearanceStep: 0.05 },
  answers: [
    { mark: '1', clearancePerSide: 0, outcome: 'no-entry' },
    { mark: '2', clearancePerSide: 0.05, outcome: 'forced' },
    { mark: '3', clearancePerSide: 0.1, outcome: 'snug' },
    { mark: '4', clearancePerSide: 0.15, outcome: 'free' },
  ],
};

const material = {
  name: 'Fuzz PLA',
  baseMaterial: 'PLA',
  shrinkagePercent: 0.3,
  clearanceAdjustments: { press: 0.01, snug: -0.02, slide: 0 },
  notes: 'grey matte',
};

/** The ids a path parameter may take when it names something real. */
export type RealIds = Record<string, string>;

export interface FuzzWorld {
  /** Cookie header of the owner's session. */
  cookie: string;
  /** A second account for the routes that end or replace sessions (sign-in, sign-out, password). */
  spare: { id: string; email: string };
  ids: RealIds;
  /** A valid example body per route ("METHOD /api/path" as listApiRoutes names it). */
  examples: Record<string, unknown>;
  /** The routes that take their body as a multipart file upload (field "file") rather than JSON. */
  uploads: Set<string>;
}

async function created(res: request.Response, what: string): Promise<request.Response> {
  if (res.status !== 201) throw new Error(`fixture: ${what} answered ${res.status} ${JSON.stringify(res.body)}`);
  return res;
}

/** Signs up the fuzzing owner, confirms the address and fills a shared team through the API. */
export async function buildFuzzWorld(
  app: Express,
  db: Database,
  sessions: Sessions,
  mail: ReturnType<typeof mailbox>,
): Promise<FuzzWorld> {
  const owner = await signUp(app, 'fuzz-owner', 'Fuzz Owner');
  const verify = await mail.waitFor(owner.email, /Confirm your e-mail/);
  await owner.agent.post('/api/auth/verify-email').send({ token: tokenFrom(verify) });
  const member = await signUp(app, 'fuzz-member', 'Fuzz Member');
  const spare = await signUp(app, 'fuzz-spare', 'Fuzz Spare');
  const a = owner.agent;

  const teamId = (await created(await a.post('/api/teams').send({ name: 'Fuzz Bench' }), 'team')).body.id as string;
  await insertMember(db, { teamId, userId: member.id, role: 'viewer' });
  const t = `/api/teams/${teamId}`;
  const invitee = uniqueEmail('fuzz-invitee');
  const invitation = await created(await a.post(`${t}/invitations`).send({ email: invitee, role: 'viewer' }), 'invite');
  const invitationToken = tokenFrom(await mail.waitFor(invitee, /invited you/));
  const profileId = (await created(await a.post(`${t}/printer-profiles`).send(printerProfile), 'profile')).body.id;
  const materialId = (await created(await a.post(`${t}/materials`).send(material), 'material')).body.id;
  const presetBody = { name: 'Fuzz preset', description: 'seam', tags: ['fuzz'], printerProfileId: profileId };
  const preset = await a.post(`${t}/presets`).send({ ...presetBody, settings: presetSettings });
  const presetId = (await created(preset, 'preset')).body.id as string;
  const testId = (await created(await a.post(`${t}/printer-profiles/${profileId}/fit-tests`).send(fitTest), 'fit test'))
    .body.id;
  const kit = await created(await a.post(`${t}/kits`).send({ request: smallKit }), 'kit');
  const kitId = kit.headers['x-seamwright-kit-id'] as string;

  const ids: RealIds = {
    teamId,
    presetId,
    profileId,
    materialId,
    testId,
    kitId,
    invitationId: invitation.body.id,
    userId: member.id,
    version: '1',
  };
  const cookie = `${SESSION_COOKIE}=${(await sessions.start(owner.id)).id}`;
  const tp = '/api/teams/:teamId';
  const presetPath = `${tp}/presets/:presetId`;
  const fitTests = `${tp}/printer-profiles/:profileId/fit-tests`;
  const token = 'A'.repeat(43);
  const examples: Record<string, unknown> = {
    'POST /api/kits': smallKit,
    'POST /api/kits/summary': smallDovetailKit,
    'POST /api/coupons': {
      joint: 'key',
      material: 'PLA',
      key: { shape: 'square', width: 6, depth: 4 },
      clearanceFrom: 0,
      clearanceTo: 0.1,
      clearanceStep: 0.05,
    },
    'POST /api/auth/sign-up': { email: uniqueEmail('fuzz-new'), password: PASSWORD, name: 'New Person' },
    'POST /api/auth/sign-in': { email: spare.email, password: PASSWORD },
    'POST /api/auth/verify-email': { token },
    'POST /api/auth/password-reset/request': { email: spare.email },
    'POST /api/auth/password-reset/confirm': { token, password: 'walnut-dowel-clamp-78' },
    'PATCH /api/account': { units: 'in' },
    'POST /api/account/password': { currentPassword: PASSWORD, newPassword: 'walnut-dowel-clamp-79' },
    'POST /api/teams': { name: 'Fuzz team' },
    [`PATCH ${tp}`]: { name: 'Fuzz Bench renamed' },
    [`PATCH ${tp}/members/:userId`]: { role: 'editor' },
    [`POST ${tp}/invitations`]: { email: uniqueEmail('fuzz-invitee'), role: 'viewer' },
    'POST /api/invitations/preview': { token: invitationToken },
    'POST /api/invitations/accept': { token: invitationToken },
    [`POST ${tp}/presets`]: { ...presetBody, name: 'Fuzz preset 2', settings: presetSettings },
    [`PATCH ${presetPath}`]: { baseVersion: 1, name: 'Fuzz preset renamed', settings: presetSettings },
    [`POST ${presetPath}/duplicate`]: { name: 'Fuzz preset copy' },
    [`POST ${presetPath}/versions/:version/restore`]: { baseVersion: 1 },
    [`POST ${tp}/printer-profiles`]: { ...printerProfile, name: 'Fuzz FDM 2' },
    [`PATCH ${tp}/printer-profiles/:profileId`]: { name: 'Fuzz FDM renamed', layerHeight: 0.16 },
    [`POST ${fitTests}`]: fitTest,
    [`POST ${tp}/materials`]: { ...material, name: 'Fuzz PLA 2' },
    [`PATCH ${tp}/materials/:materialId`]: { notes: 'changed', clearanceAdjustments: { snug: 0.01 } },
    [`POST ${tp}/kits`]: {
      request: smallKit,
      presetId,
      presetVersion: 1,
      printerProfileId: profileId,
      teamMaterialId: materialId,
    },
  };
  const importRoute = `POST ${tp}/presets/import`;
  examples[importRoute] = {
    format: 'seamwright-presets',
    formatVersion: 1,
    team: 'Fuzz Bench',
    presets: [
      {
        name: 'Imported seam',
        description: 'from a file',
        tags: ['imported'],
        printerProfile: 'Fuzz FDM',
        schemaVersion: 1,
        settings: presetSettings,
      },
    ],
  };
  return { cookie, spare: { id: spare.id, email: spare.email }, ids, examples, uploads: new Set([importRoute]) };
}
