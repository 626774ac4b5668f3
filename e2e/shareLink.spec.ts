import { expect, test } from '@playwright/test';
import { encodeDesignFragment } from '../src/app/shareLink.ts';
import { serializeDesign } from '../src/core/format/designFile.ts';
import { starterById } from '../src/core/starters/index.ts';
import { designOfCell } from '../src/core/hierarchy/cellDesign.ts';
import { RailwisePage } from './pages/RailwisePage.ts';

test('a shared link opens the design it carries; a damaged one changes nothing', async ({ page }) => {
  const app = new RailwisePage(page);
  const fragment = await encodeDesignFragment(
    serializeDesign(designOfCell(starterById('tristate-inverter')!.design)),
  );

  await app.open(`/${fragment}`);
  await expect(app.message).toContainText('from a shared link');
  const shared = await app.netlist();
  expect([...shared.inputs].sort()).toEqual(['A', 'EN']);
  expect(page.url()).not.toContain('#design=');

  await page.goto('about:blank');
  await app.open(`/${fragment.slice(0, 60)}`);
  await expect(app.message).toContainText('shared link');
  await expect(app.message).toContainText('unchanged');
  expect(await app.netlist()).toEqual(shared);
});

test('Share link gives a link that reopens the design', async ({ page }) => {
  await page.context().grantPermissions(['clipboard-read', 'clipboard-write']);
  const app = new RailwisePage(page);
  await app.open();
  await app.starter('AOI21');
  const drawn = await app.netlist();
  await app.toolbarButton('Share a link to this design').click();
  await expect(app.message).toContainText('link to this design');
  // Where the browser refuses the clipboard the link goes to the address bar instead.
  const link = page.url().includes('#design=')
    ? page.url()
    : await page.evaluate(() => navigator.clipboard.readText());
  expect(link).toContain('#design=');
  await app.starter('Inverter');
  await page.goto('about:blank');
  await app.open(link.slice(link.indexOf('/', 'http://'.length)));
  await expect(app.message).toContainText('from a shared link');
  expect(await app.netlist()).toEqual(drawn);
});
