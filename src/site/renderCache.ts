/**
 * Warm rebuilds (the dev server, the rebuild benchmark) reuse work: a scene is keyed by a hash of the
 * request and every definition it is drawn from (site settings, the boat with its engine and jet, the
 * engine family, the jet unit), rendered files by a hash of the scene itself, and book PDFs by the
 * hashes of their scenes. Anything that changes a sheet changes its key, so nothing stale is reused.
 * The cache is an object the caller owns (no module-level state); one-shot builds pass none.
 */
import { createHash } from 'node:crypto';
import type { Project, SheetRequest } from '../data/types.ts';
import type { Scene } from '../scene/types.ts';

export interface RenderedSheet {
  readonly svg: string;
  readonly pdf: Uint8Array;
  readonly png: Uint8Array;
  /** SVG and PNG of the sheet's further pages (Scene.morePages); the PDF holds every page. */
  readonly morePages?: readonly { readonly svg: string; readonly png: Uint8Array }[];
}

export interface BuildCache {
  readonly scenes: Map<string, Scene>;
  readonly rendered: Map<string, RenderedSheet>;
  readonly books: Map<string, Uint8Array>;
}

/** A fresh, empty cache for a long-lived process. */
export function createBuildCache(): BuildCache {
  return { scenes: new Map(), rendered: new Map(), books: new Map() };
}

/** SHA-256 (hex) of any JSON-serialisable value. */
export function jsonHash(value: unknown): string {
  return createHash('sha256').update(JSON.stringify(value)).digest('hex');
}

/** SHA-256 of the scene's JSON: equal scenes give equal files. */
export function sceneHash(scene: Scene): string {
  return jsonHash(scene);
}

/** Everything a sheet is drawn from, hashed: the request, the date and the definitions it reads. */
export function sceneKey(args: { request: SheetRequest; project: Project; dateIso: string }): string {
  const { request, project } = args;
  const boat = request.kind === 'wallChart' ? undefined : project.boats.find((b) => b.id === request.boatId);
  const familyId = request.kind === 'wallChart' ? request.engineFamilyId : boat?.engineFamilyId;
  const jetId = request.kind === 'wallChart' ? request.jetId : boat?.jetId;
  return jsonHash({
    request,
    dateIso: args.dateIso,
    site: project.site,
    boat,
    family: project.engines.find((f) => f.id === familyId),
    jet: project.jets.find((j) => j.id === jetId),
  });
}
