/** Help texts of the matchbook command line, in plain words. */
import type { CommandName } from './args.ts';

const GENERAL = `matchbook: impeller-to-engine matching charts from YAML definitions.

Usage: matchbook <command> [options]

Commands:
  build   check the data and write the site and chart books
  check   check the data only and list every problem found
  serve   build, serve the site locally and rebuild when a file changes
  start   write a starter data folder of example files to replace with your own
  add-trial  add one sea trial to a boat's trial log (boats/<id>.trials.csv)

Run "matchbook <command> --help" for a command's options.
Exit status: 0 done, 1 the data has problems, 2 the command was misused, 3 matchbook failed (a bug).
`;

const PRINT_OPTIONS = `
For a print shop, these override the paper of every sheet and book (the books' own paper otherwise):
  --bleed MM         bleed in millimetres beyond the trim, 0 to 10 (3 is usual; 0 for none)
  --crop-marks       crop marks outside the bleed, also on sheets without bleed
  --no-crop-marks    no crop marks, also on sheets with bleed
Without --crop-marks or --no-crop-marks a sheet has crop marks exactly when it has bleed
(a book file can say paper.crop_marks: true or false).
`;

const COMMANDS: Readonly<Record<CommandName, string>> = {
  build: `Usage: matchbook build [--data DIR] [--out DIR] [--bleed MM] [--crop-marks | --no-crop-marks]

Checks the definitions in DIR (default: data), computes every match and writes the site, every
sheet as SVG, PNG and PDF, every book as one PDF and the results as JSON into the output folder
(default: out). The output folder is replaced only when the whole build succeeds.
Set SOURCE_DATE_EPOCH to fix the date printed on the sheets.
${PRINT_OPTIONS}`,
  check: `Usage: matchbook check [--data DIR] [--bleed MM] [--crop-marks | --no-crop-marks]

Checks the definitions in DIR (default: data) without writing anything: every field, every
reference, the text the sheet font can print, and the layout of every sheet the build would draw.
Lists every problem with its file, line, column and field; check OK means build OK.
Exit status 1 when there is a problem.
${PRINT_OPTIONS}`,
  serve: `Usage: matchbook serve [--data DIR] [--out DIR] [--port N] [--host ADDRESS]

Builds the site into the output folder (default: out), serves it on http://127.0.0.1:N/ and
rebuilds and reloads the page when a definition or template changes. While the data has problems,
every page lists them at its top until the files are fixed.
The port is 8080, or the next free one up to 8089; --port N uses exactly N (0: any free port).
The preview is for this machine only: --host 0.0.0.0 (or one of the machine's addresses) lets other
machines on the network see it. The address really listened on is printed. Stop with Ctrl+C.
`,
  start: `Usage: matchbook start [--data DIR]

Writes a starter data folder into DIR (default: data): site.yaml and one example engine, jet unit
with its impellers, boat and chart book, each commented and marked as example data, each naming its
JSON Schema on its first line for your editor. "matchbook build" then works at once; replace the
examples with your own definitions. DIR must be new or empty: start never overwrites a file.
`,
  'add-trial': `Usage: matchbook add-trial [--data DIR] --boat ID --date YYYY-MM-DD --impeller ID --rpm N [more]

Adds one sea trial at the end of the boat's trial log, boats/ID.trials.csv in DIR (default: data),
making the log with its header row when there is none. More columns:
  --speed-kn N  --load-kg N  --air-temp-c N  --humidity-pct N  --pressure-hpa N (or --altitude-m N)
  --water fresh|salt|DENSITY  --by NAME  --notes TEXT
The data folder is checked first (the boat and the impeller must exist), then the new row by the
same rules as every row of the log. Every byte already in the log stays; the file is written to a
temporary file beside it and renamed into place, so a failed write leaves it as it was.
Exit status 1 when the data or the new trial has a problem (nothing is written then).
`,
};

/** The help text for one command, or the general help. */
export function helpText(command?: CommandName): string {
  return command === undefined ? GENERAL : COMMANDS[command];
}
