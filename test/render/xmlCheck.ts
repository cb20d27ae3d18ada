/**
 * Test helper: a small XML 1.0 well-formedness checker (W3C XML 1.0, 5th ed., §2.1 well-formed
 * documents, §2.4 character data, §3.1 tags): balanced elements, one root, quoted unique attributes,
 * '&' only in entity references, no '<' in attribute values, no "]]>" or control characters in text.
 */
const NAME = '[A-Za-z_:][-A-Za-z0-9_:.]*';
const ENTITY = /&(?:amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);/g;
const ATTR = new RegExp(`\\s+(${NAME})="([^"]*)"`, 'y');
const OPEN = new RegExp(`<(${NAME})`, 'y');
const CLOSE = new RegExp(`</(${NAME})\\s*>`, 'y');
// Characters XML 1.0 forbids outright (§2.2), besides tab, LF and CR.
const FORBIDDEN = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\uFFFE\uFFFF]/;

function textProblems(text: string, where: string): string[] {
  const problems: string[] = [];
  if (text.replace(ENTITY, '').includes('&')) problems.push(`bare & in ${where}`);
  if (text.includes(']]>')) problems.push(`"]]>" in ${where}`);
  if (FORBIDDEN.test(text)) problems.push(`control character in ${where}`);
  return problems;
}

/** Problems that make `xml` not well-formed (empty when it is well-formed). */
export function xmlProblems(xml: string): string[] {
  const problems: string[] = [];
  const stack: string[] = [];
  let roots = 0;
  let at = xml.startsWith('<?xml') ? xml.indexOf('?>') + 2 : 0;
  while (at < xml.length) {
    const lt = xml.indexOf('<', at);
    const text = xml.slice(at, lt < 0 ? xml.length : lt);
    problems.push(...textProblems(text, `text "${text.slice(0, 30)}"`));
    if (stack.length === 0 && text.trim() !== '') problems.push('text outside the root element');
    if (lt < 0) break;
    CLOSE.lastIndex = lt;
    OPEN.lastIndex = lt;
    const close = CLOSE.exec(xml);
    const open = close ? null : OPEN.exec(xml);
    if (close) {
      if (stack.pop() !== close[1]) problems.push(`</${close[1]}> does not close the open element`);
      at = CLOSE.lastIndex;
    } else if (open) {
      let end = OPEN.lastIndex;
      const names = new Set<string>();
      for (let attr = ((ATTR.lastIndex = end), ATTR.exec(xml)); attr; ATTR.lastIndex = end, attr = ATTR.exec(xml)) {
        if (names.has(attr[1])) problems.push(`duplicate attribute ${attr[1]} on <${open[1]}>`);
        names.add(attr[1]);
        if (attr[2].includes('<')) problems.push(`< in attribute ${attr[1]}`);
        problems.push(...textProblems(attr[2], `attribute ${attr[1]}`));
        end = ATTR.lastIndex;
      }
      const tail = /\s*(\/?)>/y;
      tail.lastIndex = end;
      const closing = tail.exec(xml);
      if (!closing) return [...problems, `malformed tag <${open[1]} at offset ${lt}`];
      if (stack.length === 0) roots += 1;
      if (closing[1] !== '/') stack.push(open[1]);
      at = tail.lastIndex;
    } else {
      return [...problems, `malformed markup at offset ${lt}`];
    }
  }
  if (stack.length > 0) problems.push(`unclosed elements: ${stack.join(', ')}`);
  if (roots !== 1) problems.push(`${roots} root elements, expected 1`);
  return problems;
}
