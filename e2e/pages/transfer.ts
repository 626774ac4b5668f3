import { expect, type Locator, type Page } from '@playwright/test';

/** The DC transfer-curve section of the analysis panel, as a designer uses it. */
export class TransferView {
  readonly section: Locator;
  readonly chart: Locator;
  readonly convention: Locator;
  readonly csvLink: Locator;

  constructor(readonly page: Page) {
    this.section = page.getByTestId('analysis-panel').getByTestId('transfer-section');
    this.chart = this.section.getByTestId('transfer-chart');
    this.convention = this.section.getByTestId('transfer-convention');
    this.csvLink = this.section.getByTestId('transfer-csv');
  }

  /** Unfolds the section and waits for the curve of the current drawing. */
  async open(): Promise<void> {
    await this.section.locator('summary').click();
    await expect(this.chart).toBeVisible({ timeout: 15_000 });
  }

  figure(name: 'vm' | 'vil' | 'vih' | 'vol' | 'voh' | 'nml' | 'nmh'): Locator {
    return this.section.getByTestId(`figure-${name}`);
  }

  /** A figure's value in volts, as the table prints it ("1.141 V"). */
  async volts(name: Parameters<TransferView['figure']>[0]): Promise<number> {
    return Number.parseFloat((await this.figure(name).textContent()) ?? 'NaN');
  }

  mark(name: string): Locator {
    return this.chart.getByTestId(`mark-${name}`);
  }
}
