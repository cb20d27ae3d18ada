/** `matchbook check`: the data, its printable text and every sheet's layout, without writing anything. */
import { checkSite } from '../site/checkSite.ts';
import type { ParsedArgs } from './args.ts';
import type { CliIo } from './io.ts';

/** Checks the data folder and prints the report; resolves to the exit status. */
export async function runCheck(args: ParsedArgs, io: CliIo): Promise<number> {
  const result = await checkSite(args.dataDir, { sourceDateEpoch: io.env.SOURCE_DATE_EPOCH, print: args.print });
  const text = result.text.endsWith('\n') ? result.text : `${result.text}\n`;
  (result.exitCode === 0 ? io.out : io.err)(text);
  return result.exitCode;
}
