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
  await expect(page).toHaveURL(/\/sign-in/);
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
