import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import { RailwisePage } from './pages/RailwisePage.ts';
import { WorkspacePanel } from './pages/workspace.ts';

/** An enhancement-load inverter of our own: the NMOS load passes a threshold-degraded high. */
const NMOS_LOAD_INVERTER = [
  '* enhancement-load inverter of our own',
  '.subckt nload a y vdd gnd',
  'ml vdd vdd y gnd nmos w=1u l=1u',
  'md y a gnd gnd nmos w=4u l=0.25u m=2 ad=1p',
  '.ends',
].join('\n');

test('a cell with warnings only is not called clean, and its degraded level is marked in the cell', async ({
  page,
}) => {
  const app = new RailwisePage(page);
  const ws = new WorkspacePanel(page);
  await app.open();
  await app.openFile('nload.sp', NMOS_LOAD_INVERTER);
  await ws.waitForTable();
  // a = 0: y reaches only VDD − Vtn through the load (degraded); a = 1: current through both (common practice).
  await expect(page.getByTestId('table-section-badge')).toHaveText('△ 2 warnings');
  await expect(ws.tableSummary).toContainText('2 vectors: 0 errors, 2 warnings');
  await expect(page.getByTestId('level-0-y')).toHaveText('1↓');
  await expect(page.getByTestId('level-1-y')).toHaveText('0');
  await expect(page.getByTestId('vector-number')).toHaveText('vector 1 of 2');
});

test('import notes show in the app, stay through a reload, and go when dismissed', async ({ page }) => {
  const app = new RailwisePage(page);
  await app.open();
  await app.openFile('nload.sp', NMOS_LOAD_INVERTER);
  const notes = page.getByTestId('design-notes');
  await expect(notes).toContainText('Imported from nload.sp');
  await expect(notes).toContainText('ad');
  await expect(notes).toContainText('m=');
  await app.waitForAutosave();
  await page.reload();
  await app.open();
  await expect(notes).toContainText('Imported from nload.sp');
  await notes.getByRole('button', { name: 'Dismiss notes' }).click();
  await expect(notes).toHaveCount(0);
  await app.press('Control+z');
  await expect(notes).toContainText('Imported from nload.sp');
});

test('messages sit under the sheet, never over it, and clear when their reason is gone', async ({ page }) => {
  const app = new RailwisePage(page);
  await app.open();
  await expect(app.message).toContainText('Welcome');
  const sheet = await app.sheet.boundingBox();
  const line = await app.message.boundingBox();
  expect(line!.y).toBeGreaterThanOrEqual(sheet!.y + sheet!.height - 1);
  await app.toolbarButton('New').click();
  await expect(app.message).toHaveCount(0);
  await app.starter('NOR2');
  await expect(app.message).toContainText('NOR2');
  await app.press('5');
  const spot = await app.emptySpot();
  await app.clickAt(spot.x, spot.y);
  await expect(app.message).toHaveCount(0);
  // Every toolbar button that shows a word is named by that word.
  const buttons = page.getByRole('toolbar').getByRole('button');
  for (const button of await buttons.all()) {
    const text = (await button.innerText()).trim();
    if (/\p{L}/u.test(text)) await expect(button).toHaveAccessibleName(text);
  }
});

test('View all shows every stage of a 200-stage inverter chain', async ({ page }) => {
  const app = new RailwisePage(page);
  await app.open();
  const lines = ['* 200 inverters in a row, of our own', '.subckt chain in out vdd gnd'];
  for (let i = 0; i < 200; i++) {
    const [a, y] = [i === 0 ? 'in' : `n${i}`, i === 199 ? 'out' : `n${i + 1}`];
    lines.push(`mp${i} ${y} ${a} vdd vdd pmos w=2u l=0.25u`, `mn${i} ${y} ${a} gnd gnd nmos w=1u l=0.25u`);
  }
  await app.openFile('chain.sp', [...lines, '.ends'].join('\n'));
  await app.toolbarButton('View all').click();
  const inView = await page.evaluate(() => {
    const { doc, viewport, screen } = window.__railwise!.state();
    return doc.sheet.parts.every((p) => {
      const x = p.x * viewport.scale + viewport.x;
      const y = p.y * viewport.scale + viewport.y;
      return x >= 0 && x <= screen.width && y >= 0 && y <= screen.height;
    });
  });
  expect(inView).toBe(true);
});

test('the undo history survives a reload', async ({ page }) => {
  const app = new RailwisePage(page);
  await app.open();
  await app.newSheet();
  const spot = await app.emptySpot();
  for (let i = 0; i < 3; i++) {
    await app.press('1');
    await app.clickAt(spot.x - 8 * i, spot.y);
  }
  expect(await app.undoDepth()).toBe(4); // New and three placements
  await app.waitForAutosave();
  await page.waitForFunction(() => window.__railwise!.historyCaughtUp());
  await page.reload();
  await app.open();
  expect(await app.partCount()).toBe(3);
  expect(await app.undoDepth()).toBe(4);
  await app.press('Control+z');
  expect(await app.partCount()).toBe(2);
});

test('the same cell gives the same power figure in the app and from the command line', async ({ page }) => {
  const dir = mkdtempSync(join(tmpdir(), 'railwise-e2e-'));
  const file = join(dir, 'nload.sp');
  writeFileSync(file, NMOS_LOAD_INVERTER);
  const cli = spawnSync(process.execPath, ['bin/railwise.mjs', 'check', file, '--power', '--json'], {
    encoding: 'utf8',
  });
  const power = (JSON.parse(cli.stdout) as { power: { totalWatts: number; load: number } }).power;
  const app = new RailwisePage(page);
  await app.open();
  await app.openFile('nload.sp', NMOS_LOAD_INVERTER);
  await expect
    .poll(() => page.evaluate(() => window.__railwise!.state().simulation.power?.totalWatts ?? null))
    .toBe(power.totalWatts);
  // Both used the one default load (10 fF per output, docs/semantics.md §5).
  expect(power.load).toBe(1e-14);
  expect(await page.evaluate(() => window.__railwise!.state().simulation.powerSettings.load)).toBe(1e-14);
});

test('open, export as SPICE, open again: the drawing and the circuit come back as they were', async ({
  page,
}) => {
  const app = new RailwisePage(page);
  await app.open();
  await app.selectDevice('PB');
  await app.press('ArrowUp'); // a layout of the designer's own, not the automatic one
  const before = await page.evaluate(() => {
    const s = window.__railwise!.state();
    return { sheet: s.doc.sheet, netlist: s.design.netlist };
  });
  const download = page.waitForEvent('download');
  await page.getByRole('combobox', { name: 'Export' }).selectOption({ label: 'SPICE netlist' });
  const text = await (await (await download).createReadStream()).toArray();
  await app.openFile('nand2.sp', Buffer.concat(text).toString('utf8'));
  await expect(app.message).toContainText('Imported nand2');
  const after = await page.evaluate(() => {
    const s = window.__railwise!.state();
    return { sheet: s.doc.sheet, netlist: s.design.netlist };
  });
  expect(after).toEqual(before);
});
