/**
 * The scene: a device-independent description of one sheet in paper millimetres.
 * Sheets (src/sheets) build scenes; renderers (src/render) only translate them to SVG, PDF and PNG.
 * Coordinates: origin at the top-left corner of the *media* (trim plus bleed), x to the right,
 * y downward. The PDF renderer flips y in exactly one place.
 */

/** Colour as "#rrggbb". */
export type Colour = string;

export interface Stroke {
  readonly colour: Colour;
  /** Never under 0.5 pt (0.1764 mm). */
  readonly widthMm: number;
  /** Dash pattern in mm (on, off, on, off…); absent or empty = solid. */
  readonly dashMm?: readonly number[];
  readonly cap?: 'butt' | 'round' | 'square';
  readonly join?: 'miter' | 'round' | 'bevel';
}

export interface Fill {
  readonly colour: Colour;
  /** 0–1, default 1. */
  readonly opacity?: number;
}

export type PathSegment =
  | { readonly op: 'M'; readonly x: number; readonly y: number }
  | { readonly op: 'L'; readonly x: number; readonly y: number }
  | {
      readonly op: 'C';
      readonly x1: number;
      readonly y1: number;
      readonly x2: number;
      readonly y2: number;
      readonly x: number;
      readonly y: number;
    }
  | { readonly op: 'Z' };

/**
 * Optional tags every node may carry so tests and the site can find things in a scene
 * (e.g. role "operating-point", key "impeller:x|engine:y") without parsing geometry.
 */
export interface Tagged {
  readonly role?: string;
  readonly key?: string;
}

export interface PathNode extends Tagged {
  readonly type: 'path';
  readonly segments: readonly PathSegment[];
  readonly stroke?: Stroke;
  readonly fill?: Fill;
}

export interface RectNode extends Tagged {
  readonly type: 'rect';
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
  readonly stroke?: Stroke;
  readonly fill?: Fill;
}

export interface CircleNode extends Tagged {
  readonly type: 'circle';
  readonly cx: number;
  readonly cy: number;
  readonly r: number;
  readonly stroke?: Stroke;
  readonly fill?: Fill;
}

export type FontWeight = 'regular' | 'bold';

/**
 * One run of text on one line. (x, y) is the anchor point on the baseline.
 * widthMm is the advance width measured with the embedded font (no kerning), filled in by the
 * scene builder through src/scene/text.ts so renderers and collision checks agree.
 */
export interface TextNode extends Tagged {
  readonly type: 'text';
  readonly x: number;
  readonly y: number;
  readonly text: string;
  readonly sizePt: number;
  readonly weight: FontWeight;
  readonly anchor: 'start' | 'middle' | 'end';
  readonly colour: Colour;
  readonly widthMm: number;
  /** Rotation about (x, y) in degrees, counter-clockwise positive as seen on paper: 0 or 90. */
  readonly rotateDeg?: 0 | 90;
}

export interface ClipRect {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

export interface GroupNode extends Tagged {
  readonly type: 'group';
  /** Children are clipped to this rectangle (chart plot areas). */
  readonly clip?: ClipRect;
  readonly children: readonly SceneNode[];
}

export type SceneNode = GroupNode | PathNode | RectNode | CircleNode | TextNode;

export interface Box {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

export interface Scene {
  /** Media size: trim size plus bleed on every side. */
  readonly widthMm: number;
  readonly heightMm: number;
  /** The finished sheet inside the media (equals the media when bleedMm is 0). */
  readonly trimBox: Box;
  /** Everything but bleed artwork and crop marks lies inside this box. */
  readonly safeBox: Box;
  readonly bleedMm: number;
  /** Document title (SVG <title>, PDF title, bookmark). */
  readonly title: string;
  /** Text alternative of the whole sheet (SVG <desc>, site alt text). */
  readonly description: string;
  readonly subject: string;
  readonly keywords: readonly string[];
  /** Who issues the sheet (the shop's name), for the PDF's Author. */
  readonly author?: string;
  /** ISO date (YYYY-MM-DD) printed on the sheet and in PDF metadata. */
  readonly dateIso: string;
  readonly root: GroupNode;
  /**
   * The sheet's further pages, same paper, when its content continues (a long table, the back of a
   * card): the PDF gets every page, SVG and PNG one file per page.
   */
  readonly morePages?: readonly Scene[];
}

/** A sheet's pages in order: the scene itself, then its further pages. */
export function scenePages(scene: Scene): Scene[] {
  return [scene, ...(scene.morePages ?? [])];
}
