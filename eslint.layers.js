/**
 * The layer map of src/, enforced on resolved paths (a specifier such as `../../state/store.ts` is
 * resolved against the importing file, so the depth of a folder never hides an import). DEVELOPERS.md
 * ("Layers") states the same map in prose; tests/lint/layers.test.ts proves every rule fires.
 *
 * Inside src/core the folders stand in one order (CORE_ORDER, bottom first): a folder imports only
 * folders below it, so no two folders can ever import each other. Files directly in src/core (the
 * caution sentence) sit below every folder. tests/lint/importCycles.test.ts also walks every import of
 * src for cycles between files.
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

/**
 * The folders of src/core, bottom first: each may import only the folders before it. A new folder
 * must be placed here (the rule reports a folder it does not know); DEVELOPERS.md ("Layers") gives
 * the same order with what each folder is for.
 */
export const CORE_ORDER = [
  'text',
  'units',
  'logic',
  'model',
  'sheet',
  'document',
  'hierarchy',
  'format',
  'expect',
  'compile',
  'solver',
  'tables',
  'analysis',
  'proof',
  'netlist-io',
  'liberty',
  'dc',
  'power',
  'sizing',
  'starters',
  'view',
];

const CORE = path.join(SRC, 'core');

/** The folder of src/core a file is in, '' for a file directly in src/core, null outside the core. */
function coreFolderOf(file) {
  const rel = path.relative(CORE, file);
  if (rel.startsWith('..') || path.isAbsolute(rel)) return null;
  const parts = rel.split(path.sep);
  return parts.length > 1 ? parts[0] : '';
}

/** Rank in CORE_ORDER (-1 for files directly in src/core), or null for a folder not placed there. */
function coreRank(folder) {
  if (folder === '') return -1;
  const rank = CORE_ORDER.indexOf(folder);
  return rank < 0 ? null : rank;
}

/** The message id and data when an import from one core folder to another breaks the order. */
function coreOrderProblem(fromFolder, toFolder, spec) {
  if (fromFolder === toFolder) return null;
  const fromRank = coreRank(fromFolder);
  const toRank = coreRank(toFolder);
  if (fromRank === null) return { messageId: 'unplaced', data: { folder: fromFolder } };
  if (toRank === null) return { messageId: 'unplaced', data: { folder: toFolder } };
  if (toRank < fromRank) return null;
  const name = (folder) => (folder === '' ? 'src/core' : `src/core/${folder}`);
  return { messageId: 'above', data: { from: name(fromFolder), to: name(toFolder), spec } };
}

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
      above:
        '{{from}} must not import from {{to}}, which stands above it in CORE_ORDER ({{spec}}): see DEVELOPERS.md, "Layers".',
      unplaced:
        'src/core/{{folder}} is not in CORE_ORDER (eslint.layers.js): place it among the core folders, see DEVELOPERS.md, "Layers".',
    },
    schema: [],
  },
  create(context) {
    const from = layerOf(context.filename);
    if (from === null) return {};
    const fromFolder = coreFolderOf(context.filename);
    const check = (node) => {
      const spec = node?.value;
      if (typeof spec !== 'string' || !spec.startsWith('.')) return;
      const target = path.resolve(path.dirname(context.filename), spec);
      const to = layerOf(target);
      if (to !== null && FORBIDDEN_LAYERS[from].includes(to))
        context.report({ node, messageId: 'forbidden', data: { from, to, spec } });
      const toFolder = coreFolderOf(target);
      if (fromFolder === null || toFolder === null) return;
      const problem = coreOrderProblem(fromFolder, toFolder, spec);
      if (problem !== null) context.report({ node, ...problem });
    };
    return {
      ImportDeclaration: (node) => check(node.source),
      ExportNamedDeclaration: (node) => check(node.source),
      ExportAllDeclaration: (node) => check(node.source),
      ImportExpression: (node) => check(node.source),
    };
  },
};
