import { expect, type Locator, type Page } from '@playwright/test';

/**
 * The analysis workspace on the right of the sheet, as a new user reads it: the vector bits, the
 * figures and findings for that vector, the table of every vector, expected functions and sequences.
 */
export class WorkspacePanel {
  readonly root: Locator;
  readonly supplyCurrent: Locator;
  readonly currentPaths: Locator;
  readonly vectorFindings: Locator;
  readonly table: Locator;
  readonly tableSummary: Locator;
  readonly filter: Locator;
  readonly sequenceSection: Locator;

  constructor(readonly page: Page) {
    this.root = page.getByTestId('analysis-panel');
    this.supplyCurrent = this.root.getByTestId('supply-current');
    this.currentPaths = this.root.getByTestId('current-paths');
    this.vectorFindings = this.root.getByTestId('vector-findings');
    this.table = this.root.getByTestId('vector-table');
    this.tableSummary = this.root.getByTestId('sweep-summary');
    this.filter = this.root.getByTestId('table-filter');
    this.sequenceSection = this.root.getByTestId('sequence-section');
  }

  bit(input: string): Locator {
    return this.root.getByTestId(`bit-${input}`);
  }

  row(index: number): Locator {
    return this.root.getByTestId(`vector-row-${index}`);
  }

  /** Indices of the rows the table shows now, in their shown order. */
  async rowIndices(): Promise<number[]> {
    const ids = await this.table
      .locator('tbody tr')
      .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-testid') ?? ''));
    return ids.map((id) => Number(id.replace('vector-row-', '')));
  }

  /** Waits for the table of every vector to be filled for the current cell. */
  async waitForTable(): Promise<void> {
    await expect(this.tableSummary).toBeVisible({ timeout: 15_000 });
  }

  async showOnly(filter: string): Promise<void> {
    await this.filter.selectOption(filter);
  }

  expectation(output: string): Locator {
    return this.root.getByTestId(`expect-${output}`);
  }

  async setExpectation(output: string, text: string): Promise<void> {
    const field = this.expectation(output);
    await field.fill(text);
    await field.press('Enter');
  }

  get expectationError(): Locator {
    return this.root.getByTestId('expectation-error');
  }

  async runSequence(): Promise<void> {
    await this.sequenceSection.getByTestId('sequence-run').click();
    await expect(this.root.getByTestId('level-strips')).toBeVisible();
  }

  /** The levels a net's strip shows, one per step, e.g. ['1', '1', '0', '0']. */
  async stripLevels(net: string): Promise<string[]> {
    const levels = await this.root.getByTestId(`strip-${net}`).getAttribute('data-levels');
    return (levels ?? '').split(' ').filter((l) => l !== '');
  }

  /** The level and voltage the net list gives a net for the vector on the sheet. */
  async netRow(net: string): Promise<string> {
    const list = this.root.getByTestId('every-net');
    if ((await list.getAttribute('open')) === null) await list.locator('summary').click();
    const row = this.root.getByTestId(`net-${net}`);
    await expect(row).toBeVisible();
    return (await row.textContent()) ?? '';
  }
}
