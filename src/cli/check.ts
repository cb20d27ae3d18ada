/** `matchbook check`: validate the data only; the data layer words every problem. */
import { checkData } from '../data/check.ts';
import type { ParsedArgs } from './args.ts';
import type { CliIo } from './io.ts';

/** Checks the data folder and prints the report; resolves to the exit status. */
export async function runCheck(args: ParsedArgs, io: CliIo): Promise<number> {
  const result = await checkData(args.dataDir);
  const text = result.text.endsWith('\n') ? result.text : `${result.text}\n`;
  (result.exitCode === 0 ? io.out : io.err)(text);
  return result.exitCode;
}
