/**
 * A CPU-profile summary for the bench report: one demo build run with `node --cpu-prof` (one profile
 * per thread), its samples added up by where the code lives (a package, our source folder, Node's
 * module loader, idle) per thread, so the report says what limits the build.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

interface ProfileNode {
  readonly id: number;
  readonly callFrame: { readonly functionName: string; readonly url: string };
}
interface CpuProfile {
  readonly nodes: readonly ProfileNode[];
  readonly samples: readonly number[];
  readonly timeDeltas: readonly number[];
  readonly startTime: number;
  readonly endTime: number;
}

/** Where a sample's code lives: an npm package, a folder of ours, Node's loader or built-ins, or idle/GC. */
function place(frame: ProfileNode['callFrame']): string {
  const url = frame.url;
  if (url === '') return frame.functionName === '(garbage collector)' ? 'garbage collection' : frame.functionName === '(idle)' ? 'idle' : 'native';
  const pkg = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url);
  if (pkg) return pkg[1] === 'tsx' ? 'tsx (TypeScript loader)' : pkg[1];
  if (url.startsWith('node:internal/modules') || url.startsWith('node:internal/deps/cjs')) return 'Node module loading';
  if (url.startsWith('node:')) return `Node ${url.replace(/^node:(internal\/)?/, '').split('/')[0]}`;
  const ours = /\/((?:src|bench|templates)\/.+)$/.exec(url);
  if (ours) return ours[1];
  return url.startsWith('wasm') ? 'WebAssembly (tsx)' : 'other';
}

/** Milliseconds per place for one profile, and the profile's length. */
function summarise(profile: CpuProfile): { wallMs: number; byPlace: Map<string, number> } {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const byPlace = new Map<string, number>();
  profile.samples.forEach((id, i) => {
    const node = byId.get(id);
    if (!node) return;
    const where = place(node.callFrame);
    byPlace.set(where, (byPlace.get(where) ?? 0) + (profile.timeDeltas[i] ?? 0) / 1000);
  });
  return { wallMs: (profile.endTime - profile.startTime) / 1000, byPlace };
}

/** A worker's job, told from what it ran: a render worker draws, tsx's loader thread transforms modules. */
function threadRole(byPlace: ReadonlyMap<string, number>): string {
  if (byPlace.has('pdf-lib') || byPlace.has('@resvg/resvg-js')) return 'render worker';
  return byPlace.has('tsx (TypeScript loader)') ? 'tsx loader hooks' : 'worker';
}

/** Markdown lines: per thread, its busy time and the places that took at least 3 % of it. */
export function profileSummary(dir: string): string[] {
  const files = readdirSync(dir).filter((f) => f.endsWith('.cpuprofile')).sort();
  const threads = files.map((f) => summarise(JSON.parse(readFileSync(join(dir, f), 'utf8')) as CpuProfile));
  // The main thread's profile is the first written; workers that never rendered are left out.
  const lines: string[] = [];
  const total = new Map<string, number>();
  threads.forEach((t, i) => {
    const busy = [...t.byPlace].filter(([k]) => k !== 'idle').reduce((n, [, ms]) => n + ms, 0);
    if (i > 0 && busy < 300) return;
    for (const [k, ms] of t.byPlace) if (k !== 'idle') total.set(k, (total.get(k) ?? 0) + ms);
    const top = [...t.byPlace]
      .filter(([k, ms]) => k !== 'idle' && ms >= busy * 0.03)
      .sort((a, b) => b[1] - a[1])
      .map(([k, ms]) => `${k} ${ms.toFixed(0)} ms`);
    lines.push(`- ${i === 0 ? 'main thread' : `thread ${i} (${threadRole(t.byPlace)})`}: ${(t.wallMs / 1000).toFixed(2)} s, busy ${(busy / 1000).toFixed(2)} s: ${top.join(', ')}`);
  });
  const all = [...total].sort((a, b) => b[1] - a[1]);
  const sum = all.reduce((n, [, ms]) => n + ms, 0);
  lines.push(
    `- all threads, busy ${(sum / 1000).toFixed(2)} s: ${all
      .slice(0, 12)
      .map(([k, ms]) => `${k} ${((100 * ms) / sum).toFixed(0)} %`)
      .join(', ')}`,
  );
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) process.stdout.write(`${profileSummary(process.argv[2]).join('\n')}\n`);
