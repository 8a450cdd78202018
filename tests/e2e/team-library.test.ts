import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { linkIn, screenshot, seriousAxeViolations, useBrowserApp } from '../helpers/browser';

// Mail goes to this file's own catcher, so the test reads the verification and invitation links.
const app = useBrowserApp({ mail: true });

const PASSWORD = 'walnut-dowel-clamp-77';
const run = randomUUID().slice(0, 8);
const owner = { name: `Ada Owner ${run}`, email: `owner-${run}@quillmoss.example` };
const invitee = { name: `Bea Invitee ${run}`, email: `invitee-${run}@quillmoss.example` };
const ownerTeam = `${owner.name}'s workshop`;
const presetName = `Helmet seam ${run}`;

let ownerContext: BrowserContext;
let inviteeContext: BrowserContext;
let ownerPage: Page;
let inviteePage: Page;
let presetPath = '';

/** Creates an account through the sign-up page; the new user is signed in and lands on `landing`. */
async function signUp(page: Page, who: { name: string; email: string }, landing: RegExp) {
  await page.goto('/sign-up');
  await page.getByLabel('Your name').fill(who.name);
  await page.getByLabel('E-mail address').fill(who.email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.waitForURL(landing);
}

/** Opens the verification link of the captured mail in `page` and waits until the address is confirmed. */
async function verifyEmail(page: Page, email: string) {
  const mail = await app.mail.waitFor(email, /Confirm your e-mail address/);
  await page.goto(linkIn(mail, '/verify-email'));
  await page.getByText('Your address is confirmed.').waitFor();
}

/** Waits for the page's data to settle, then saves a screenshot for the reviewer. */
async function settledScreenshot(page: Page, name: string) {
  await page.waitForLoadState('networkidle');
  await screenshot(page, `team-library-${name}`);
}

/** The versions list of a preset detail page, one entry per version, newest first. */
function versions(page: Page) {
  return page
    .getByRole('region', { name: 'Versions' })
    .getByRole('listitem')
    .filter({ hasText: /^Version \d+/ });
}

beforeAll(async () => {
  ownerContext = await app.newContext();
  inviteeContext = await app.newContext();
  ownerPage = await ownerContext.newPage();
  inviteePage = await inviteeContext.newPage();
  // Generous per step for a 2-core CI machine; every wait is for a visible state, never a fixed sleep.
  ownerPage.setDefaultTimeout(15_000);
  inviteePage.setDefaultTimeout(15_000);
});
afterAll(async () => {
  await ownerContext?.close();
  await inviteeContext?.close();
});

describe('team library', () => {
  it('lets a new user create a preset in their personal team and invite a viewer', async () => {
    await signUp(ownerPage, owner, /\/team$/);
    await ownerPage.getByRole('heading', { level: 1, name: ownerTeam }).waitFor();
    // Inviting needs a confirmed address: the link comes by mail.
    await verifyEmail(ownerPage, owner.email);

    await ownerPage.goto('/presets');
    await ownerPage.getByRole('button', { name: 'New preset' }).click();
    // The list's filters have labels of their own (Material, Tag): look inside the new-preset form only.
    const form = ownerPage.getByRole('region', { name: 'New preset' });
    await form.getByLabel('Name', { exact: true }).fill(presetName);
    await form.getByLabel('Tags').fill('helmet, glued');
    await form.getByLabel('Material', { exact: true }).selectOption('PLA');
    await form.getByLabel('Key width, mm').fill('10');
    await form.getByRole('button', { name: 'Save preset' }).click();
    await ownerPage.waitForURL(/\/presets\/[0-9a-f-]{36}$/);
    presetPath = new URL(ownerPage.url()).pathname;
    await ownerPage.getByRole('heading', { level: 1, name: presetName }).waitFor();
    await expect.poll(() => versions(ownerPage).count()).toBe(1);

    await ownerPage.goto('/presets');
    await ownerPage.getByRole('table', { name: 'Presets' }).getByRole('link', { name: presetName }).waitFor();
    await settledScreenshot(ownerPage, 'presets-table');

    await ownerPage.goto('/team');
    await ownerPage.getByLabel('E-mail address to invite').fill(invitee.email);
    await ownerPage.getByLabel('Role', { exact: true }).selectOption('viewer');
    await ownerPage.getByRole('button', { name: 'Send invitation' }).click();
    await ownerPage.getByText(`Invitation sent to ${invitee.email}.`).waitFor();
    const pending = ownerPage.getByRole('region', { name: 'Invite someone' }).getByRole('listitem');
    await pending.getByRole('button', { name: `Revoke the invitation of ${invitee.email}` }).waitFor();
    expect(await pending.filter({ hasText: invitee.email }).innerText()).toContain('as viewer');
    await settledScreenshot(ownerPage, 'team');
  }, 90_000);

  it('lets the invited user join from the mailed link and see the preset as a viewer', async () => {
    // A fresh account lands on its own team.
    await signUp(inviteePage, invitee, /\/team$/);
    const invitation = await app.mail.waitFor(invitee.email, /invited you to/);
    expect(invitation.subject).toBe(`${owner.name} invited you to ${ownerTeam} on Seamwright`);
    const invitationLink = linkIn(invitation, '/invitations/accept');
    const join = inviteePage.getByRole('button', { name: `Join ${ownerTeam}` });

    // Accepting needs the invited address confirmed: until then the button is disabled and says why.
    await inviteePage.goto(invitationLink);
    await inviteePage.getByText(`to join ${ownerTeam} as viewer`).waitFor();
    await inviteePage.getByText(`Confirm ${invitee.email} first`).waitFor();
    expect(await join.isDisabled()).toBe(true);
    await settledScreenshot(inviteePage, 'invitation-unverified');

    await verifyEmail(inviteePage, invitee.email);
    await inviteePage.goto(invitationLink);
    await inviteePage.getByText(`to join ${ownerTeam} as viewer`).waitFor();
    await expect.poll(() => join.isEnabled()).toBe(true);
    await settledScreenshot(inviteePage, 'invitation');
    expect(await seriousAxeViolations(inviteePage)).toEqual([]);

    await join.click();
    await inviteePage.waitForURL(/\/team$/);
    await inviteePage.getByRole('heading', { level: 1, name: ownerTeam }).waitFor();
    await inviteePage.getByText('You are a viewer of this team.').waitFor();

    // The switcher holds both teams: the personal one has no presets, the owner's has the new one.
    const presetsTable = inviteePage.getByRole('table', { name: 'Presets' });
    // The header's team switcher.
    const switcher = inviteePage.getByRole('banner').getByRole('combobox', { name: /^Team\b/ });
    await inviteePage.goto('/presets');
    await switcher.selectOption({ label: `${invitee.name}'s workshop (owner)` });
    await inviteePage.getByText('No presets yet.').waitFor();
    await switcher.selectOption({ label: `${ownerTeam} (viewer)` });
    const link = presetsTable.getByRole('link', { name: presetName });
    await link.waitFor();
    await inviteePage.getByText(`You are a viewer of ${ownerTeam}`).waitFor();
    expect(await inviteePage.getByRole('button', { name: 'New preset' }).count()).toBe(0);
    expect(await presetsTable.getByRole('button', { name: /Duplicate|Archive|Delete/ }).count()).toBe(0);
    expect(await inviteePage.getByRole('button', { name: 'Import file' }).count()).toBe(0);

    await link.click();
    await inviteePage.getByRole('heading', { level: 1, name: presetName }).waitFor();
    await expect.poll(() => versions(inviteePage).count()).toBe(1);
    await inviteePage.getByText('only editors and owners can change it').waitFor();
    await expect.poll(() => inviteePage.getByRole('definition').allInnerTexts()).toContain('helmet, glued');
    // Nothing to edit: no form fields, no save or restore buttons.
    expect(await inviteePage.getByRole('textbox').count()).toBe(0);
    expect(await inviteePage.getByRole('button', { name: /Save|Restore/ }).count()).toBe(0);
    await settledScreenshot(inviteePage, 'preset-detail-viewer');
    expect(await seriousAxeViolations(inviteePage)).toEqual([]);
  }, 90_000);

  it('refuses a viewer’s edit with 403 when it is sent from the page', async () => {
    const me = await (await inviteeContext.request.get('/api/me')).json();
    const teamId = me.teams.find((t: { name: string }) => t.name === ownerTeam).id as string;
    const presetId = presetPath.split('/').pop()!;
    const reply = await inviteePage.evaluate(
      async ({ url }) => {
        const res = await fetch(url, {
          method: 'PATCH',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify({ baseVersion: 1, name: 'Renamed by a viewer' }),
        });
        return { status: res.status, body: await res.json() };
      },
      { url: `/api/teams/${teamId}/presets/${presetId}` },
    );
    expect(reply.status).toBe(403);
    expect(reply.body.error.code).toBe('FORBIDDEN');

    await inviteePage.reload();
    await inviteePage.getByRole('heading', { level: 1, name: presetName }).waitFor();
  });

  it('shows the conflict and keeps both versions when an editor saves over a newer version', async () => {
    // The owner makes the invitee an editor; the invitee opens version 1 before the owner saves version 2.
    await ownerPage.goto('/team');
    const role = ownerPage.getByLabel(`Role of ${invitee.name}`);
    await role.waitFor();
    await Promise.all([
      ownerPage.waitForResponse((r) => r.request().method() === 'PATCH' && r.url().includes('/members/') && r.ok()),
      role.selectOption('editor'),
    ]);

    await inviteePage.goto(presetPath);
    const saveTheirs = inviteePage.getByRole('button', { name: 'Save as version 2' });
    await saveTheirs.waitFor();

    await ownerPage.goto(presetPath);
    // The saved tags read back as typed, one comma and space apart.
    await expect.poll(() => ownerPage.getByLabel('Tags').inputValue()).toBe('helmet, glued');
    await ownerPage.getByLabel('Material', { exact: true }).selectOption('PETG');
    await ownerPage.getByRole('button', { name: 'Save as version 2' }).click();
    await ownerPage.getByText('Saved as version 2.').waitFor();

    await inviteePage.getByLabel('Key width, mm').fill('12');
    await saveTheirs.click();
    const conflict = inviteePage.getByRole('status').filter({ hasText: 'while you were editing' });
    await conflict.waitFor();
    expect(await conflict.innerText()).toContain(`${owner.name} saved version 2`);
    expect(await conflict.innerText()).toContain('PETG');
    await inviteePage.getByRole('button', { name: 'Discard mine and load version 2' }).waitFor();
    // The form waits for the choice: its fields and its own save button are locked, with the reason.
    expect(await saveTheirs.isDisabled()).toBe(true);
    expect(await inviteePage.getByLabel('Key width, mm').isDisabled()).toBe(true);
    await inviteePage.getByText('Choose above: load the newer version, or save yours after it.').waitFor();
    await expect.poll(() => versions(inviteePage).count()).toBe(2);
    await settledScreenshot(inviteePage, 'conflict');

    await inviteePage.getByRole('button', { name: 'Save mine as version 3' }).click();
    await inviteePage.getByText('Saved as version 3.').waitFor();
    expect(await conflict.count()).toBe(0);
    await expect.poll(() => versions(inviteePage).count()).toBe(3);
    const [v3, v2, v1] = await versions(inviteePage).allInnerTexts();
    expect(v3).toContain('Version 3 (current)');
    expect(v3).toContain(invitee.name);
    expect(v3).toMatch(/key width.*10.*12/);
    expect(v2).toContain(owner.name);
    expect(v2).toMatch(/material.*PLA.*PETG/);
    expect(v1).toContain('created');
    // The form now holds the invitee's save, based on version 3.
    await expect.poll(() => inviteePage.getByLabel('Key width, mm').inputValue()).toBe('12');
    await inviteePage.getByRole('button', { name: 'Save as version 4' }).waitFor();
    // Either earlier version can come back as the next one.
    await inviteePage.getByRole('button', { name: 'Restore version 2 as version 4' }).waitFor();
    await settledScreenshot(inviteePage, 'preset-detail-versions');
    expect(await seriousAxeViolations(inviteePage)).toEqual([]);
  }, 90_000);
});
