/**
 * A small data set for build-level tests (one engine, one jet, three boats, one book: about ten sheets)
 * made from the demo files, with hostile text in the names and notes, and two boats fitted so they
 * over-rev (lightest impeller) and lug (heaviest).
 */
import { cpSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { stringify } from 'yaml';

/** Markup, quotes, ampersands, a CDATA end, accented and Greek letters: all drawable by Source Sans 3. */
export const HOSTILE = {
  shopName: `J&B <Jet> "Sons" 'Ltd'`,
  boatName: `<script>alert("x")</script> Ærø & Ωμέγα ]]>`,
  notes: `Tom's "quick" boat & <b>not bold</b> ]]> — café, naïve, Ελληνικά.`,
  cruiseLabel: `Go "fast" &<far>`,
} as const;

/** Write the small data set into dir (created); `boatName` replaces the hostile name (emoji, right-to-left tests). */
export function writeSmallData(dir: string, opts: { boatName?: string } = {}): string {
  for (const sub of ['engines', 'jets', 'boats', 'books']) mkdirSync(join(dir, sub), { recursive: true });
  cpSync('data/engines/thimblefinch-trotter.yaml', join(dir, 'engines/thimblefinch-trotter.yaml'));
  cpSync('data/jets/kelpspindle-riffle.yaml', join(dir, 'jets/kelpspindle-riffle.yaml'));
  const site = readFileSync('data/site.yaml', 'utf8').replace(/^shop_name: .*$/m, `shop_name: ${JSON.stringify(HOSTILE.shopName)}`);
  writeFileSync(join(dir, 'site.yaml'), site);
  const greyling = readFileSync('data/boats/greyling.yaml', 'utf8');
  const boat = (id: string, name: string, impeller: string) =>
    greyling
      .replace(/^id: greyling$/m, `id: ${id}`)
      .replace(/^name: .*$/m, `name: ${JSON.stringify(name)}`)
      .replace(/^impeller: gale$/m, `impeller: ${impeller}`);
  const named = boat('greyling', opts.boatName ?? HOSTILE.boatName, 'gale')
    .replace(/^notes: .*$/m, `notes: ${JSON.stringify(HOSTILE.notes)}`)
    .replace('label: Run to the spot', `label: ${JSON.stringify(HOSTILE.cruiseLabel)}`);
  writeFileSync(join(dir, 'boats/greyling.yaml'), named);
  // Demo arithmetic (constant torque, k = 3): Wisp at 1.48 kW vs the matched Gale at 2.49 kW raises WOT rpm by
  // sqrt(2.49/1.48) ≈ 1.30, past the 6000 rpm limit; Storm at 2.87 kW lowers it by sqrt(2.49/2.87) ≈ 0.93, below 5400.
  writeFileSync(join(dir, 'boats/light-boat.yaml'), boat('light-boat', 'Light Boat (demo)', 'wisp'));
  writeFileSync(join(dir, 'boats/heavy-boat.yaml'), boat('heavy-boat', 'Heavy Boat (demo)', 'storm'));
  const book = { id: 'cards', title: `Cards for ${HOSTILE.shopName}`, audience: 'owner', paper: { size: 'A6', orientation: 'landscape' }, sheets: [{ kind: 'consoleCard', boat: 'greyling' }] };
  writeFileSync(join(dir, 'books/cards.yaml'), `# DEMO DATA for tests.\n${stringify(book)}`);
  return dir;
}
