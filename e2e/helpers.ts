/** Shared steps of the browser tests: unique accounts, screenshots, layout checks. */
import { expect, type APIRequestContext, type Page, type TestInfo } from '@playwright/test';

/** An e-mail address no earlier run or other viewport project has used. */
export function uniqueEmail(testInfo: TestInfo, tag = 'user'): string {
  const stamp = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e6).toString(36)}`;
  return `${tag}-${testInfo.project.name}-${stamp}@example.test`;
}

export const PASSWORD = 'copper-tube-42!';

/** Saves .tmp/screenshots/<project>-<step>.png (git-ignored) for a look by eye. */
export async function shot(page: Page, testInfo: TestInfo, step: string): Promise<void> {
  await page.screenshot({ path: `.tmp/screenshots/${testInfo.project.name}-${step}.png`, fullPage: false });
}

/** The page must never need sideways scrolling (the phone layout rule). */
export async function expectNoSidewaysScroll(page: Page): Promise<void> {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow, 'page is wider than the viewport').toBeLessThanOrEqual(0);
}

/** The fonts come from our own origin and are in use. */
export async function expectPlexLoaded(page: Page): Promise<void> {
  const loaded = () =>
    page.evaluate(() =>
      [...document.fonts].filter((f) => f.status === 'loaded').map((f) => f.family.replace(/["']/g, '')),
    );
  await expect.poll(loaded).toEqual(expect.arrayContaining(['IBMPlexSans_400Regular', 'IBMPlexSans_600SemiBold']));
}

export async function signUpInUi(page: Page, user: { name: string; email: string; password: string }): Promise<void> {
  await page.getByTestId('sign-up-name').fill(user.name);
  await page.getByTestId('sign-up-email').fill(user.email);
  await page.getByTestId('sign-up-password').fill(user.password);
  await page.getByTestId('sign-up-submit').click();
}

export async function signInInUi(page: Page, email: string, password: string): Promise<void> {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

/** Creates an account through the API (state-changing calls carry our Origin, as the server requires). */
export async function signUpByApi(request: APIRequestContext, baseURL: string, user: { name: string; email: string; password: string }) {
  const res = await request.post('/api/auth/sign-up', { data: user, headers: { Origin: baseURL } });
  expect(res.status(), await res.text()).toBe(201);
}
