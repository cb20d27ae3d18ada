/**
 * A render worker: receives a scene and answers with its SVG, PDF and PNG (150 dpi), or a book's
 * scenes and answers with the book's PDF. Rendering is the
 * heaviest part of a build and each sheet is independent, so the build spreads it over the CPU cores.
 */
import { parentPort } from 'node:worker_threads';
import { renderPdf, type PdfOptions } from '../render/index.ts';
import type { Scene } from '../scene/types.ts';
import { renderSheetNow } from './sheetFiles.ts';

export type RenderTask =
  | { readonly kind: 'sheet'; readonly scene: Scene }
  | { readonly kind: 'book'; readonly scenes: readonly Scene[]; readonly options: PdfOptions };

export type RenderJob = RenderTask & { readonly id: number };

export type RenderReply =
  | { readonly id: number; readonly ok: true; readonly svg: string; readonly pdf: Uint8Array; readonly png: Uint8Array }
  | { readonly id: number; readonly ok: false; readonly name: string; readonly message: string };

async function run(job: RenderJob): Promise<{ svg: string; pdf: Uint8Array; png: Uint8Array }> {
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
