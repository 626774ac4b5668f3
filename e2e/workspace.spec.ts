import { expect, test, type Page } from '@playwright/test';
import { partBounds } from '../src/core/sheet/geometry.ts';
import type { SheetPart } from '../src/core/sheet/types.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';
import { formatCurrent } from '../src/core/view/format.ts';
import { RailwisePage } from './pages/RailwisePage.ts';
import { watchErrors } from './pages/errors.ts';
import { WorkspacePanel } from './pages/workspace.ts';

async function start(page: Page): Promise<{ app: RailwisePage; ws: WorkspacePanel }> {
  const app = new RailwisePage(page);
  await app.open();
  return { app, ws: new WorkspacePanel(page) };
}

/** Clicks the middle of a part's body, found by kind and name in the document. */
async function clickPart(app: RailwisePage, kind: string, name: string): Promise<void> {
  const part = await app.page.evaluate(
    ([k, n]) => window.__railwise!.state().doc.sheet.parts.find((p) => p.kind === k && p.name === n),
    [kind, name] as const,
  );
  if (part === undefined) throw new Error(`no ${kind} named ${name} on the sheet`);
  const box = partBounds(part as SheetPart);
  await app.clickAt((box.x0 + box.x1) / 2, (box.y0 + box.y1) / 2);
}

test('the resistor-load inverter: pick the vector that draws current and read it', async ({ page }) => {
  const errors = watchErrors(page);
  const { app, ws } = await start(page);
  await app.starter('Resistor-load inverter');
  await ws.waitForTable();
  // Sort the table by supply current, largest first, and take the top row.
  const header = ws.table.getByRole('button', { name: /I supply/ });
  await header.click();
  await header.click();
  const [top] = await ws.rowIndices();
  await ws.row(top!).click();
  await expect(ws.bit('A')).toContainText('1');

  // With A = 1 the NMOS is its on-resistance Rn·L/W (Rn = 13 kΩ at W/L = 1: RCN 2nd ed., table 3.3,
  // from memory) in series with the load resistor: I = VDD / (R + Rn·L/W) by Ohm's law.
  const netlist = (await app.netlist()) as unknown as {
    devices: { kind: string; ohms?: number; w?: number; l?: number }[];
  };
  const load = netlist.devices.find((d) => d.kind === 'resistor');
  const nmos = netlist.devices.find((d) => d.kind === 'nmos');
  const amps =
    DEFAULT_TECHNOLOGY.vdd /
    ((load?.ohms ?? NaN) + (DEFAULT_TECHNOLOGY.rn * (nmos?.l ?? NaN)) / (nmos?.w ?? NaN));
  await expect(ws.supplyCurrent).toHaveText(formatCurrent(amps));
  await expect(ws.currentPaths).toContainText('VDD →');
  await expect(ws.currentPaths).toContainText('→ GND');
  await expect(ws.vectorFindings).toContainText('static-current');
  await page.screenshot({ path: test.info().outputPath('current-path.png') });

  // Double-clicking the A pin on the sheet flips it back: no path, no current.
  const pin = await page.evaluate(() =>
    window.__railwise!.state().doc.sheet.parts.find((p) => p.kind === 'input'),
  );
  const at = await app.toPage({ x: pin?.x ?? NaN, y: pin?.y ?? NaN });
  await page.mouse.dblclick(at.x, at.y);
  await expect(ws.bit('A')).toContainText('0');
  await expect(ws.supplyCurrent).toHaveText('0 A');
  await expect(ws.currentPaths).toContainText('No static current');
  // Resting the pointer on the input pin names its net and level over the sheet.
  await page.mouse.move(at.x, at.y);
  await expect(page.getByTestId('pointer-tip')).toContainText('A  0.00 V');
  expect(errors).toEqual([]);
});

/** A NAND2 whose second pull-up drain carries a misspelt net name, as a netlist from a colleague. */
const NAND2_WITH_TYPO = `* two-input NAND; MPB's drain is on Yq instead of Y
.subckt nand2_typo A B Y VDD GND
MPA Y A VDD VDD pmos W=1u L=0.25u
MPB Yq B VDD VDD pmos W=1u L=0.25u
MNA Y A X1 GND nmos W=1u L=0.25u
MNB X1 B GND GND nmos W=1u L=0.25u
.ends
`;

test('a floating output: find its vectors in the table, fix the cell on the sheet, see it clean', async ({
  page,
}) => {
  const errors = watchErrors(page);
  const { app, ws } = await start(page);
  await app.openFile('nand2_typo.sp', NAND2_WITH_TYPO);
  await ws.waitForTable();
  await ws.showOnly('problems');
  // With A = 1 and B = 0 the only conducting pull-up drives Yq, not Y, and the NMOS stack is open:
  // Y has no path to either rail (series-parallel duality of the NAND; common practice, no source).
  // The table fills from the worker after the import: poll rather than read once.
  await expect.poll(() => ws.rowIndices()).toEqual([2]);
  await expect(ws.row(2)).toContainText('floating');
  await expect(ws.row(2)).toContainText('Z');

  // The fix a designer makes on the sheet: rename the misspelt net label to Y.
  await clickPart(app, 'label', 'Yq');
  const name = page.locator('[data-field="name"]');
  await name.fill('Y');
  await name.press('Enter');
  await expect(ws.root.getByTestId('table-empty')).toBeVisible();
  await ws.showOnly('all');
  await expect(ws.tableSummary).toContainText('no findings');
  await expect.poll(() => ws.rowIndices()).toEqual([0, 1, 2, 3]);
  expect(errors).toEqual([]);
});

test('an expected function: a typo is marked where it is, a correct one checks the table', async ({
  page,
}) => {
  const { app, ws } = await start(page);
  await app.starter('NAND2');
  await ws.waitForTable();
  await ws.setExpectation('Y', '!(A & Bx)');
  await expect(ws.expectationError).toBeVisible();
  await expect(ws.expectationError.locator('mark')).toHaveText('Bx');

  // NOR instead of NAND: the truth tables differ at A≠B (common practice, no source).
  await ws.setExpectation('Y', '!(A | B)');
  await expect(ws.expectationError).toHaveCount(0);
  await ws.showOnly('mismatch');
  await expect.poll(() => ws.rowIndices()).toEqual([1, 2]);
  await expect(ws.row(1)).toContainText('≠');

  await ws.setExpectation('Y', '!(A & B)');
  await expect(ws.root.getByTestId('table-empty')).toBeVisible();
  await expect(ws.tableSummary).toContainText('no findings');
  expect(await page.evaluate(() => window.__railwise!.state().design.expectations)).toEqual({
    Y: '!(A & B)',
  });
});

test('a latch sequence: run the steps and read the strip', async ({ page }) => {
  const { app, ws } = await start(page);
  await app.starter('Cross-coupled NAND latch');
  await ws.runSequence();
  // Active-low set, hold, reset, hold: Q = 1, 1, 0, 0 and Qb its complement (W&H 4th ed., sequential
  // circuits; common practice). The holds only work because stored state carries between steps.
  expect(await ws.stripLevels('Q')).toEqual(['1', '1', '0', '0']);
  expect(await ws.stripLevels('Qb')).toEqual(['0', '0', '1', '1']);

  // Show the second step (a hold) on the sheet: Q is still high.
  await ws.sequenceSection.getByTestId('step-1').getByRole('button', { name: '2', exact: true }).click();
  await expect(ws.bit('Sb')).toContainText('1');
  await expect(ws.bit('Rb')).toContainText('1');
  expect(await ws.netRow('Q')).toContain('1');
});

/** Sixteen inputs, each driving a chain of inverters: 2^16 vectors, enough to need a cancel button. */
function sixteenChains(stages: number): string {
  const lines = [
    '* sixteen inverter chains',
    `.subckt chains16 ${Array.from({ length: 16 }, (_, i) => `I${i} O${i}`).join(' ')} VDD GND`,
  ];
  for (let c = 0; c < 16; c++) {
    for (let s = 0; s < stages; s++) {
      const a = s === 0 ? `I${c}` : `n${c}_${s}`;
      const y = s === stages - 1 ? `O${c}` : `n${c}_${s + 1}`;
      lines.push(
        `MP${c}_${s} ${y} ${a} VDD VDD pmos W=2u L=0.25u`,
        `MN${c}_${s} ${y} ${a} GND GND nmos W=1u L=0.25u`,
      );
    }
  }
  return [...lines, '.ends', ''].join('\n');
}

test('a big sweep runs in the background with progress and can be cancelled', async ({ page }) => {
  const errors = watchErrors(page);
  const { app, ws } = await start(page);
  await app.openFile('chains16.sp', sixteenChains(24));
  const startButton = ws.root.getByTestId('sweep-start');
  await expect(startButton).toContainText('65,536');
  await startButton.click();
  await expect(ws.root.getByTestId('job-bar')).toBeVisible();
  // The page stays live while the worker sweeps: flipping an input re-solves the sheet at once.
  await ws.bit('I0').click();
  await expect(ws.bit('I0')).toContainText('1');
  await ws.root.getByTestId('job-cancel').click();
  await expect(ws.root.getByTestId('sweep-cancelled')).toBeVisible();
  await expect(ws.root.getByTestId('job-bar')).toHaveCount(0);
  expect(errors).toEqual([]);
});

test('sequence text: one step per line, the format beside the field, bad text refused at its place', async ({
  page,
}) => {
  const { app, ws } = await start(page);
  await app.starter('Cross-coupled NAND latch');
  const section = ws.sequenceSection;
  await expect(section.getByTestId('steps-format')).toContainText('One step per line or separated by ";"');
  const field = section.getByTestId('steps-text');
  await field.fill('Sb=0 Rb=1\nSb=1 Rb=1\nSb=1, Rb=0\n-\n');
  await section.getByTestId('steps-apply').click();
  await expect(section.locator('[data-testid^="step-"][data-testid$="-Sb"]')).toHaveCount(4);
  await ws.runSequence();
  // Set, hold, reset, then a step that changes nothing: Q = 1, 1, 0, 0 (W&H 4th ed., sequential
  // circuits; common practice).
  expect(await ws.stripLevels('Q')).toEqual(['1', '1', '0', '0']);
  await field.fill('Sb=0 Rb=1\nSb=2');
  await section.getByTestId('steps-apply').click();
  await expect(section.getByRole('alert')).toContainText(
    'line 2, column 4: the value of Sb must be 0, 1, X or Z',
  );
  await expect(section.locator('[data-testid^="step-"][data-testid$="-Sb"]')).toHaveCount(4);
});

test('the sheet shows levels with every panel section closed', async ({ page }) => {
  const { app, ws } = await start(page);
  const open = ws.root.locator('details[open] > summary');
  while ((await open.count()) > 0) await open.first().click();
  // The demo NAND2 at A = 0, B = 0 gives Y = 1; double-clicking the input pin A and then B on the
  // sheet gives A = B = 1 and Y = 0 (common practice, no source).
  expect(await page.evaluate(() => window.__railwise!.overlayLevel('Y'))).toBe('1');
  for (const name of ['A', 'B']) {
    const part = await page.evaluate(
      (n) => window.__railwise!.state().doc.sheet.parts.find((p) => p.kind === 'input' && p.name === n),
      name,
    );
    if (part === undefined) throw new Error(`no input pin ${name}`);
    const box = partBounds(part as SheetPart);
    const at = await app.toPage({ x: (box.x0 + box.x1) / 2, y: (box.y0 + box.y1) / 2 });
    await page.mouse.dblclick(at.x, at.y);
  }
  await expect.poll(() => page.evaluate(() => window.__railwise!.overlayLevel('Y'))).toBe('0');
});
