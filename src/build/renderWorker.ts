/**
 * A render worker: receives a scene, answers with its SVG, PDF and PNG (150 dpi). Rendering is the
 * heaviest part of a build and each sheet is independent, so the build spreads it over the CPU cores.
 */
import { parentPort } from 'node:worker_threads';
import type { Scene } from '../scene/types.ts';
import { renderSheetNow } from './sheetFiles.ts';

export interface RenderJob {
  readonly id: number;
  readonly scene: Scene;
}

export type RenderReply =
  | { readonly id: number; readonly ok: true; readonly svg: string; readonly pdf: Uint8Array; readonly png: Uint8Array }
  | { readonly id: number; readonly ok: false; readonly name: string; readonly message: string };

parentPort?.on('message', (job: RenderJob) => {
  renderSheetNow(job.scene).then(
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
