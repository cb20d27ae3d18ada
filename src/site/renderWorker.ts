/**
 * A render worker: receives a scene and answers with its SVG, PDF and PNG (150 dpi), or a book's
 * scenes and answers with the book's PDF. Rendering is the
 * heaviest part of a build and each sheet is independent, so the build spreads it over the CPU cores.
 */
import { parentPort } from 'node:worker_threads';
import { renderPdf } from '../render/index.ts';
import type { RenderedSheet } from './renderCache.ts';
import type { RenderJob, RenderReply } from './renderProtocol.ts';
import { renderSheetNow } from './renderSheet.ts';

async function run(job: RenderJob): Promise<RenderedSheet> {
  if (job.kind === 'sheet') return renderSheetNow(job.scene);
  return { svg: '', pdf: await renderPdf(job.scenes, job.options), png: new Uint8Array(0) };
}

parentPort?.on('message', (job: RenderJob) => {
  run(job).then(
    (r) => {
      const reply: RenderReply = { id: job.id, ok: true, ...r };
      parentPort?.postMessage(reply, [r.pdf.buffer as ArrayBuffer, r.png.buffer as ArrayBuffer]);
    },
    (error: unknown) => {
      const e = error instanceof Error ? error : new Error(String(error));
      const reply: RenderReply = { id: job.id, ok: false, name: e.name, message: e.message };
      parentPort?.postMessage(reply);
    },
  );
});
