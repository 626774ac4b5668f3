import type { Page } from '@playwright/test';

/** Collects what the page reports as going wrong (uncaught errors, console errors); a test ends expecting none. */
export function watchErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(String(e)));
  page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
  return errors;
}
