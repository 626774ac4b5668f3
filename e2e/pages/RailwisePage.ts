import { expect, type Locator, type Page } from '@playwright/test';

type Point = { x: number; y: number };

/**
 * The Railwise page as a new user meets it: shelves on the left, the sheet in the middle, the
 * toolbar on top. Sheet positions are grid points; the test-only window API turns them into
 * pixels so clicks land where a user would click.
 */
export class RailwisePage {
  readonly sheet: Locator;
  readonly message: Locator;

  constructor(readonly page: Page) {
    this.sheet = page.getByTestId('sheet');
    this.message = page.getByTestId('message');
  }

  /** Opens the app, at `path` (e.g. a share link's fragment) when given. */
  async open(path = '/'): Promise<void> {
    await this.page.goto(path);
    await expect(this.sheet.locator('canvas').first()).toBeVisible();
    await this.page.waitForFunction(() => window.__railwise !== undefined);
  }

  toolbarButton(name: string): Locator {
    return this.page.getByRole('toolbar').getByRole('button', { name, exact: true });
  }

  async newSheet(): Promise<void> {
    await this.toolbarButton('New').click();
    await this.dismissMessage();
  }

  async dismissMessage(): Promise<void> {
    if (await this.message.isVisible())
      await this.message.getByRole('button', { name: 'Dismiss message' }).click();
  }

  async toPage(p: Point): Promise<Point> {
    return this.page.evaluate((q) => window.__railwise!.toPage(q), p);
  }

  async clickAt(x: number, y: number): Promise<void> {
    const p = await this.toPage({ x, y });
    await this.page.mouse.move(p.x, p.y);
    await this.page.mouse.click(p.x, p.y);
  }

  /** A real drag: press, several moves, release. */
  async dragFrom(from: Point, to: Point): Promise<void> {
    const a = await this.toPage(from);
    const b = await this.toPage(to);
    await this.page.mouse.move(a.x, a.y);
    await this.page.mouse.down();
    await this.page.mouse.move(b.x, b.y, { steps: 8 });
    await this.page.mouse.up();
  }

  /** A grid point near the lower right of the visible sheet, clear of a fitted cell. */
  async emptySpot(): Promise<Point> {
    return this.page.evaluate(() => {
      const { viewport, screen } = window.__railwise!.state();
      const x = (screen.width * 0.9 - viewport.x) / viewport.scale;
      const y = (screen.height * 0.9 - viewport.y) / viewport.scale;
      return { x: Math.round(x), y: Math.round(y) };
    });
  }

  async press(key: string): Promise<void> {
    await this.page.keyboard.press(key);
  }

  /** Finds a part kind by name the way a user does: `/`, type, Enter; then a click places it. */
  async findPart(text: string): Promise<void> {
    await this.press('/');
    await expect(this.page.getByRole('searchbox', { name: 'Find a part' })).toBeFocused();
    await this.page.keyboard.type(text);
    await this.press('Enter');
  }

  /** The netlist the app derived from the drawing. */
  async netlist(): Promise<{
    devices: Record<string, unknown>[];
    rails: { net: string; role: string }[];
    inputs: string[];
    outputs: string[];
  }> {
    return this.page.evaluate(() => JSON.parse(JSON.stringify(window.__railwise!.netlist())));
  }

  /** Where a device's part sits on the sheet (grid units). */
  async devicePosition(name: string): Promise<Point> {
    return this.page.evaluate((device) => {
      const s = window.__railwise!.state();
      const part = s.doc.sheet.parts.find((p) => p.id === s.geometry.deviceParts[device])!;
      return { x: part.x, y: part.y };
    }, name);
  }

  /** Clicks a device's body (between its gate and its channel, clear of its pins), which selects it. */
  async selectDevice(name: string): Promise<void> {
    const at = await this.devicePosition(name);
    await this.clickAt(at.x - 0.8, at.y + 0.6);
    await expect
      .poll(() => this.page.evaluate(() => window.__railwise!.state().selection.selected.parts.length))
      .toBe(1);
  }

  /** Net of every pin (`partId.pin`), as plain data. */
  async pinNets(): Promise<Record<string, string>> {
    return this.page.evaluate(() => Object.fromEntries(window.__railwise!.state().geometry.pinNets));
  }

  /** Where the last edit made or refused a contact, as drawn on the sheet. */
  async contactMarks(): Promise<{ kind: string; at: { x: number; y: number }[] } | null> {
    return this.page.evaluate(() => {
      const m = window.__railwise!.state().contactMarks;
      return m === null ? null : { kind: m.kind, at: [...m.at] };
    });
  }

  async undoDepth(): Promise<number> {
    return this.page.evaluate(() => window.__railwise!.state().history.past.length);
  }

  async partCount(): Promise<number> {
    return this.page.evaluate(() => window.__railwise!.state().doc.sheet.parts.length);
  }

  /** Opens a file through the same file input the Open button uses. */
  async openFile(name: string, text: string): Promise<void> {
    await this.page
      .getByTestId('open-file')
      .setInputFiles({ name, mimeType: 'text/plain', buffer: Buffer.from(text) });
  }

  async starter(title: string): Promise<void> {
    await this.page
      .getByRole('region', { name: 'Starter cells' })
      .getByRole('button', { name: title, exact: true })
      .click();
  }

  /** Waits until the autosave holds the design as it is now. */
  async waitForAutosave(): Promise<void> {
    await this.page.waitForFunction(() => window.__railwise!.autosaveCaughtUp());
  }
}
