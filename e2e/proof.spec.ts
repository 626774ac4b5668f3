import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import { equalityComparator, equalityExpectation } from '../bench/generators/proofCells.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';
import { exportSpice } from '../src/core/netlist-io/spiceExport.ts';
import { RailwisePage } from './pages/RailwisePage.ts';
import { watchErrors } from './pages/errors.ts';

// A NAND2 whose MN1 source went to VDD: with A = B = 1 its output is a degraded high, not the 0 a
// NAND gives (common practice, no source), so its function fails at exactly that vector.
const SLIP = 'public/examples/nand2-miswired.sp';
const LIBRARY = 'public/examples/tidewater-cells.sp';

test('proving a miswired NAND2: the counterexample goes on the sheet; compared with the library NAND2', async ({
  page,
}) => {
  const errors = watchErrors(page);
  const app = new RailwisePage(page);
  await app.open();
  await app.openFile('nand2-miswired.sp', readFileSync(SLIP, 'utf8'));
  const panel = page.getByTestId('analysis-panel');
  const proof = panel.getByTestId('proof-section');
  await proof.locator('summary').click();
  await proof.getByTestId('proof-start').click();
  await expect(proof.getByTestId('proof-summary')).toContainText('of 6 properties proved', {
    timeout: 15_000,
  });

  const fn = proof.getByTestId('proof-property-0');
  await expect(fn).toContainText('Y follows its expected function: fails at A=1 B=1');
  await expect(proof.getByTestId('proof-property-1')).toContainText('proved for every vector');
  await fn.getByTestId('proof-show-0').click();
  const shown = await page.evaluate(() => window.__railwise!.state().simulation.vector);
  expect(shown).toEqual({ A: '1', B: '1' });
  expect(await page.evaluate(() => window.__railwise!.overlayLevel('Y'))).toBe('1');

  const compare = panel.getByTestId('compare-section');
  await compare.locator('summary').click();
  await compare.getByTestId('compare-file').setInputFiles({
    name: 'tidewater-cells.sp',
    mimeType: 'text/plain',
    buffer: readFileSync(LIBRARY),
  });
  await compare.getByTestId('compare-cell').selectOption('tw_nand2');
  const answer = compare.getByTestId('compare-answer');
  await expect(answer).toContainText('Differs from tw_nand2 of tidewater-cells.sp at A=1 B=1', {
    timeout: 15_000,
  });
  await expect(answer).toContainText('Y: 1 in tw_nand2_slip, 0 in tw_nand2');
  await page.screenshot({ path: test.info().outputPath('proof.png') });
  expect(errors).toEqual([]);
});

test('past the exhaustive limit the table offers the proof: a 22-input comparator proved in the background', async ({
  page,
}) => {
  const app = new RailwisePage(page);
  await app.open();
  const expectations = { EQ: equalityExpectation(11) };
  const text = exportSpice(equalityComparator(11), DEFAULT_TECHNOLOGY, { expectations });
  await app.openFile('equality-11.sp', text);
  const panel = page.getByTestId('analysis-panel');
  await expect(panel.getByTestId('sweep-limit')).toContainText('22 inputs');
  await panel.getByTestId('sweep-limit-prove').click();
  const proof = panel.getByTestId('proof-section');
  await expect(proof.getByTestId('proof-summary')).toContainText('6 of 6 properties proved', {
    timeout: 20_000,
  });
  await expect(proof.getByTestId('proof-property-0')).toContainText(
    'EQ follows its expected function: proved',
  );
});
