/** The messages between the render pool (main thread) and its workers. */
import type { PdfOptions } from '../render/index.ts';
import type { Scene } from '../scene/types.ts';
import type { RenderedSheet } from './renderCache.ts';

export type RenderTask =
  | { readonly kind: 'sheet'; readonly scene: Scene }
  | { readonly kind: 'book'; readonly scenes: readonly Scene[]; readonly options: PdfOptions };

export type RenderJob = RenderTask & { readonly id: number };

export type RenderReply =
  | { readonly id: number; readonly ok: true; readonly svg: string; readonly pdf: Uint8Array; readonly png: Uint8Array; readonly morePages?: RenderedSheet['morePages'] }
  | { readonly id: number; readonly ok: false; readonly name: string; readonly message: string };
