/**
 * The one escaping helper of the site. Every page is written with the `html` tag: interpolated values
 * are escaped unless they are SafeHtml (produced by `html` itself or, for markup we generate and trust,
 * such as our own SVG renderer's output, by `trustedHtml`). Data can hold <script>, quotes, &, RTL text
 * and emoji; escaping the five HTML-special characters is enough for text and quoted attribute values.
 */

/** Markup that is already safe to insert into a page. */
export class SafeHtml {
  constructor(readonly value: string) {}
  toString(): string {
    return this.value;
  }
}

type Interpolation = SafeHtml | string | number | boolean | null | undefined | readonly Interpolation[];

const ESCAPES: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/** Escapes text for HTML element content and quoted attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (ch) => ESCAPES[ch]);
}

function interpolate(value: Interpolation): string {
  if (value instanceof SafeHtml) return value.value;
  if (Array.isArray(value)) return value.map((v: Interpolation) => interpolate(v)).join('');
  if (value === null || value === undefined || value === false || value === true) return '';
  return escapeHtml(String(value));
}

/** Tagged template: literal parts pass through, every interpolated value is escaped. */
export function html(strings: TemplateStringsArray, ...values: readonly Interpolation[]): SafeHtml {
  let out = strings[0];
  for (let i = 0; i < values.length; i += 1) out += interpolate(values[i]) + strings[i + 1];
  return new SafeHtml(out);
}

/** Marks markup we generate ourselves (our SVG renderer escapes its own text) as safe. */
export function trustedHtml(markup: string): SafeHtml {
  return new SafeHtml(markup);
}
