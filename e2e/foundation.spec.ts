/**
 * Foundation flows at phone (390x844) and wide (1440x900): sign up, create a project, find it in the list,
 * sign out and back in, and the message for a wrong password.
 */
import { expect, test } from '@playwright/test';
import {
  expectNoSidewaysScroll,
  expectPlexLoaded,
  PASSWORD,
  shot,
  signInInUi,
  signUpByApi,
  signUpInUi,
  uniqueEmail,
} from './helpers';

test('a new user signs up, creates a project, signs out and back in and still sees it', async ({ page }, testInfo) => {
  const email = uniqueEmail(testInfo);
  const projectName = `Riverside chiller plant ${testInfo.project.name}`;

  // Signed-out visitors land on sign-in, which says what the product is.
  await page.goto('/');
  // Generous: the first load of the run parses the whole bundle on a shared 2-core machine.
  await expect(page).toHaveURL(/\/sign-in/, { timeout: 20_000 });
  await expect(page.getByTestId('product-pitch')).toContainText('pressure drop');
  await expectPlexLoaded(page);
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '01-sign-in');

  await page.getByRole('link', { name: 'Create an account' }).click();
  await expect(page).toHaveURL(/\/sign-up/);
  // The form explains itself before anything is sent.
  await page.getByTestId('sign-up-submit').click();
  await expect(page.getByTestId('sign-up-email-error')).toContainText('e-mail');
  await expect(page.getByTestId('sign-up-password-error')).toContainText('10 characters');
  await shot(page, testInfo, '02-sign-up-errors');
  await signUpInUi(page, { name: 'Mira Calloway', email, password: PASSWORD });

  // A new account starts with its own team and no projects.
  await expect(page.getByTestId('projects-empty')).toContainText('coils');
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '03-projects-empty');

  await page.getByTestId('new-project').first().click();
  await page.getByTestId('project-form-submit').click();
  await expect(page.getByTestId('project-name-error')).toHaveText('Give the project a name.');
  await page.getByTestId('project-name').fill(projectName);
  await page.getByTestId('project-client').fill('Hollowmere Foods');
  await page.getByTestId('project-site').fill('Building C, roof');
  await shot(page, testInfo, '04-new-project-form');
  await page.getByTestId('project-form-submit').click();

  await expect(page).toHaveURL(/\/projects\//);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(projectName);
  await expect(page.getByText('Hollowmere Foods · Building C, roof')).toBeVisible();
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '05-project');

  await page.getByRole('link', { name: 'All projects' }).click();
  await expect(page.getByText(projectName)).toBeVisible();
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '06-projects-list');

  await page.getByTestId('sign-out').click();
  await expect(page).toHaveURL(/\/sign-in/);
  await signInInUi(page, email, PASSWORD);
  await expect(page.getByTestId('projects-screen')).toBeVisible();
  await expect(page.getByText(projectName)).toBeVisible();
  await shot(page, testInfo, '07-after-sign-in');
});

test('a wrong password is refused with a readable message', async ({ page, request, baseURL }, testInfo) => {
  const email = uniqueEmail(testInfo, 'wrongpw');
  await signUpByApi(request, baseURL!, { name: 'Tove Ardent', email, password: PASSWORD });

  await page.goto('/sign-in');
  await signInInUi(page, email, 'not-the-password');
  const banner = page.getByTestId('sign-in-error');
  await expect(banner).toBeVisible();
  await expect(banner).toContainText('Could not sign you in');
  await expect(page).toHaveURL(/\/sign-in/);
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '08-wrong-password');
});

test('team, outbox and settings: invite by e-mail, follow the mailed link, keep the last owner, switch to IP', async ({ page, request, baseURL }, testInfo) => {
  const email = uniqueEmail(testInfo, 'owner');
  const invitee = uniqueEmail(testInfo, 'invitee');
  await signUpByApi(request, baseURL!, { name: 'Ines Marlow', email, password: PASSWORD });
  await page.goto('/sign-in');
  await signInInUi(page, email, PASSWORD);
  await expect(page.getByTestId('projects-screen')).toBeVisible();

  await page.getByRole('link', { name: 'Team' }).click();
  await expect(page.getByTestId('team-screen')).toBeVisible();
  await page.getByTestId('invite-email').fill(invitee);
  await page.getByTestId('invite-submit').click();
  await expect(page.getByText(`Invitation sent to ${invitee}.`)).toBeVisible();
  await expect(page.getByRole('list', { name: 'Pending invitations' })).toContainText(invitee);
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '09-team');

  // The server refuses to remove the last owner; its message is shown where the user acted.
  await page.getByRole('button', { name: 'Remove Ines Marlow from the team' }).click();
  await page.getByRole('button', { name: 'Remove from team' }).click();
  await expect(page.getByRole('dialog', { name: 'Remove Ines Marlow?' })).toContainText('at least one owner');
  await shot(page, testInfo, '10-last-owner');
  await page.getByRole('button', { name: 'Cancel' }).click();

  await page.getByRole('link', { name: 'Outbox' }).click();
  const mail = page.getByTestId('outbox-message').filter({ hasText: invitee });
  await expect(mail).toBeVisible();
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '11-outbox');
  await mail.getByRole('link', { name: /\/invite\// }).click();
  await expect(page).toHaveURL(/\/invite\//);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText("Join Ines Marlow's team");
  await shot(page, testInfo, '12-invite');

  await page.goto('/settings');
  await page.getByRole('radio', { name: /IP units/ }).click();
  await expect(page.getByRole('radio', { name: /IP units/ })).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByText('Saving…')).toHaveCount(0);
  await page.reload();
  await expect(page.getByRole('radio', { name: /IP units/ })).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByText('capacity in Btu/h')).toBeVisible();
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '13-settings');
});

test('a project is edited and, after confirmation, deleted', async ({ page, request, baseURL }, testInfo) => {
  const email = uniqueEmail(testInfo, 'editor');
  await signUpByApi(request, baseURL!, { name: 'Pell Haverty', email, password: PASSWORD });
  await page.goto('/sign-in');
  await signInInUi(page, email, PASSWORD);
  await page.getByTestId('new-project').first().click();
  await page.getByTestId('project-name').fill('Dockside air handlers');
  await page.getByTestId('project-form-submit').click();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Dockside air handlers');

  await page.getByTestId('project-edit').click();
  await page.getByTestId('project-name').fill('Dockside air handlers, phase 2');
  await page.getByTestId('project-notes').fill('Chilled water 7/12 °C; fan coils on levels 2 to 4.');
  await page.getByTestId('project-form-submit').click();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Dockside air handlers, phase 2');
  await expect(page.getByTestId('project-screen').getByText('Chilled water 7/12 °C')).toBeVisible();

  await page.getByTestId('project-delete').click();
  await expect(page.getByRole('dialog', { name: 'Delete this project?' })).toContainText('cannot be undone');
  await shot(page, testInfo, '14-delete-confirm');
  await page.getByTestId('project-delete-sheet-confirm').click();
  await expect(page.getByTestId('projects-empty')).toBeVisible();
});

test('with two teams the picker switches team and remembers the choice', async ({ page, request, baseURL }, testInfo) => {
  const ownerEmail = uniqueEmail(testInfo, 'lead');
  const memberEmail = uniqueEmail(testInfo, 'member');
  const origin = { Origin: baseURL! };
  await signUpByApi(request, baseURL!, { name: 'Oren Quill', email: ownerEmail, password: PASSWORD });
  const me = await (await request.get('/api/me')).json();
  const ownerTeam: string = me.teams[0].id;
  await request.post(`/api/teams/${ownerTeam}/projects`, { data: { name: 'Quill shared project' }, headers: origin });
  expect((await request.post(`/api/teams/${ownerTeam}/invites`, { data: { email: memberEmail, role: 'reviewer' }, headers: origin })).status()).toBe(201);
  const outbox = await (await request.get('/api/dev/outbox')).json();
  const mail = outbox.messages.find((m: { to: string }) => m.to === memberEmail);
  const invitePath = /\/invite\/[\w-]+/.exec(mail.text)![0];

  await page.goto(invitePath);
  await page.getByRole('link', { name: 'Create one' }).click();
  await signUpInUi(page, { name: 'Sela Brandt', email: memberEmail, password: PASSWORD });
  await expect(page).toHaveURL(new RegExp(invitePath));
  await page.getByTestId('invite-accept').click();

  // Joining selects the new team; a reviewer may read but not create projects.
  await expect(page.getByText('Quill shared project')).toBeVisible();
  await expect(page.getByTestId('new-project')).toHaveCount(0);
  await expectNoSidewaysScroll(page);
  await shot(page, testInfo, '15-two-teams');

  await page.getByTestId('team-picker').click();
  await page.getByRole('radio', { name: "Sela Brandt's team" }).click();
  await expect(page.getByTestId('projects-empty')).toBeVisible();
  await page.reload();
  await expect(page.getByTestId('projects-empty')).toBeVisible();
  await expect(page.getByTestId('team-picker')).toContainText("Sela Brandt's team");
});

test('forgot password: the mailed reset link sets a new password', async ({ page, request, baseURL }, testInfo) => {
  const email = uniqueEmail(testInfo, 'forgetful');
  await signUpByApi(request, baseURL!, { name: 'Arvo Penhallow', email, password: PASSWORD });

  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await page.getByTestId('forgot-email').fill(email);
  await page.getByTestId('forgot-submit').click();
  await expect(page.getByTestId('forgot-sent')).toContainText(email);
  await shot(page, testInfo, '16-forgot-sent');

  // Read the captured mail through the API (the request context is signed in as the same user).
  const outbox = await (await request.get('/api/dev/outbox')).json();
  const mail = outbox.messages.find((m: { to: string; subject: string }) => m.to === email && /reset/i.test(m.subject));
  const resetPath = /\/reset-password\?token=[\w-]+/.exec(mail.text)![0];

  await page.goto(resetPath);
  await page.getByTestId('reset-password').fill('short');
  await page.getByTestId('reset-submit').click();
  await expect(page.getByTestId('reset-password-error')).toContainText('10 characters');
  const newPassword = 'return-bend-77?';
  await page.getByTestId('reset-password').fill(newPassword);
  await page.getByTestId('reset-confirm').fill(newPassword);
  await page.getByTestId('reset-submit').click();
  await expect(page.getByTestId('reset-done')).toBeVisible();
  await shot(page, testInfo, '17-reset-done');

  await page.getByRole('link', { name: 'Go to sign in' }).click();
  await signInInUi(page, email, newPassword);
  await expect(page.getByTestId('projects-screen')).toBeVisible();
});
