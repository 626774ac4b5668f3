import { expect, test, type Page } from '@playwright/test';
import { RailwisePage } from './pages/RailwisePage.ts';

/**
 * docs/semantics.md §1, "No silent connections", one test per editing command, on the starter
 * NAND2 the page opens on (PA and PB above the output Y, NA over NB below). A command either keeps
 * every connection, or is refused with the nets named and the place marked on the sheet; only a
 * wire, a net name or a deliberate drop connects, and then the contact shows on the sheet.
 */

async function openNand2(page: Page): Promise<RailwisePage> {
  const app = new RailwisePage(page);
  await app.open();
  await expect.poll(() => app.page.evaluate(() => window.__railwise!.state().design.name)).toBe('nand2');
  return app;
}

async function expectRefused(
  app: RailwisePage,
  before: unknown,
  depth: number,
  nets: string[],
): Promise<void> {
  await expect(app.message).toHaveAttribute('data-kind', 'warning');
  for (const net of nets) await expect(app.message).toContainText(net);
  expect(await app.netlist()).toEqual(before);
  expect(await app.undoDepth()).toBe(depth);
  expect((await app.contactMarks())?.kind).toBe('refused');
}

test('Turn: PA of the starter NAND2 is not turned onto VDD and Y; the nets stay apart', async ({ page }) => {
  const app = await openNand2(page);
  const before = await app.netlist();
  await app.selectDevice('PA');
  await app.press('q');
  await expectRefused(app, before, 0, ['VDD', 'Y']);
  await expect(page.getByTestId('vector-findings')).toBeVisible();
});

test('Flip: PA flips with everything on it kept as it was, one undo away', async ({ page }) => {
  const app = await openNand2(page);
  const before = await app.netlist();
  await app.selectDevice('PA');
  await app.toolbarButton('Flip').click();
  expect(await app.undoDepth()).toBe(1);
  expect(await app.netlist()).toEqual(before);
  await app.press('Control+z');
  expect(await app.undoDepth()).toBe(0);
});

test('Nudge: PB moves down until its gate would touch the Y wire, and there it stops', async ({ page }) => {
  const app = await openNand2(page);
  const before = await app.netlist();
  await app.selectDevice('PB');
  for (let i = 0; i < 3; i++) await app.press('ArrowDown');
  await expectRefused(app, before, 2, ['B', 'Y']);
});

test('Move: a drag that lays PB’s gate on the Y wire is refused and PB goes back', async ({ page }) => {
  const app = await openNand2(page);
  const before = await app.netlist();
  const at = await app.devicePosition('PB');
  await app.selectDevice('PB');
  await app.dragFrom({ x: at.x - 0.8, y: at.y + 0.6 }, { x: at.x - 0.8, y: at.y + 3.6 });
  await expectRefused(app, before, 0, ['B', 'Y']);
  expect(await app.devicePosition('PB')).toEqual(at);
});

/** True when the part's pins share a net with no pin of any other part. */
async function touchesNothing(app: RailwisePage, partName: string): Promise<boolean> {
  const nets = await app.pinNets();
  const id = await app.page.evaluate(
    (name) => window.__railwise!.state().doc.sheet.parts.find((p) => p.name === name)!.id,
    partName,
  );
  const own = Object.entries(nets)
    .filter(([k]) => k.startsWith(`${id}.`))
    .map(([, n]) => n);
  const others = Object.entries(nets)
    .filter(([k]) => !k.startsWith(`${id}.`))
    .map(([, n]) => n);
  return own.length > 0 && own.every((n) => !others.includes(n));
}

test('Duplicate: the copy of PA lands where it touches nothing, not with its gate on Y', async ({ page }) => {
  const app = await openNand2(page);
  const before = await app.netlist();
  await app.selectDevice('PA');
  await app.press('Control+d');
  await expect.poll(() => app.partCount()).toBe(18);
  expect(await touchesNothing(app, 'P1')).toBe(true);
  expect((await app.netlist()).devices.slice(0, 4)).toEqual(before.devices);
  expect(await app.undoDepth()).toBe(1);
});

test('Copy and paste: each paste of PB lands clear of everything', async ({ page }) => {
  const app = await openNand2(page);
  await app.selectDevice('PB');
  await app.press('Control+c');
  await app.press('Control+v');
  await app.press('Control+v');
  await expect.poll(() => app.partCount()).toBe(19);
  expect(await touchesNothing(app, 'P1')).toBe(true);
  expect(await touchesNothing(app, 'P2')).toBe(true);
});

test('Cut and Delete take things away and join nothing', async ({ page }) => {
  const app = await openNand2(page);
  await app.selectDevice('NB');
  await app.press('Control+x');
  await app.selectDevice('PB');
  await app.press('Delete');
  const devices = (await app.netlist()).devices;
  expect(devices.map((d) => d.name)).toEqual(['PA', 'NA']);
  // PA and NA keep their own nets: the cell's gate, output and supply are still apart.
  expect(devices[0]).toMatchObject({ gate: 'A', drain: 'Y', source: 'VDD' });
  expect(devices[1]).toMatchObject({ gate: 'A', drain: 'Y' });
});

test('Place: a label dropped on the middle of the Y wire names it, and the contact is marked', async ({
  page,
}) => {
  const app = await openNand2(page);
  await app.press('9');
  await app.clickAt(10, 0);
  expect(await app.contactMarks()).toEqual({ kind: 'made', at: [{ x: 10, y: 0 }] });
  await expect(page.getByTestId('sheet-issue')).toContainText('Y');
});

test('Wire: drawing one is what joins two nets, and the wire is there to see', async ({ page }) => {
  const app = await openNand2(page);
  await app.dragFrom({ x: -8, y: -3 }, { x: -8, y: 0 }); // input pin A to input pin B
  expect(await page.evaluate(() => window.__railwise!.state().doc.sheet.wires.length)).toBe(4);
  await expect(page.getByTestId('sheet-issue')).toContainText('A, B');
});
