/**
 * Warm rebuilds (the dev server, the rebuild benchmark) reuse rendered files: the key is a hash of the
 * scene itself, so anything that changes a sheet changes its key and nothing stale is ever reused.
 * The cache is an object the caller owns (no module-level state); one-shot builds pass none.
 */
import { createHash } from 'node:crypto';
import type { Scene } from '../scene/types.ts';

export interface RenderedSheet {
  readonly svg: string;
  readonly pdf: Uint8Array;
  readonly png: Uint8Array;
}

export interface BuildCache {
  readonly rendered: Map<string, RenderedSheet>;
}

/** A fresh, empty cache for a long-lived process. */
export function createBuildCache(): BuildCache {
  return { rendered: new Map() };
}

/** SHA-256 of the scene's JSON: equal scenes give equal files. */
export function sceneHash(scene: Scene): string {
  return createHash('sha256').update(JSON.stringify(scene)).digest('hex');
}
