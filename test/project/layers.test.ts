/**
 * Which way imports run (docs/architecture.md). The shells (`src/action`, `src/cli`) sit on the
 * shared adapters (`src/adapters`) and the pure core (`src/core`); neither shell imports the
 * other, and nothing under the core imports a shell or an adapter. Inside the core each file
 * imports only its own layer and the layers below it. Every import statement of `src/**\/*.ts`
 * is read with the TypeScript scanner (`ts.preProcessFile`: static, type-only, re-exports and
 * `import()`), so a type import counts like any other.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import ts from 'typescript';
import { describe, expect, test } from 'vitest';

const ROOT = resolve(import.meta.dirname, '../..');
const SRC = join(ROOT, 'src');

/**
 * The core's layers, highest first. A layer is a list of folders (ending in `/`) and files under
 * `src/core/`; a file belongs to the layer with the longest matching entry.
 */
const CORE_LAYERS: readonly { name: string; modules: readonly string[] }[] = [
  { name: 'public surface', modules: ['index.ts'] },
  { name: 'render', modules: ['render/'] },
  { name: 'gate and init', modules: ['gate.ts', 'pair-moves.ts', 'init/'] },
  { name: 'remedy', modules: ['remedy/'] },
  { name: 'compare', modules: ['compare/'] },
  { name: 'report', modules: ['report/'] },
  { name: 'inspect', modules: ['inspect.ts', 'serving-patch.ts'] },
  { name: 'policy and rules', modules: ['policy/', 'rules/'] },
  { name: 'parse', modules: ['parse/'] },
  { name: 'format', modules: ['format/'] },
  { name: 'metrics', modules: ['metrics/'] },
  {
    name: 'model',
    // The rule catalogue is vocabulary: ids and default severities that the reader, the rules,
    // the report reader and the renderers all name; it imports only `model.ts`. `element-at.ts`
    // and `null-record.ts` are checked-read helpers every layer uses and import nothing.
    modules: [
      'model.ts',
      'severity.ts',
      'changes.ts',
      'home.ts',
      'version.ts',
      'rules/catalog.ts',
      'element-at.ts',
      'null-record.ts',
    ],
  },
];

/** Imports allowed against the order, each with its reason. Paths are relative to `src/`. */
const EXCEPTIONS: readonly { from: string; to: string; why: string }[] = [];

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return path.endsWith('.ts') ? [path] : [];
  });
}

/** Every relative import of `file` as a path under `src/` (`.js` read as the `.ts` it is built from). */
function importsOf(file: string, text: string): string[] {
  return ts
    .preProcessFile(text, true, true)
    .importedFiles.map((entry) => entry.fileName)
    .filter((name) => name.startsWith('.'))
    .map((name) => relative(SRC, resolve(dirname(file), name)).replace(/\.js$/, '.ts'));
}

/** The core layer of a path under `src/core/`: its index in `CORE_LAYERS`, or -1 when none. */
function coreLayer(path: string): number {
  const inCore = path.slice('core/'.length);
  let best = -1;
  let bestLength = -1;
  CORE_LAYERS.forEach((layer, index) => {
    for (const module of layer.modules) {
      const matches = module.endsWith('/') ? inCore.startsWith(module) : inCore === module;
      if (matches && module.length > bestLength) {
        best = index;
        bestLength = module.length;
      }
    }
  });
  return best;
}

const area = (path: string): string => path.split('/')[0]!;

/** Why `from` may not import `to`, or null when it may. */
export function violation(from: string, to: string): string | null {
  const source = area(from);
  const target = area(to);
  // The published JSON Schemas (`schema/*.json`) are data the core validates against.
  if (to.startsWith('../schema/') && to.endsWith('.json')) return null;
  if (source === 'core') {
    if (target !== 'core') return `the core imports ${target}/`;
    const a = coreLayer(from);
    const b = coreLayer(to);
    if (a < 0 || b < 0) return null; // reported by the layer-map check
    if (b < a) return `${CORE_LAYERS[a]!.name} imports ${CORE_LAYERS[b]!.name}, a layer above it`;
    return null;
  }
  if (source === 'adapters' && (target === 'action' || target === 'cli'))
    return `an adapter imports the ${target} shell`;
  if ((source === 'action' && target === 'cli') || (source === 'cli' && target === 'action'))
    return `the ${source} shell imports the ${target} shell`;
  return null;
}

const FILES = sourceFiles(SRC).map((file) => ({
  path: relative(SRC, file),
  imports: importsOf(file, readFileSync(file, 'utf8')),
}));

describe('import direction (docs/architecture.md)', () => {
  test('every file under src/core belongs to exactly one layer of the map', () => {
    const unplaced = FILES.filter((f) => area(f.path) === 'core' && coreLayer(f.path) < 0).map(
      (f) => f.path,
    );
    expect(unplaced).toEqual([]);
  });

  test('no import runs against the order, except the listed ones', () => {
    const found = FILES.flatMap((file) =>
      file.imports.flatMap((to) => {
        const why = violation(file.path, to);
        if (why === null) return [];
        if (EXCEPTIONS.some((e) => e.from === file.path && e.to === to)) return [];
        return [`${file.path} → ${to}: ${why}`];
      }),
    );
    expect(found).toEqual([]);
  });

  test('every listed exception is still needed and says why', () => {
    for (const exception of EXCEPTIONS) {
      expect(exception.why.length, `${exception.from} → ${exception.to}`).toBeGreaterThan(10);
      const file = FILES.find((f) => f.path === exception.from);
      expect(file?.imports ?? [], `${exception.from} → ${exception.to} is stale`).toContain(
        exception.to,
      );
      expect(violation(exception.from, exception.to), 'an exception that breaks no rule').not.toBe(
        null,
      );
    }
  });

  test('reads imports of every kind: static, type-only, re-exports, import() and type queries', () => {
    const text = [
      "import { a } from './a.js';",
      "import type { B } from '../b.js';",
      "export { c } from './c.js';",
      "export * from './d.js';",
      "type E = import('./e.js').E;",
      "const f = await import('./f.js');",
      "const g = `import x from './not-an-import.js'`;",
      "// import h from './not-an-import-either.js'",
      "import { i } from 'yaml';",
    ].join('\n');
    expect(importsOf(join(SRC, 'core/x/file.ts'), text)).toEqual([
      'core/x/a.ts',
      'core/b.ts',
      'core/x/c.ts',
      'core/x/d.ts',
      'core/x/e.ts',
      'core/x/f.ts',
    ]);
  });

  test('violation(from, to) names each rule it enforces', () => {
    expect(violation('core/policy/resolve.ts', 'core/compare/decide.ts')).toBe(
      'policy and rules imports compare, a layer above it',
    );
    expect(violation('core/compare/decide.ts', 'core/policy/judging.ts')).toBeNull();
    expect(violation('core/compare/decide.ts', 'core/render/escape.ts')).toBe(
      'compare imports render, a layer above it',
    );
    expect(violation('core/parse/fields.ts', 'core/rules/catalog.ts')).toBeNull();
    expect(violation('core/parse/fields.ts', 'core/rules/spec-rules.ts')).toBe(
      'parse imports policy and rules, a layer above it',
    );
    expect(violation('core/gate.ts', 'adapters/git.ts')).toBe('the core imports adapters/');
    expect(violation('core/policy/schema.ts', '../schema/policy.schema.json')).toBeNull();
    expect(violation('core/gate.ts', '../scripts/build.mjs')).toBe('the core imports ../');
    expect(violation('core/gate.ts', 'action/main.ts')).toBe('the core imports action/');
    expect(violation('cli/diff.ts', 'action/git.ts')).toBe(
      'the cli shell imports the action shell',
    );
    expect(violation('action/main.ts', 'cli/files.ts')).toBe(
      'the action shell imports the cli shell',
    );
    expect(violation('adapters/git.ts', 'cli/run.ts')).toBe('an adapter imports the cli shell');
    expect(violation('cli/diff.ts', 'adapters/git.ts')).toBeNull();
    expect(violation('action/main.ts', 'core/gate.ts')).toBeNull();
    expect(violation('core/render/comment.ts', 'core/render/escape.ts')).toBeNull();
  });
});
