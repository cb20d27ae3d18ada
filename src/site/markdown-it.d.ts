// The few parts of markdown-it's API we use (the package ships no TypeScript types).
declare module 'markdown-it' {
  export interface Token {
    type: string;
    tag: string;
    content: string;
    children: Token[] | null;
    attrGet(name: string): string | null;
    attrSet(name: string, value: string): void;
  }
  export default class MarkdownIt {
    constructor(options?: { html?: boolean; linkify?: boolean; typographer?: boolean });
    options: Record<string, unknown>;
    parse(src: string, env: object): Token[];
    renderer: { render(tokens: Token[], options: Record<string, unknown>, env: object): string };
  }
}
