import { expect, test } from '@playwright/test';
import { RailwisePage } from './pages/RailwisePage.ts';
import { watchErrors } from './pages/errors.ts';

/**
 * A kind past the nine number keys is placed through the shelf's search. The diode's netlist record
 * (anode, cathode) is the model's own; no published source applies.
 */
test('find the diode by name, place it, wire it and see it in the derived netlist', async ({ page }) => {
  const errors = watchErrors(page);
  const app = new RailwisePage(page);
  await app.open();
  await app.newSheet();

  await app.findPart('dio');
  await app.clickAt(0, 0);
  await app.press('7');
  await app.clickAt(-4, -2);
  await app.findPart('output');
  await app.clickAt(4, 2);
  await app.dragFrom({ x: -4, y: -2 }, { x: 0, y: -2 });
  await app.dragFrom({ x: 0, y: 2 }, { x: 4, y: 2 });

  const netlist = await app.netlist();
  expect(netlist.devices).toEqual([{ kind: 'diode', name: 'D1', anode: 'A', cathode: 'Y' }]);
  expect(netlist.inputs).toEqual(['A']);
  expect(netlist.outputs).toEqual(['Y']);

  // The search narrows the shelf to matches and gives the keys back on Escape.
  const search = page.getByRole('searchbox', { name: 'Find a part' });
  await search.fill('clamp');
  await expect(page.getByRole('region', { name: 'Parts' }).getByRole('button')).toHaveText([/Diode/]);
  await search.press('Escape');
  await expect(search).not.toBeFocused();
  await expect(search).toHaveValue('');
  expect(errors).toEqual([]);
});
