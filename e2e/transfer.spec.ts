import { expect, test } from '@playwright/test';
import { DEFAULT_TECHNOLOGY as T } from '../src/core/model/technology.ts';
import { RailwisePage } from './pages/RailwisePage.ts';
import { watchErrors } from './pages/errors.ts';
import { TransferView } from './pages/transfer.ts';

test('the DC transfer curve of the inverter starter: VM, the convention, the points as CSV', async ({
  page,
}) => {
  const errors = watchErrors(page);
  const app = new RailwisePage(page);
  await app.open();
  await app.starter('Inverter');
  const view = new TransferView(page);
  await view.open();

  // Closed form VM = (VTn + r(VDD − |VTp|)) / (1 + r), r = √(k'p·(W/L)p / (k'n·(W/L)n)) (Weste &
  // Harris, CMOS VLSI Design, 4th ed., eq. 2.50 form) for the starter's sizes and the default
  // technology. It leaves out λ, which the level-1 curve keeps: within 30 mV.
  const netlist = (await app.netlist()) as unknown as { devices: { kind: string; w: number; l: number }[] };
  const ratio = (kind: string): number => {
    const d = netlist.devices.find((x) => x.kind === kind);
    return (d?.w ?? NaN) / (d?.l ?? NaN);
  };
  const r = Math.sqrt((T.kpp * ratio('pmos')) / (T.kpn * ratio('nmos')));
  const closed = (T.vtn + r * (T.vdd - T.vtp)) / (1 + r);
  expect(Math.abs((await view.volts('vm')) - closed)).toBeLessThan(0.03);
  for (const mark of ['vm', 'vil', 'vih', 'vol', 'voh', 'nml', 'nmh'])
    await expect(view.mark(mark)).toBeVisible();

  // VOL at the unity-gain points lies above 0 V; with the input at the rails it is the rail itself.
  expect(await view.volts('vol')).toBeGreaterThan(0.01);
  await view.convention.selectOption('rails');
  await expect(view.figure('vol')).toHaveText('0.000 V');
  await expect(view.chart).toHaveAttribute('aria-label', /at the rails/);

  const download = page.waitForEvent('download');
  await view.csvLink.click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('inverter-transfer-A.csv');
  const text = Buffer.concat(await (await file.createReadStream()).toArray()).toString('utf8');
  const records = text.split('\r\n');
  expect(records[0]).toBe('V(A) [V],V(Y) [V]');
  expect(records).toHaveLength(203);
  expect(records[201]?.startsWith('2.5,')).toBe(true);
  await page.screenshot({ path: test.info().outputPath('transfer-curve.png') });
  expect(errors).toEqual([]);
});
