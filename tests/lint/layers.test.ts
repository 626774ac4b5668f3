/**
 * The layer map (DEVELOPERS.md, "Layers"; rule in eslint.layers.js) fires for every forbidden pair,
 * whatever the depth of the importing file, and stays quiet for allowed imports. Our own plumbing: no
 * published source applies.
 */
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';
import { CORE_ORDER, FORBIDDEN_LAYERS } from '../../eslint.layers.js';

const eslint = new ESLint({ cwd: process.cwd() });

async function layerErrors(file: string, specifier: string): Promise<string[]> {
  const code = `import { thing } from '${specifier}';\nexport const used = thing;\n`;
  const [result] = await eslint.lintText(code, { filePath: file });
  return (result?.messages ?? []).filter((m) => m.ruleId === 'railwise/layers').map((m) => m.message);
}

const ALL = ['core', 'worker', 'cli', 'state', 'editor', 'panels', 'app'] as const;
const pairs = Object.entries(FORBIDDEN_LAYERS).flatMap(([from, tos]) => tos.map((to) => [from, to] as const));

describe('the layer map', () => {
  it('lists a rule for every layer', () => {
    expect(Object.keys(FORBIDDEN_LAYERS).sort()).toEqual([...ALL].sort());
    expect(pairs.length).toBeGreaterThan(20);
  });

  it.each(pairs)('src/%s importing src/%s is an error, even two folders deep', async (from, to) => {
    const shallow = await layerErrors(`src/${from}/probe.ts`, `../${to}/thing.ts`);
    const deep = await layerErrors(`src/${from}/a/b/probe.ts`, `../../../${to}/x/thing.ts`);
    expect(shallow).toHaveLength(1);
    expect(deep).toHaveLength(1);
    expect(deep[0]).toContain(`src/${from} must not import from src/${to}`);
  });

  it('allows imports within a layer and downwards', async () => {
    expect(await layerErrors('src/core/solver/probe.ts', '../compile/compile.ts')).toEqual([]);
    expect(await layerErrors('src/state/probe.ts', '../worker/protocol.ts')).toEqual([]);
    expect(await layerErrors('src/app/probe.ts', '../editor/actions.ts')).toEqual([]);
    expect(await layerErrors('src/panels/probe.ts', '../state/store.ts')).toEqual([]);
  });

  it('catches re-exports and dynamic imports too', async () => {
    const [reexport] = await eslint.lintText(`export { thing } from '../../state/store.ts';\n`, {
      filePath: 'src/core/model/probe.ts',
    });
    const [dynamic] = await eslint.lintText(`export const m = import('../../editor/actions.ts');\n`, {
      filePath: 'src/core/model/probe.ts',
    });
    for (const r of [reexport, dynamic])
      expect(r?.messages.some((m) => m.ruleId === 'railwise/layers')).toBe(true);
  });
});

describe('the order of the core folders', () => {
  const steps = CORE_ORDER.slice(1).map((upper, k) => [CORE_ORDER[k] ?? '', upper] as const);

  it.each(steps)('src/core/%s importing src/core/%s (above it) is an error', async (lower, upper) => {
    const up = await layerErrors(`src/core/${lower}/a/probe.ts`, `../../${upper}/thing.ts`);
    expect(up).toHaveLength(1);
    expect(up[0]).toContain(`src/core/${lower} must not import from src/core/${upper}`);
    expect(await layerErrors(`src/core/${upper}/probe.ts`, `../${lower}/thing.ts`)).toEqual([]);
  });

  it('keeps files directly in src/core below every folder', async () => {
    expect(await layerErrors('src/core/probe.ts', './text/printable.ts')).toHaveLength(1);
    expect(await layerErrors('src/core/text/probe.ts', '../caution.ts')).toEqual([]);
  });

  it('reports a folder that is not placed in CORE_ORDER', async () => {
    const [message] = await layerErrors('src/core/newfolder/probe.ts', '../model/netlist.ts');
    expect(message).toContain('src/core/newfolder is not in CORE_ORDER');
    expect(await layerErrors('src/core/newfolder/probe.ts', './sibling.ts')).toEqual([]);
  });
});
