import { expect, test } from '@playwright/test';
import { RailwisePage } from './pages/RailwisePage.ts';
import { watchErrors } from './pages/errors.ts';

/**
 * A new user draws the static CMOS inverter from an empty sheet with mouse and keyboard.
 * The expected topology (PMOS from VDD to Y, NMOS from Y to GND, gates on A) is common practice,
 * no source.
 */
test('draw an inverter, check the derived netlist, undo and redo it all', async ({ page }) => {
  const errors = watchErrors(page);
  const app = new RailwisePage(page);
  await app.open();
  await app.newSheet();
  expect(await app.partCount()).toBe(0);

  // Parts by key (number keys follow the shelf) and by the shelf button.
  await app.press('2');
  await app.clickAt(0, -3);
  await app.press('1');
  await app.clickAt(0, 3);
  await page.getByRole('button', { name: /VDD rail/ }).click();
  await app.clickAt(0, -5);
  await app.press('6');
  await app.clickAt(0, 5);
  await app.press('7');
  await app.clickAt(-6, 0);
  await app.press('8');
  await app.clickAt(4, 0);
  expect(await app.partCount()).toBe(6);

  // Wires: drag from pin to pin, and onto existing wires (T joins).
  await app.dragFrom({ x: 0, y: -1 }, { x: 0, y: 1 });
  await app.dragFrom({ x: 4, y: 0 }, { x: 0, y: 0 });
  await app.dragFrom({ x: -2, y: -3 }, { x: -2, y: 3 });
  await app.dragFrom({ x: -6, y: 0 }, { x: -2, y: 0 });

  const netlist = await app.netlist();
  expect(netlist.devices).toEqual([
    { kind: 'pmos', name: 'P1', gate: 'A', drain: 'Y', source: 'VDD', w: 2, l: 0.25 },
    { kind: 'nmos', name: 'N1', gate: 'A', drain: 'Y', source: 'GND', w: 1, l: 0.25 },
  ]);
  expect(netlist.inputs).toEqual(['A']);
  expect(netlist.outputs).toEqual(['Y']);
  expect(netlist.rails).toEqual([
    { net: 'VDD', role: 'supply' },
    { net: 'GND', role: 'ground' },
  ]);

  // Ten steps (six parts, four wires) after New: undo them all with the keyboard, then redo.
  const depth = await app.undoDepth();
  for (let i = 0; i < 10; i++) await app.press('Control+z');
  expect(await app.partCount()).toBe(0);
  expect(await app.undoDepth()).toBe(depth - 10);
  for (let i = 0; i < 10; i++) await app.press('Control+Shift+z');
  expect((await app.netlist()).devices).toEqual(netlist.devices);
  expect(errors).toEqual([]);
});

test('edit W and the name in the side form; a bad value is refused with its reason', async ({ page }) => {
  const app = new RailwisePage(page);
  await app.open();
  await app.starter('Inverter');
  const before = await app.netlist();
  const nmos = before.devices.find((d) => d.kind === 'nmos')!;
  // Click the NMOS body on the sheet to select it, then press Enter to reach its name field.
  const pos = await app.devicePosition(nmos.name as string);
  await app.clickAt(pos.x - 0.5, pos.y + 0.5);
  await app.press('Enter');
  await expect(page.getByLabel('Name')).toBeFocused();
  const w = page.getByLabel('W (µm)');
  await w.fill('0');
  await w.press('Enter');
  await expect(page.getByRole('alert').filter({ hasText: 'more than zero' })).toBeVisible();
  expect((await app.netlist()).devices).toEqual(before.devices);
  await w.fill('3');
  await w.press('Enter');
  await expect.poll(async () => (await app.netlist()).devices.find((d) => d.name === nmos.name)!.w).toBe(3);

  // Double-click the part: its name opens for editing; the new name reaches the netlist.
  const at = await app.toPage({ x: pos.x - 0.5, y: pos.y + 0.5 });
  await page.mouse.dblclick(at.x, at.y);
  const name = page.getByLabel('Name');
  await expect(name).toBeFocused();
  await name.fill('NPULL');
  await name.press('Enter');
  await expect.poll(async () => (await app.netlist()).devices.map((d) => d.name)).toContain('NPULL');
});
