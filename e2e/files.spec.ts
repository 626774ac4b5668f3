import { expect, test } from '@playwright/test';
import { RailwisePage } from './pages/RailwisePage.ts';

test('the design autosaves and is there after a reload', async ({ page }) => {
  const app = new RailwisePage(page);
  await app.open();
  await app.starter('NOR2');
  await app.press('3'); // a resistor, so the sheet differs from any starter
  const spot = await app.emptySpot();
  await app.clickAt(spot.x, spot.y);
  const before = await app.netlist();
  await app.waitForAutosave();
  await page.reload();
  await app.open();
  expect(await app.netlist()).toEqual(before);
  expect(before.devices.some((d) => d.kind === 'resistor')).toBe(true);
});

test('a starter cell loads from the shelf, with its expected function, and can be undone', async ({
  page,
}) => {
  const app = new RailwisePage(page);
  await app.open();
  const demo = await app.netlist();
  await app.starter('2:1 multiplexer (transmission gates)');
  const mux = await app.netlist();
  expect(mux.devices.filter((d) => d.kind === 'nmos').length).toBeGreaterThanOrEqual(2);
  expect(mux.devices.filter((d) => d.kind === 'pmos').length).toBeGreaterThanOrEqual(2);
  const expectations = await page.evaluate(() => window.__railwise!.state().design.expectations);
  expect(Object.keys(expectations).length).toBeGreaterThan(0);
  await app.press('Control+z');
  expect(await app.netlist()).toEqual(demo);
});

test('a malformed design file gives a message naming the file, and the design is untouched', async ({
  page,
}) => {
  const app = new RailwisePage(page);
  await app.open();
  const before = await app.netlist();
  await app.openFile(
    'broken.railwise.json',
    '{\n  "format": "railwise-design",\n  "version": 1,\n  "name": \n}',
  );
  await expect(app.message).toContainText('broken.railwise.json');
  await expect(app.message).toContainText('unchanged');
  expect(await app.netlist()).toEqual(before);

  await app.openFile('cell.sp', '* a cell\nM1 y a 0 0 nmos W=1u L=0.25u\nQ1 a b c npn\n.end\n');
  await expect(app.message).toContainText('cell.sp:3');
  expect(await app.netlist()).toEqual(before);
});

test('a SPICE netlist imports and is placed: pull-up above, pull-down below, inputs left', async ({
  page,
}) => {
  const app = new RailwisePage(page);
  await app.open();
  const spice = [
    '* two-input NOR of our own',
    '.subckt nor2 a b y vdd gnd',
    'mp1 m a vdd vdd pmos w=2u l=0.25u',
    'mp2 y b m vdd pmos w=2u l=0.25u',
    'mn1 y a gnd gnd nmos w=1u l=0.25u',
    'mn2 y b gnd gnd nmos w=1u l=0.25u',
    '.ends',
    '',
  ].join('\n');
  await app.openFile('nor2.sp', spice);
  await expect(app.message).toContainText('Imported');
  const parts = await page.evaluate(() => window.__railwise!.state().doc.sheet.parts);
  const ys = (kind: string) => parts.filter((p) => p.kind === kind).map((p) => p.y);
  expect(Math.max(...ys('pmos'))).toBeLessThan(Math.min(...ys('nmos')));
  const xs = (kind: string) => parts.filter((p) => p.kind === kind).map((p) => p.x);
  expect(Math.max(...xs('input'))).toBeLessThan(Math.min(...xs('pmos'), ...xs('nmos')));
  expect((await app.netlist()).devices).toHaveLength(4);
});

test('exports download: SVG drawing, SPICE netlist and PNG picture', async ({ page }) => {
  const app = new RailwisePage(page);
  await app.open();
  const exportMenu = page.getByRole('combobox', { name: 'Export' });
  const svgDownload = page.waitForEvent('download');
  await exportMenu.selectOption({ label: 'drawing (SVG)' });
  const svg = await svgDownload;
  expect(svg.suggestedFilename()).toMatch(/\.svg$/);
  const spiceDownload = page.waitForEvent('download');
  await exportMenu.selectOption({ label: 'SPICE netlist' });
  expect((await spiceDownload).suggestedFilename()).toMatch(/\.sp$/);
  const pngDownload = page.waitForEvent('download');
  await exportMenu.selectOption({ label: 'picture (PNG)' });
  const png = await pngDownload;
  expect(png.suggestedFilename()).toMatch(/\.png$/);
  // The PNG signature (ISO/IEC 15948:2004, clause 5.2, from memory): 89 50 4E 47 0D 0A 1A 0A.
  const bytes = await (await png.createReadStream()).toArray();
  expect(Buffer.concat(bytes).subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
});

test('the key map is in the help overlay and the About box carries the caution', async ({ page }) => {
  const app = new RailwisePage(page);
  await app.open();
  await app.press('h');
  const help = page.getByRole('dialog', { name: 'Keys and mouse' });
  await expect(help).toContainText('Turn a quarter clockwise');
  await expect(help).toContainText('Place NMOS');
  await app.press('Escape');
  await expect(help).toBeHidden();
  await app.toolbarButton('About').click();
  await expect(page.getByRole('dialog', { name: 'About Railwise' })).toContainText('not sign-off');
});
