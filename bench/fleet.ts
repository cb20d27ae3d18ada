/**
 * Generated fleets for the build benchmark: the demo's site, engines and jets plus N boats made from
 * the demo boats with new ids and names and the impellers taken in turn. Books are left out: the demo
 * books name demo boats. All of it is invented demo data.
 */
import { cpSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';

/** Writes a data folder with `boats` generated boats into `dir`; returns dir. */
export function generateFleet(args: { demoDir: string; dir: string; boats: number }): string {
  rmSync(args.dir, { recursive: true, force: true });
  mkdirSync(join(args.dir, 'boats'), { recursive: true });
  mkdirSync(join(args.dir, 'books'), { recursive: true });
  cpSync(join(args.demoDir, 'site.yaml'), join(args.dir, 'site.yaml'));
  cpSync(join(args.demoDir, 'engines'), join(args.dir, 'engines'), { recursive: true });
  cpSync(join(args.demoDir, 'jets'), join(args.dir, 'jets'), { recursive: true });
  const jets = new Map(
    readdirSync(join(args.demoDir, 'jets')).map((f) => {
      const jet = parse(readFileSync(join(args.demoDir, 'jets', f), 'utf8')) as { id: string; impellers: { id: string }[] };
      return [jet.id, jet.impellers.map((i) => i.id)];
    }),
  );
  const templates = readdirSync(join(args.demoDir, 'boats'))
    .sort()
    .map((f) => parse(readFileSync(join(args.demoDir, 'boats', f), 'utf8')) as Record<string, unknown>);
  for (let i = 0; i < args.boats; i += 1) {
    const base = templates[i % templates.length];
    const impellers = jets.get(String(base.jet)) ?? [String(base.impeller)];
    const id = `gen-${String(i + 1).padStart(4, '0')}`;
    const boat = { ...base, id, name: `Generated boat ${i + 1} (demo)`, impeller: impellers[i % impellers.length] };
    writeFileSync(join(args.dir, 'boats', `${id}.yaml`), stringify(boat));
  }
  return args.dir;
}
