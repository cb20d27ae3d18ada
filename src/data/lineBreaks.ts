/**
 * Line endings. YAML 1.2.2 §5.4 counts CR LF, CR and LF as line breaks; the parser we use reads only LF
 * and CR LF, so a file saved with classic Mac OS endings (CR alone) read as one comment line and was
 * reported as empty. A lone CR becomes LF here, one character for one, so every offset, line and column
 * stays the file's own (a CR-only file's line 7 is reported as line 7).
 */

/** The text with each CR not followed by LF turned into LF; CR LF and LF are left as they are. */
export function lfLineBreaks(text: string): string {
  return text.includes('\r') ? text.replace(/\r(?!\n)/g, '\n') : text;
}
