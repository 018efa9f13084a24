/**
 * Versions and review at phone (390x844) and wide (1440x900): a designer saves two versions with different
 * circuitings, compares them, makes a review link; a guest opens it without signing in and leaves a pinned
 * comment; a reviewer of the team approves; the designer sees the marker and the decision; the outbox holds the
 * notifications; a revoked link says it is no longer available; restoring a version makes it the draft.
 */
import { readFileSync } from 'node:fs';
import { expect, test, type Page, type TestInfo } from '@playwright/test';
import { expectNoSidewaysScroll, PASSWORD, signUpByApi, uniqueEmail } from './helpers';

async function shot(page: Page, testInfo: TestInfo, step: string): Promise<void> {
  await page.screenshot({ path: `.tmp/screenshots/review-${testInfo.project.name}-${step}.png` });
}

const example = (name: string) => JSON.parse(readFileSync(`assets/examples/${name}.json`, 'utf8'));

test('save, compare, share for review, comment as a guest, approve as a reviewer', async ({ page, browser, baseURL }, testInfo) => {
  test.setTimeout(240_000);
  const origin = { Origin: baseURL! };
  const designerEmail = uniqueEmail(testInfo, 'designer');
  const reviewerEmail = uniqueEmail(testInfo, 'reviewer');

  // Set-up through the API: a designer (owner of their own team), a project and a coil with two circuits per feed.
  await signUpByApi(page.request, baseURL!, { name: 'Ines Harrow', email: designerEmail, password: PASSWORD });
  const teamId: string = (await (await page.request.get('/api/me')).json()).teams[0].id;
  const project = (await (await page.request.post(`/api/teams/${teamId}/projects`, { data: { name: 'Lakeside depot AHU-2' }, headers: origin })).json()).project;
  const counterflow = example('twin-counterflow-4-row');
  const created = await page.request.post(`/api/projects/${project.id}/coils`, { data: { name: 'AHU-2 cooling coil', document: counterflow }, headers: origin });
  expect(created.status(), await created.text()).toBe(201);
  const coil = (await created.json()).coil;

  // The reviewer joins the team before the link is made, so they are told about it.
  expect((await page.request.post(`/api/teams/${teamId}/invites`, { data: { email: reviewerEmail, role: 'reviewer' }, headers: origin })).status()).toBe(201);
  const inviteMail = (await (await page.request.get('/api/dev/outbox')).json()).messages.find((m: { to: string }) => m.to === reviewerEmail);
  const inviteToken = /\/invite\/([\w-]+)/.exec(inviteMail.text)![1];
  const reviewerContext = await browser.newContext();
  const reviewer = await reviewerContext.newPage();
  await signUpByApi(reviewer.request, baseURL!, { name: 'Pavel Oduya', email: reviewerEmail, password: PASSWORD });
  expect((await reviewer.request.post(`/api/invites/${inviteToken}/accept`, { headers: origin })).status()).toBe(200);

  // Version 1 through the API; then the draft gets a parallel-flow circuiting and version 2 is saved in the UI.
  expect((await page.request.post(`/api/coils/${coil.id}/versions`, { data: { message: 'Counterflow, two circuits per feed' }, headers: origin })).status()).toBe(201);
  const parallel = { ...example('twin-parallel-flow-4-row'), name: counterflow.name };
  const put = await page.request.put(`/api/coils/${coil.id}/draft`, { data: { document: parallel, revision: coil.revision }, headers: origin });
  expect(put.status(), await put.text()).toBe(200);

  await page.goto(`/projects/${project.id}/coils/${coil.id}/versions`);
  await expect(page.getByTestId('version-row-1')).toContainText('Counterflow, two circuits per feed');
  await page.getByTestId('save-version').first().click();
  await page.getByTestId('save-version-submit').click();
  await expect(page.getByText('Describe what this version changes.')).toBeVisible();
  await page.getByTestId('save-version-message').fill('Parallel flow for comparison');
  await page.getByTestId('save-version-submit').click();
  await expect(page.getByTestId('save-version-done')).toContainText('version 2');
  await shot(page, testInfo, '01-version-saved');
  await page.getByTestId('save-version-close').click();
  await expect(page.getByTestId('version-row-2')).toContainText('Parallel flow for comparison');
  await expect(page.getByTestId('version-row-2')).toContainText(/kW/);
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '02-versions');

  // Compare: the sheets mark the changed circuiting, the table gives differences with units.
  await page.getByTestId('compare-go').click();
  await expect(page).toHaveURL(/\/compare\//);
  await expect(page.getByTestId('compare-counts')).toContainText(/\d+ added, \d+ removed/);
  await expect(page.getByTestId('compare-result-capacity_W')).toContainText('kW');
  await expect(page.getByTestId('compare-a')).toBeVisible();
  // Side by side on wide screens, one above the other on phones.
  const boxA = (await page.getByTestId('compare-sheet-a').boundingBox())!;
  const boxB = (await page.getByTestId('compare-sheet-b').boundingBox())!;
  if (testInfo.project.name === 'wide') expect(Math.abs(boxA.y - boxB.y)).toBeLessThan(2);
  else expect(boxB.y).toBeGreaterThanOrEqual(boxA.y + boxA.height);
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '03-compare');
  await page.getByTestId('compare-results').scrollIntoViewIfNeeded();
  await shot(page, testInfo, '04-compare-results');

  // Version 2: make a review link that allows comments.
  await page.goBack();
  await page.getByTestId('version-row-2').click();
  await expect(page).toHaveURL(/\/versions\//);
  const versionUrl = page.url();
  await expect(page.getByTestId('version-message')).toHaveText('Parallel flow for comparison');
  await page.getByTestId('share-create').click();
  const reviewUrl = (await page.getByTestId('share-url').textContent())!.trim();
  expect(reviewUrl).toMatch(/\/review\/[\w-]+$/);
  await expect(page.getByTestId('share-list')).toContainText('Active');
  await page.getByTestId('share-created').scrollIntoViewIfNeeded();
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '05-share-link');

  // A guest opens the link in a fresh browser, without signing in, and pins a comment to a tube.
  const guestContext = await browser.newContext();
  const guest = await guestContext.newPage();
  await guest.goto(new URL(reviewUrl).pathname);
  await expect(guest.getByTestId('review-title')).toHaveText('AHU-2 cooling coil, version 2');
  await expect(guest.getByTestId('review-message')).toHaveText('Parallel flow for comparison');
  await expect(guest.getByTestId('review-results')).toContainText(/kW|MBH/);
  await expectNoSidewaysScroll(guest);
  await shot(guest, testInfo, '06-review-guest');
  await guest.getByTestId('review-sheet-tube-r1-t3').click();
  await expect(guest.getByTestId('comment-pin')).toContainText('Row 1, tube 3');
  await guest.getByTestId('comment-body').fill('Could the supply move to the bottom tubes to help venting?');
  await guest.getByTestId('comment-submit').click();
  await expect(guest.getByText('Enter your name.')).toBeVisible();
  await guest.getByTestId('comment-guest-name').fill('Rhea Solberg');
  await guest.getByTestId('comment-submit').click();
  await expect(guest.getByTestId('thread-1')).toContainText('Rhea Solberg (guest)');
  await expect(guest.getByTestId('review-sheet-marker-1')).toBeAttached();
  await expectNoSidewaysScroll(guest);
  await guest.getByTestId('thread-1').scrollIntoViewIfNeeded();
  await shot(guest, testInfo, '07-review-commented');

  // The reviewer approves version 2.
  await reviewer.goto(new URL(versionUrl).pathname);
  await expect(reviewer.getByTestId('decision-approve')).toBeVisible();
  await expect(reviewer.getByTestId('version-restore')).toHaveCount(0);
  await expect(reviewer.getByTestId('share-links')).toHaveCount(0);
  await reviewer.getByTestId('decision-note-input').fill('Fine for the tender set.');
  await reviewer.getByTestId('decision-approve').click();
  await expect(reviewer.getByTestId('decision-status')).toHaveText('Approved');
  await expectNoSidewaysScroll(reviewer);
  await shot(reviewer, testInfo, '08-reviewer-approved');

  // The designer sees the guest's marker on the sheet, the thread and the decision.
  await page.reload();
  await expect(page.getByTestId('version-sheet-marker-1')).toBeAttached();
  await expect(page.getByTestId('thread-1')).toContainText('Row 1, tube 3');
  await expect(page.getByTestId('decision-status')).toHaveText('Approved');
  await expect(page.getByTestId('decision-note')).toHaveText('Fine for the tender set.');
  await page.getByTestId('thread-1-resolve').click();
  await expect(page.getByTestId('thread-1-reopen')).toBeVisible();
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '09-designer-sees-review');
  await page.getByTestId('comments').scrollIntoViewIfNeeded();
  await shot(page, testInfo, '10-designer-comments');

  // The outbox holds the notifications: review requested (reviewer), new comment and decision (designer).
  const messages: { to: string; subject: string }[] = (await (await page.request.get('/api/dev/outbox')).json()).messages;
  expect(messages.some((m) => m.to === reviewerEmail && m.subject.startsWith('Review requested'))).toBe(true);
  expect(messages.some((m) => m.to === designerEmail && m.subject.startsWith('New comment'))).toBe(true);
  expect(messages.some((m) => m.to === designerEmail && m.subject.startsWith('Approved'))).toBe(true);

  // Revoking the link closes it for the guest.
  await page.getByTestId('share-revoke').click();
  await page.getByTestId('share-revoke-sheet-confirm').click();
  await expect(page.getByTestId('share-list')).toContainText('Revoked');
  await guest.reload();
  await expect(guest.getByTestId('review-unavailable')).toContainText('This review link is no longer available');
  await expectNoSidewaysScroll(guest);
  await shot(guest, testInfo, '11-review-revoked');

  // A link without comments shows the design and says comments are off.
  const versionId = new URL(versionUrl).pathname.split('/').pop()!;
  const quiet = await page.request.post(`/api/versions/${versionId}/share-links`, { data: { allowComments: false }, headers: origin });
  expect(quiet.status(), await quiet.text()).toBe(201);
  await guest.goto(new URL((await quiet.json()).url).pathname);
  await expect(guest.getByTestId('review-comments')).toContainText('Comments are turned off for this link.');
  await expect(guest.getByTestId('comment-body')).toHaveCount(0);

  // Restoring version 1 makes it the working draft and opens the coil.
  await page.goto(`/projects/${project.id}/coils/${coil.id}/versions`);
  await page.getByTestId('version-row-1').click();
  await expect(page.getByTestId('version-message')).toHaveText('Counterflow, two circuits per feed');
  await page.getByTestId('version-restore').click();
  await page.getByTestId('version-restore-sheet-confirm').click();
  await expect(page).toHaveURL(new RegExp(`/projects/${project.id}/coils/${coil.id}$`));
  const draft = (await (await page.request.get(`/api/coils/${coil.id}`)).json()).coil;
  expect(draft.document.circuiting).toEqual(counterflow.circuiting);

  await guestContext.close();
  await reviewerContext.close();
});
