/**
 * A failed sheet never leaves work running (issue #14, class 3): when one sheet fails while others are
 * being rendered, drawSheets rejects only after every sheet in flight has finished and written its
 * files, so the build can then remove its staging folder and nothing writes into it again. The renderer
 * is a stand-in whose sheets finish on later turns of the event loop, as worker replies do.
 */
import { describe, expect, it } from 'vitest';
import { drawSheets, type FaultHook } from '../../src/site/drawSheets.ts';
import type { OutputFiles } from '../../src/site/outputFiles.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import type { SheetRenderer } from '../../src/site/renderPool.ts';
import { demoProject } from './demoSite.ts';

/** Resolves after n turns of the event loop (macrotasks, like messages from a worker). */
const turns = (n: number): Promise<void> => (n <= 0 ? Promise.resolve() : new Promise((done) => setImmediate(() => void turns(n - 1).then(done))));

function slowRenderer(log: { started: number; finished: number }): SheetRenderer {
  return {
    render: async () => {
      log.started += 1;
      await turns(20);
      log.finished += 1;
      return { svg: '<svg xmlns="http://www.w3.org/2000/svg"/>', pdf: new Uint8Array([37]), png: new Uint8Array([137]) };
    },
    renderBook: async () => new Uint8Array([37]),
    close: async () => {},
  };
}

function recordingFiles(writes: string[]): OutputFiles {
  return {
    write: (rel) => void writes.push(rel),
    copyDir: () => [],
    copyFile: () => false,
    readText: () => '<svg xmlns="http://www.w3.org/2000/svg"/>',
    count: () => writes.length,
  };
}

async function failingRun(fault: FaultHook) {
  const project = await demoProject();
  const plan = planSheets(project);
  const log = { started: 0, finished: 0 };
  const writes: string[] = [];
  let error: unknown;
  await drawSheets({ project, dateIso: '2026-01-01', plan, files: recordingFiles(writes), keep: new Set(), renderer: slowRenderer(log), fault }).catch((e: unknown) => {
    error = e;
  });
  const atRejection = { ...log, writes: writes.length };
  await turns(100); // anything still running would finish and write now
  return { error, atRejection, after: { ...log, writes: writes.length }, total: plan.sheets.length };
}

describe('drawSheets settles all work before it rejects', () => {
  it('a scene that fails while earlier sheets render: every started render has finished and written first', async () => {
    const layoutError = Object.assign(new Error('injected'), { name: 'LayoutError' });
    const r = await failingRun((stage, _name) => {
      if (stage === 'scene' && (r0.count += 1) === 4) throw layoutError;
    });
    expect((r.error as Error).name).toBe('SheetDrawError');
    // Three sheets were started before the fourth scene failed, none after.
    expect(r.atRejection.started).toBe(3);
    expect(r.atRejection.finished).toBe(3);
    expect(r.atRejection.writes).toBe(9); // SVG, PDF and PNG of each
    expect(r.after).toEqual(r.atRejection);
    expect(r.total).toBeGreaterThan(4);
  });

  it('a render that fails while others are in flight: the others finish before the rejection', async () => {
    const r = await failingRun((stage) => {
      if (stage === 'render' && (r1.count += 1) === 2) throw Object.assign(new Error('injected'), { name: 'LayoutError' });
    });
    expect((r.error as Error).name).toBe('SheetDrawError');
    expect(r.atRejection.started).toBeGreaterThan(2);
    expect(r.atRejection.finished).toBe(r.atRejection.started);
    expect(r.after).toEqual(r.atRejection);
  });
});

const r0 = { count: 0 };
const r1 = { count: 0 };
