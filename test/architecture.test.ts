// The layer rule of docs/architecture.md, checked on the source: every import (type-only ones,
// re-exports, dynamic import() and new URL() of a module included) goes to an allowed layer, and no
// module reaches itself again through its imports.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../', import.meta.url));

/** Which layers each layer may import (besides itself); the table of docs/architecture.md. */
const ALLOWED: Readonly<Record<string, readonly string[]>> = {
  units: [],
  standards: ['units'],
  model: ['units', 'standards'],
  data: ['units', 'standards', 'model/types'],
  analysis: ['units', 'standards', 'model', 'data'],
  scene: ['units', 'standards'],
  sheets: ['units', 'standards', 'data', 'analysis', 'scene'],
  render: ['units', 'standards', 'scene'],
  site: ['units', 'standards', 'data', 'analysis', 'scene', 'sheets', 'render'],
  cli: ['units', 'standards', 'data', 'site'],
  templates: ['site'],
  'eleventy.config': ['site'],
};

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.(ts|js)$/.test(name) ? [path] : [];
  });
}

/** The layer of a path relative to the root: 'model', 'model/types' for the model's input types, 'templates', … */
function layerOf(rel: string): string {
  if (rel === 'eleventy.config.ts') return 'eleventy.config';
  if (rel.startsWith('templates/')) return 'templates';
  const parts = rel.split('/');
  if (parts[0] !== 'src') return `outside:${rel}`;
  if (parts[1] === 'units.ts') return 'units';
  if (rel === 'src/model/types.ts') return 'model/types';
  return parts[1];
}

/** Relative module specifiers a file names: static and type imports, re-exports, import(), new URL(). */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const found: string[] = [];
  const patterns = [
    /(?:^|\n)\s*(?:import|export)\b[^;'"]*?\bfrom\s*['"](\.[^'"]+)['"]/g,
    /(?:^|\n)\s*import\s*['"](\.[^'"]+)['"]/g,
    /\bimport\(\s*['"](\.[^'"]+)['"]\s*\)/g,
    /\bnew URL\(\s*['"](\.[^'"]+\.(?:ts|js))['"]/g,
  ];
  for (const re of patterns) for (const m of text.matchAll(re)) found.push(m[1]);
  return found.map((spec) => normalize(relative(ROOT, join(dirname(file), spec))));
}

const files = [...sourceFiles(join(ROOT, 'src')), ...sourceFiles(join(ROOT, 'templates')), join(ROOT, 'eleventy.config.ts')];
const graph = new Map(files.map((f) => [normalize(relative(ROOT, f)), importsOf(f)]));

describe('the layer rule (docs/architecture.md)', () => {
  it('finds the imports it checks (the reader sees type imports and import() too)', () => {
    expect(graph.get('src/site/renderWorker.ts')).toContain('src/site/renderProtocol.ts');
    expect(graph.get('src/cli/run.ts')).toContain('src/cli/build.ts');
    expect(graph.size).toBeGreaterThan(150);
  });

  it('every import goes to the same layer or one the table allows', () => {
    const wrong: string[] = [];
    for (const [from, targets] of graph) {
      const a = layerOf(from);
      for (const to of targets) {
        const b = layerOf(to);
        const base = a === 'model/types' ? 'model' : a;
        const allowed = ALLOWED[base] ?? [];
        // The model's input types belong to the model: whoever may import the model may import them.
        const target = b === 'model/types' && (base === 'model' || allowed.includes('model')) ? 'model' : b;
        const ok = target === base || allowed.includes(target);
        if (!ok) wrong.push(`${from} → ${to}`);
      }
    }
    expect(wrong).toEqual([]);
  });

  it('no module reaches itself through its imports', () => {
    const cycles: string[][] = [];
    const state = new Map<string, 'open' | 'done'>();
    const stack: string[] = [];
    const visit = (v: string): void => {
      state.set(v, 'open');
      stack.push(v);
      for (const w of graph.get(v) ?? []) {
        if (!graph.has(w)) continue;
        if (state.get(w) === 'open') cycles.push([...stack.slice(stack.indexOf(w)), w]);
        else if (!state.has(w)) visit(w);
      }
      stack.pop();
      state.set(v, 'done');
    };
    for (const v of graph.keys()) if (!state.has(v)) visit(v);
    expect(cycles).toEqual([]);
  });
});
