/** Errors the renderers raise; the caller (a sheet or the build) adds file and field to the message. */
import { unsupportedCharacters } from '../scene/text.ts';
import type { TextNode } from '../scene/types.ts';

/** A text run holds a character the embedded font has no glyph for. */
export class UnsupportedCharacterError extends Error {
  readonly character: string;
  readonly codePoint: string;
  readonly text: string;

  constructor(args: { character: string; text: string }) {
    const codePoint = `U+${(args.character.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, '0')}`;
    super(
      `the character "${args.character}" (${codePoint}) in the text "${args.text}" is not in the Source Sans 3 font; ` +
        'replace it with a Latin, Greek or Cyrillic character or spell it out',
    );
    this.name = 'UnsupportedCharacterError';
    this.character = args.character;
    this.codePoint = codePoint;
    this.text = args.text;
  }
}

/** Throws UnsupportedCharacterError for the first character of the node the font cannot draw. */
export function assertDrawable(node: TextNode): void {
  const [missing] = unsupportedCharacters(node.text, node.weight);
  if (missing !== undefined) throw new UnsupportedCharacterError({ character: missing, text: node.text });
}
