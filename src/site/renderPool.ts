/**
 * A small pool of render workers (one per core). Jobs go to the worker with the fewest jobs waiting;
 * replies are matched by id. Errors come back by name and message, so a sheet that cannot be drawn is
 * still reported as such.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { Scene } from '../scene/types.ts';
import type { RenderedSheet } from './renderCache.ts';
import type { PdfOptions } from '../render/index.ts';
import type { RenderJob, RenderReply, RenderTask } from './renderProtocol.ts';

export interface SheetRenderer {
  render(scene: Scene): Promise<RenderedSheet>;
  /** One PDF of many scenes (a book). */
  renderBook(scenes: readonly Scene[], options: PdfOptions): Promise<Uint8Array>;
  close(): Promise<void>;
}

interface Pending {
  readonly resolve: (r: RenderedSheet) => void;
  readonly reject: (e: Error) => void;
}

/** A pool of `size` render workers (default: the number of cores), started on the first render. */
export function createRenderPool(opts: { size?: number } = {}): SheetRenderer {
  const size = Math.max(1, opts.size ?? availableParallelism());
  const pending = new Map<number, Pending>();
  const load = new Map<Worker, number>();
  let nextId = 0;
  let closing = false;
  const start = () => {
    for (let i = 0; i < size; i += 1) {
      // A plain-JS boot file registers tsx inside the thread (worker threads do not inherit it).
      const worker = new Worker(new URL('./renderWorkerBoot.js', import.meta.url));
      worker.on('message', (reply: RenderReply) => {
        load.set(worker, (load.get(worker) ?? 1) - 1);
        const job = pending.get(reply.id);
        pending.delete(reply.id);
        if (!job) return;
        // A sheet that continues on further pages brings their SVG and PNG too.
        if (reply.ok) job.resolve({ svg: reply.svg, pdf: reply.pdf, png: reply.png, ...(reply.morePages ? { morePages: reply.morePages } : {}) });
        else job.reject(Object.assign(new Error(reply.message), { name: reply.name }));
      });
      worker.on('error', (error) => {
        for (const job of pending.values()) job.reject(error);
        pending.clear();
      });
      // A worker that stops by itself (out of memory, killed) answers nothing more: its work fails
      // instead of being waited for for ever, and no new work goes to it.
      worker.on('exit', (code) => {
        if (closing || !load.has(worker)) return;
        load.delete(worker);
        for (const job of pending.values()) job.reject(new Error(`a render worker stopped unexpectedly (exit code ${code})`));
        pending.clear();
      });
      load.set(worker, 0);
    }
  };
  const submit = (task: RenderTask): Promise<RenderedSheet> => {
    if (load.size === 0) start();
    const [worker] = [...load.entries()].sort((a, b) => a[1] - b[1])[0];
    const id = (nextId += 1);
    load.set(worker, (load.get(worker) ?? 0) + 1);
    return new Promise<RenderedSheet>((resolve, reject) => {
      pending.set(id, { resolve, reject });
      const job: RenderJob = { ...task, id };
      worker.postMessage(job);
    });
  };
  return {
    render: (scene) => submit({ kind: 'sheet', scene }),
    renderBook: async (scenes, options) => (await submit({ kind: 'book', scenes, options })).pdf,
    async close() {
      closing = true;
      await Promise.all([...load.keys()].map((w) => w.terminate()));
      load.clear();
      closing = false;
      // Work still waiting on a worker never answers now: it fails, so no caller waits for ever.
      for (const job of pending.values()) job.reject(new Error('the render pool was closed before this sheet was drawn'));
      pending.clear();
    },
  };
}
