// @vitest-environment happy-dom
/**
 * The step editor's text field reads the one sequence text (docs/semantics.md §5), shows its format
 * beside the field and refuses bad text with the line and column, keeping the steps as they were.
 */
import { act } from 'react';
import { createRoot, type Root } from 'react-dom/client';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { InputVector } from '../../src/core/model/design.ts';
import { SEQUENCE_FORMAT_HINT } from '../../src/core/analysis/sequenceText.ts';
import { StepEditor } from '../../src/panels/StepEditor.tsx';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

let host: HTMLElement;
let root: Root;
let saved: InputVector[][];

async function mount(steps: InputVector[]): Promise<void> {
  await act(async () =>
    root.render(
      <StepEditor
        inputs={['D', 'CLK']}
        steps={steps}
        selectedStep={null}
        onChange={(s) => saved.push(s)}
        onPickStep={() => {}}
      />,
    ),
  );
}

async function typeAndApply(text: string): Promise<void> {
  const field = host.querySelector('[data-testid="steps-text"]') as HTMLTextAreaElement;
  await act(async () => {
    const setter = Object.getOwnPropertyDescriptor(HTMLTextAreaElement.prototype, 'value')?.set;
    setter?.call(field, text);
    field.dispatchEvent(new Event('input', { bubbles: true }));
  });
  await act(async () => (host.querySelector('[data-testid="steps-apply"]') as HTMLButtonElement).click());
}

beforeEach(() => {
  host = document.createElement('div');
  document.body.append(host);
  root = createRoot(host);
  saved = [];
});

afterEach(async () => {
  await act(async () => root.unmount());
  host.remove();
});

describe('the step text field', () => {
  it('shows the format and writes one step per line', async () => {
    await mount([{ D: '1', CLK: '1' }, {}, { CLK: '0' }]);
    expect(host.querySelector('[data-testid="steps-format"]')?.textContent).toBe(SEQUENCE_FORMAT_HINT);
    const field = host.querySelector('[data-testid="steps-text"]') as HTMLTextAreaElement;
    expect(field.value).toBe('D=1 CLK=1\n-\nCLK=0');
  });

  it('reads steps on separate lines as separate steps', async () => {
    await mount([]);
    await typeAndApply('D=1 CLK=1\nCLK=0\nD=0, CLK=1');
    expect(saved).toEqual([[{ D: '1', CLK: '1' }, { CLK: '0' }, { D: '0', CLK: '1' }]]);
  });

  it('refuses bad text with its line and column and saves nothing', async () => {
    await mount([{ D: '1' }]);
    await typeAndApply('D=1\nQ=0');
    expect(saved).toEqual([]);
    expect(host.querySelector('[role="alert"]')?.textContent).toContain(
      'line 2, column 1: "Q" is not an input',
    );
  });
});
