/**
 * The coil workspace at phone (390x844) and wide (1440x900): create a coil from a starting point, see every tool on
 * screen, draw a 2-row, 4-tube coil's two circuits bend by bend, read a tube's circuit and water temperatures, mark
 * and unmark crossovers, break a bend and see the error on the sheet (and from the problem list), undo and redo,
 * generate a standard circuiting for a 4-row, 24-tube coil, switch units, reload and find the draft intact.
 */
import { expect, test, type Page, type TestInfo } from '@playwright/test';
import { expectNoSidewaysScroll, PASSWORD, signUpInUi, uniqueEmail } from './helpers';

async function snap(page: Page, testInfo: TestInfo, step: string) {
  await page.screenshot({ path: `.tmp/screenshots/editor-${testInfo.project.name}-${step}.png`, fullPage: false });
}

const tube = (page: Page, row: number, t: number) => page.getByTestId(`tube-r${row}-t${t}`);

async function bend(page: Page, a: [number, number], b: [number, number]) {
  await tube(page, ...a).click();
  await tube(page, ...b).click();
}

async function setField(page: Page, testID: string, value: string) {
  const field = page.getByTestId(testID);
  await field.fill(value);
  await field.press('Enter');
}

test('draw, break, undo, generate, switch units and reload a coil', async ({ page, baseURL }, testInfo) => {
  test.setTimeout(180_000);
  const phone = testInfo.project.name === 'phone';
  const showTab = async (tab: 'Sheet' | 'Geometry' | 'Conditions' | 'Results') => {
    if (phone) await page.getByTestId('phone-tabs').getByRole('radio', { name: tab }).click();
  };

  await page.goto('/sign-up');
  await signUpInUi(page, { name: 'Ines Farrow', email: uniqueEmail(testInfo, 'editor'), password: PASSWORD });
  await expect(page.getByTestId('projects-screen')).toBeVisible();

  // The project comes from the API (the project screens have their own tests); the session cookie is shared.
  const me = await (await page.request.get('/api/me')).json();
  const created = await page.request.post(`/api/teams/${me.teams[0].id}/projects`, {
    data: { name: 'Marlow Street offices' },
    headers: { Origin: baseURL! },
  });
  expect(created.status()).toBe(201);
  const { project } = await created.json();
  await page.goto(`/projects/${project.id}`);

  // 1. A coil from the 1/2 in starting point, 2 rows x 4 tubes: it arrives circuited and solved.
  await page.getByTestId('new-coil').click();
  await page.getByTestId('new-coil-name').fill('Trial coil');
  await setField(page, 'new-coil-rows', '2');
  await setField(page, 'new-coil-tubes', '4');
  await snap(page, testInfo, '01-new-coil');
  await page.getByTestId('new-coil-create').click();
  await expect(page).toHaveURL(/\/coils\//);
  await expect(page.getByTestId('circuit-summary')).toHaveText(/4 circuits · 2 passes · counterflow/);
  await expect(tube(page, 2, 4)).toBeVisible();
  // Every tool is on screen: nothing is cut off at the right and nothing scrolls sideways.
  const width = page.viewportSize()!.width;
  for (const button of await page.getByTestId('editor-toolbar').getByRole('button').all()) {
    const box = (await button.boundingBox())!;
    expect(box.x + box.width, await button.innerText()).toBeLessThanOrEqual(width);
  }
  await expectNoSidewaysScroll(page);

  // 2. Clear it with the erase tool and draw two 4-pass counterflow circuits bend by bend.
  await page.getByTestId('tool-erase').click();
  for (const face of ['opposite', 'connection'] as const) {
    await page.getByTestId(`face-${face}`).click();
    for (let r = 1; r <= 2; r++) for (let t = 1; t <= 4; t++) await tube(page, r, t).click();
  }
  await expect(page.getByTestId('circuit-summary')).toHaveText(/No complete circuit/);
  await page.getByTestId('tool-bend').click();
  await page.getByTestId('face-opposite').click();
  await bend(page, [2, 2], [2, 1]);
  await bend(page, [1, 1], [1, 2]);
  await bend(page, [2, 4], [2, 3]);
  // This one by dragging from one tube to the other (one gesture, one undo step).
  const from = (await tube(page, 1, 3).boundingBox())!;
  const to = (await tube(page, 1, 4).boundingBox())!;
  await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
  await page.mouse.down();
  await page.mouse.move(to.x + to.width / 2, to.y + to.height / 2, { steps: 8 });
  await page.mouse.up();
  await expect(page.getByTestId('bend-opposite-r1-t3-r1-t4')).toBeAttached();
  await page.getByTestId('face-connection').click();
  await bend(page, [2, 1], [1, 1]);
  await bend(page, [2, 3], [1, 3]);
  await page.getByTestId('tool-supply').click();
  await tube(page, 2, 2).click();
  await tube(page, 2, 4).click();
  await page.getByTestId('tool-return').click();
  await tube(page, 1, 2).click();
  await tube(page, 1, 4).click();
  await expect(page.getByTestId('circuit-summary')).toHaveText('2 circuits · 4 passes · counterflow');
  await expect(page.getByTestId('bend-connection-r2-t1-r1-t1')).toBeVisible();
  await snap(page, testInfo, '02-drawn');
  await showTab('Results');
  await expect(page.getByTestId('results-fresh')).toBeVisible({ timeout: 20_000 });
  await expect(page.getByTestId('circuit-row-1')).toContainText('counterflow');
  await expect(page.getByTestId('circuit-row-2')).toContainText('4');
  await expect(page.getByTestId('total-capacity')).toContainText('kW');
  await expectNoSidewaysScroll(page);
  await snap(page, testInfo, '03-results');
  await showTab('Sheet');

  // Tapping a tube with Select tells its circuit, pass and water temperatures; temperature colours get a legend.
  await page.getByTestId('tool-select').click();
  await tube(page, 2, 2).click();
  await expect(page.getByTestId('tube-readout')).toContainText(/Row 2, tube 2 · circuit \d, pass 1 · water in [\d.]+ °C, out [\d.]+ °C/);
  await page.getByTestId('overlay-temperature').click();
  await expect(page.getByTestId('temperature-legend')).toContainText('°C');
  await snap(page, testInfo, '03b-temperatures');
  await page.getByTestId('overlay-temperature').click();

  // Crossovers: with Select, a tube offers its bend on the face shown; a tap on the bend's line picks the bend.
  // Marking draws a bridge mark and is one undo step.
  await page.getByTestId('face-connection').click();
  await tube(page, 2, 1).click();
  await page.getByTestId('toggle-crossover').click();
  await expect(page.getByTestId('crossover-connection-r2-t1-r1-t1')).toBeAttached();
  await expect(page.getByTestId('toggle-crossover')).toHaveText('Unmark crossover');
  await snap(page, testInfo, '03c-crossover');
  await page.getByTestId('undo').click();
  await expect(page.getByTestId('crossover-connection-r2-t1-r1-t1')).toHaveCount(0);
  const [ba, bb] = [(await tube(page, 2, 3).boundingBox())!, (await tube(page, 1, 3).boundingBox())!];
  await page.mouse.click((ba.x + ba.width / 2 + bb.x + bb.width / 2) / 2, (ba.y + ba.height / 2 + bb.y + bb.height / 2) / 2);
  await expect(page.getByTestId('tube-readout')).toHaveText('Bend row 2 tube 3 to row 1 tube 3, connection end');
  await page.getByTestId('toggle-crossover').click();
  await expect(page.getByTestId('crossover-connection-r2-t3-r1-t3')).toBeAttached();
  await expect(page.getByTestId('tube-readout')).toHaveText(/connection end, crossover$/);
  await page.getByTestId('toggle-crossover').click();
  await expect(page.getByTestId('crossover-connection-r2-t3-r1-t3')).toHaveCount(0);

  // 3. Break a bend: the sheet marks the broken circuit's tubes and the summary names the problem.
  await page.getByTestId('tool-erase').click();
  await page.getByTestId('face-opposite').click();
  await tube(page, 1, 1).click();
  await expect(page.getByTestId('circuit-summary')).toHaveText(/problem/);
  await expect(tube(page, 1, 1)).toHaveAttribute('stroke', '#A52A1F');
  await snap(page, testInfo, '04-broken');
  // Tapping the problem in the list brings the sheet back (phone) with the other circuit faded.
  await showTab('Results');
  await page.getByTestId('issue-list').getByRole('button').first().click();
  await expect(tube(page, 2, 4)).toBeVisible();
  await expect(tube(page, 2, 4).locator('..')).toHaveAttribute('opacity', '0.35');
  await expect(tube(page, 1, 1).locator('..')).not.toHaveAttribute('opacity', '0.35');
  await snap(page, testInfo, '04b-problem-shown');

  // 4. Undo and redo (buttons; keyboard too on wide screens).
  await page.getByTestId('undo').click();
  await expect(page.getByTestId('circuit-summary')).toHaveText('2 circuits · 4 passes · counterflow');
  await page.getByTestId('redo').click();
  await expect(page.getByTestId('circuit-summary')).toHaveText(/problem/);
  if (!phone) {
    await page.keyboard.press('Control+z');
    await expect(page.getByTestId('circuit-summary')).toHaveText('2 circuits · 4 passes · counterflow');
    await page.keyboard.press('Control+Shift+z');
    await expect(page.getByTestId('circuit-summary')).toHaveText(/problem/);
  }
  await page.getByTestId('undo').click();
  await expect(page.getByTestId('circuit-summary')).toHaveText('2 circuits · 4 passes · counterflow');

  // 5. Make it 4 rows x 24 tubes and take a standard circuiting from the comparison list.
  await showTab('Geometry');
  await setField(page, 'geometry-rows', '4');
  await setField(page, 'geometry-tubes', '24');
  await page.getByTestId('open-generator').click();
  await expect(page.getByTestId('generate-24-figures')).toContainText('velocity', { timeout: 30_000 });
  await expect(page.getByTestId('generate-24-figures')).toContainText('kW');
  await snap(page, testInfo, '05-generator');
  await page.getByTestId('generate-24').click();
  await showTab('Sheet');
  await expect(page.getByTestId('circuit-summary')).toHaveText('24 circuits · 4 passes · counterflow');
  await expect(tube(page, 4, 24)).toBeVisible();
  await snap(page, testInfo, '06-generated');

  // 6. Switch units: results follow.
  await page.getByTestId('unit-switch').getByRole('radio', { name: 'IP units' }).click();
  await showTab('Results');
  await expect(page.getByTestId('total-water-dp')).toContainText('ft of water', { timeout: 20_000 });
  await expect(page.getByTestId('total-capacity')).toContainText('MBH');
  await expectNoSidewaysScroll(page);
  await snap(page, testInfo, '07-ip-results');
  await showTab('Sheet');

  // 7. Reload: the draft is on the server.
  await expect(page.getByTestId('save-status')).toHaveText('Saved', { timeout: 15_000 });
  await page.reload();
  await expect(page.getByTestId('circuit-summary')).toHaveText('24 circuits · 4 passes · counterflow', { timeout: 20_000 });
  await expectNoSidewaysScroll(page);
  await snap(page, testInfo, '08-reloaded');

  // 8. The project's coil list shows the coil's figures in the user's units; duplicate, rename and delete it.
  await page.getByTestId('unit-switch').getByRole('radio', { name: 'SI units' }).click();
  await page.getByTestId('back-to-project').click();
  const list = page.getByTestId('coil-list');
  await expect(list).toContainText('4 rows × 24 tubes high');
  await expect(list).toContainText('24 circuits');
  await expect(list).toContainText(/capacity [\d.]+ kW/);
  await expect(list).toContainText(/water pressure drop [\d.]+ kPa/);
  await expectNoSidewaysScroll(page);
  await snap(page, testInfo, '09-coil-list');
  await page.getByTestId('coil-duplicate').click();
  await expect(page.getByTestId('coil-open')).toHaveCount(2);
  await page.getByTestId('coil-rename').nth(1).click();
  await page.getByTestId('rename-coil-name').fill('Trial coil, spare');
  await page.getByTestId('rename-coil-save').click();
  await expect(list).toContainText('Trial coil, spare');
  await page.getByTestId('coil-delete').nth(1).click();
  await expect(page.getByTestId('delete-coil')).toContainText('cannot be undone');
  await page.getByTestId('delete-coil-confirm').click();
  await expect(page.getByTestId('coil-open')).toHaveCount(1);
});

test('a save from a stale revision offers their draft, mine as a version or a comparison, and overwrites nothing', async ({ page, context, baseURL }, testInfo) => {
  test.setTimeout(120_000);
  await page.goto('/sign-up');
  await signUpInUi(page, { name: 'Oren Valdane', email: uniqueEmail(testInfo, 'conflict'), password: PASSWORD });
  await expect(page.getByTestId('projects-screen')).toBeVisible();
  const me = await (await page.request.get('/api/me')).json();
  const created = await page.request.post(`/api/teams/${me.teams[0].id}/projects`, { data: { name: 'Harrow Lane annex' }, headers: { Origin: baseURL! } });
  const { project } = await created.json();
  await page.goto(`/projects/${project.id}`);
  await page.getByTestId('new-coil').click();
  await page.getByTestId('new-coil-name').fill('Shared coil');
  await setField(page, 'new-coil-rows', '2');
  await setField(page, 'new-coil-tubes', '4');
  await page.getByTestId('new-coil-create').click();
  await expect(page).toHaveURL(/\/coils\//);
  await expect(page.getByTestId('circuit-summary')).toHaveText(/4 circuits · 2 passes · counterflow/);
  const coilId = /\/coils\/([\w-]+)/.exec(page.url())![1];

  // A second tab of the same session opens the coil at the same revision.
  const other = await context.newPage();
  await other.goto(page.url());
  await expect(other.getByTestId('circuit-summary')).toHaveText(/4 circuits · 2 passes · counterflow/);

  // Theirs: the first tab breaks a bend and saves (revision 2).
  await page.getByTestId('tool-erase').click();
  await page.getByTestId('face-opposite').click();
  await tube(page, 1, 1).click();
  await expect(page.getByTestId('circuit-summary')).toHaveText(/problem/);
  await expect(page.getByTestId('save-status')).toHaveText('Saved', { timeout: 15_000 });

  // Mine: the second tab marks a crossover; its save from revision 1 is refused and the three ways out are offered.
  await other.getByTestId('tool-select').click();
  await other.getByTestId('face-opposite').click();
  await tube(other, 2, 4).click();
  await other.getByTestId('toggle-crossover').click();
  await expect(other.getByTestId('save-conflict')).toBeVisible({ timeout: 15_000 });
  await expect(other.getByTestId('save-status')).toHaveText('Saved elsewhere');
  await expect(other.getByTestId('conflict-reload')).toHaveText('Load their draft');
  await expect(other.getByTestId('conflict-keep-version')).toHaveText('Keep mine as a version');
  await expect(other.getByTestId('conflict-compare')).toHaveText('Compare');
  await snap(other, testInfo, '10-conflict');

  await other.getByTestId('conflict-keep-version').click();
  await expect(other.getByTestId('conflict-kept')).toContainText('Your drawing is saved as version 1');
  await expect(other.getByTestId('circuit-summary')).toHaveText(/problem/);
  await expect(other.getByTestId('save-status')).toHaveText('Saved');
  await snap(other, testInfo, '11-kept');

  const { versions } = await (await page.request.get(`/api/coils/${coilId}/versions`)).json();
  expect(versions.map((v: { number: number; message: string }) => [v.number, v.message])).toEqual([[1, 'Kept from a conflicting edit (draft revision 1)']]);
  await expect(other.getByTestId('conflict-kept-link')).toHaveAttribute('href', `/versions/${versions[0].id}`);
  const kept = (await (await page.request.get(`/api/versions/${versions[0].id}`)).json()).version.document;
  expect(kept.circuiting.bends.some((b: { crossover?: boolean }) => b.crossover)).toBe(true);
  const draft = (await (await page.request.get(`/api/coils/${coilId}`)).json()).coil;
  expect(draft.revision).toBe(2);
  expect(draft.document.circuiting.bends.some((b: { crossover?: boolean }) => b.crossover)).toBe(false);

  // A second clash, resolved with Compare: both drawings become versions and the comparison opens.
  await page.getByTestId('undo').click();
  await expect(page.getByTestId('circuit-summary')).toHaveText(/4 circuits · 2 passes · counterflow/);
  await expect(page.getByTestId('save-status')).toHaveText('Saved', { timeout: 15_000 });
  await tube(other, 2, 4).click();
  await other.getByTestId('toggle-crossover').click();
  await expect(other.getByTestId('save-conflict')).toBeVisible({ timeout: 15_000 });
  await other.getByTestId('conflict-compare').click();
  await expect(other).toHaveURL(/\/compare\/[\w-]+\/[\w-]+/);
  const after = (await (await page.request.get(`/api/coils/${coilId}/versions`)).json()).versions as { id: string; number: number; message: string }[];
  expect(after.map((v) => [v.number, v.message])).toEqual([
    [3, 'Draft at the time of a conflicting edit'],
    [2, 'Kept from a conflicting edit (draft revision 2)'],
    [1, 'Kept from a conflicting edit (draft revision 1)'],
  ]);
  expect(new URL(other.url()).pathname).toBe(`/compare/${after[1].id}/${after[0].id}`);
  expect((await (await page.request.get(`/api/coils/${coilId}`)).json()).coil.revision).toBe(3);
  await snap(other, testInfo, '12-compare');
  await other.close();
});
