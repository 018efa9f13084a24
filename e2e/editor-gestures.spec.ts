/**
 * Zoom and pan of the tube sheet: wheel zoom and mouse drag-pan on a wide screen, two-finger pinch and one-finger
 * pan on a phone (touch points through the Chrome DevTools Protocol, which Chromium turns into touch pointer
 * events), and the fit button. Pan and zoom move a wrapper inside the sheet viewport (ARCHITECTURE.md 4), so the
 * test reads that wrapper's CSS transform.
 */
import { readFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { PASSWORD, signUpInUi, uniqueEmail } from './helpers';

interface View { zoom: number; x: number; y: number }

async function viewOf(page: Page): Promise<View> {
  const transform = await page.getByTestId('sheet-viewport').evaluate((el) => getComputedStyle(el.firstElementChild as Element).transform);
  const m = /matrix\(([^)]+)\)/.exec(transform);
  if (!m) return { zoom: 1, x: 0, y: 0 };
  const [a, , , , e, f] = m[1].split(',').map(Number);
  return { zoom: a, x: e, y: f };
}

async function openCoil(page: Page, baseURL: string, email: string) {
  await page.goto('/sign-up');
  await signUpInUi(page, { name: 'Tamsin Ardley', email, password: PASSWORD });
  await expect(page.getByTestId('projects-screen')).toBeVisible();
  const me = await (await page.request.get('/api/me')).json();
  const headers = { Origin: baseURL };
  const project = (await (await page.request.post(`/api/teams/${me.teams[0].id}/projects`, { data: { name: 'Gesture check' }, headers })).json()).project;
  const document = JSON.parse(readFileSync('assets/examples/twin-counterflow-4-row.json', 'utf8'));
  const created = await page.request.post(`/api/projects/${project.id}/coils`, { data: { name: 'Gesture coil', document }, headers });
  expect(created.status()).toBe(201);
  const { coil } = await created.json();
  await page.goto(`/projects/${project.id}/coils/${coil.id}`);
  await expect(page.getByTestId('sheet-viewport')).toBeVisible();
  await expect(page.getByTestId('tube-r1-t1')).toBeVisible();
}

/** A point inside the viewport that is not on a tube (the left margin beside the row labels). */
async function emptySpot(page: Page) {
  const box = (await page.getByTestId('sheet-viewport').boundingBox())!;
  return { x: box.x + 12, y: box.y + box.height / 2, box };
}

test('wheel zooms and a drag on empty sheet pans (wide); fit brings the sheet back', async ({ page, baseURL }, testInfo) => {
  test.skip(testInfo.project.name !== 'wide', 'mouse gestures are the wide-screen ones');
  await openCoil(page, baseURL!, uniqueEmail(testInfo, 'wheel'));
  const start = await viewOf(page);
  const { x, y, box } = await emptySpot(page);

  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.wheel(0, -400);
  await expect.poll(async () => (await viewOf(page)).zoom).toBeGreaterThan(start.zoom * 1.2);
  const zoomed = await viewOf(page);

  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(x + 40, y + 10, { steps: 4 });
  await page.mouse.move(x + 90, y + 30, { steps: 4 });
  await page.mouse.up();
  const panned = await viewOf(page);
  expect(panned.x - zoomed.x).toBeCloseTo(90, -1);
  expect(panned.y - zoomed.y).toBeCloseTo(30, -1);
  expect(panned.zoom).toBeCloseTo(zoomed.zoom, 5);

  await page.getByTestId('fit').click();
  await expect.poll(async () => (await viewOf(page)).zoom).toBeCloseTo(start.zoom, 3);
  const fitted = await viewOf(page);
  expect(fitted.x).toBeCloseTo(start.x, 0);
  expect(fitted.y).toBeCloseTo(start.y, 0);
});

test('two fingers pinch to zoom and one finger pans (phone)', async ({ page, baseURL }, testInfo) => {
  test.skip(testInfo.project.name !== 'phone', 'touch gestures are the phone ones');
  await openCoil(page, baseURL!, uniqueEmail(testInfo, 'pinch'));
  const cdp = await page.context().newCDPSession(page);
  const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', points: { x: number; y: number; id: number }[]) =>
    cdp.send('Input.dispatchTouchEvent', { type, touchPoints: points.map((p) => ({ x: p.x, y: p.y, id: p.id })) });

  const start = await viewOf(page);
  const { box } = await emptySpot(page);
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;

  // Pinch out: two fingers 40 px apart move to 160 px apart.
  await touch('touchStart', [{ x: cx - 20, y: cy, id: 1 }, { x: cx + 20, y: cy, id: 2 }]);
  for (let d = 30; d <= 80; d += 10) await touch('touchMove', [{ x: cx - d, y: cy, id: 1 }, { x: cx + d, y: cy, id: 2 }]);
  await touch('touchEnd', []);
  await expect.poll(async () => (await viewOf(page)).zoom).toBeGreaterThan(start.zoom * 2);
  const pinched = await viewOf(page);

  // One finger on empty sheet pans.
  const { x, y } = await emptySpot(page);
  await touch('touchStart', [{ x, y, id: 3 }]);
  for (let d = 10; d <= 60; d += 10) await touch('touchMove', [{ x: x + d, y: y + d / 2, id: 3 }]);
  await touch('touchEnd', []);
  const panned = await viewOf(page);
  expect(panned.x - pinched.x).toBeCloseTo(60, -1);
  expect(panned.y - pinched.y).toBeCloseTo(30, -1);
});
