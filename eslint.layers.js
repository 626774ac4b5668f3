/**
 * The layer map of src/, enforced on resolved paths (a specifier such as `../../state/store.ts` is
 * resolved against the importing file, so the depth of a folder never hides an import). DEVELOPERS.md
 * ("Layers") states the same map in prose; tests/lint/layers.test.ts proves every rule fires.
 */
import path from 'node:path';

const SRC = path.join(import.meta.dirname, 'src');

/** For each layer of src/, the layers it must never import. */
export const FORBIDDEN_LAYERS = {
  core: ['worker', 'state', 'editor', 'panels', 'app', 'cli'],
  worker: ['state', 'editor', 'panels', 'app', 'cli'],
  cli: ['worker', 'state', 'editor', 'panels', 'app'],
  state: ['editor', 'panels', 'app', 'cli'],
  editor: ['panels', 'app', 'cli'],
  panels: ['editor', 'app', 'cli'],
  app: ['cli'],
};

function layerOf(file) {
  const rel = path.relative(SRC, file);
  if (rel.startsWith('..') || path.isAbsolute(rel)) return null;
  const first = rel.split(path.sep)[0];
  return Object.hasOwn(FORBIDDEN_LAYERS, first) ? first : null;
}

export const layersRule = {
  meta: {
    type: 'problem',
    docs: { description: 'Keeps each layer of src/ to the layers below it (DEVELOPERS.md, "Layers").' },
    messages: {
      forbidden: 'src/{{from}} must not import from src/{{to}} ({{spec}}): see DEVELOPERS.md, "Layers".',
    },
    schema: [],
  },
  create(context) {
    const from = layerOf(context.filename);
    if (from === null) return {};
    const check = (node) => {
      const spec = node?.value;
      if (typeof spec !== 'string' || !spec.startsWith('.')) return;
      const to = layerOf(path.resolve(path.dirname(context.filename), spec));
      if (to !== null && FORBIDDEN_LAYERS[from].includes(to))
        context.report({ node, messageId: 'forbidden', data: { from, to, spec } });
    };
    return {
      ImportDeclaration: (node) => check(node.source),
      ExportNamedDeclaration: (node) => check(node.source),
      ExportAllDeclaration: (node) => check(node.source),
      ImportExpression: (node) => check(node.source),
    };
  },
};
