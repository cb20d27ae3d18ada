import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { demoWith } from './helpers.ts';

const SITE = 'data/site.yaml';
const demoSite = readFileSync(SITE, 'utf8');

describe("site.yaml's cautions are the shop's extra cautions", () => {
  it('loads a listed cautions key as extraCautions, in order', () => {
    const text = `${demoSite}cautions:\n  - Check the intake grate before each trip.\n  - Keep the trim tab clear of lines.\n`;
    const result = loadProjectFromFiles(demoWith(SITE, text));
    if (!result.ok) throw new Error(result.errors.map((e) => e.message).join('\n'));
    expect(result.project.site.extraCautions).toEqual(['Check the intake grate before each trip.', 'Keep the trim tab clear of lines.']);
  });

  it('leaves extraCautions out when the key is absent', () => {
    const result = loadProjectFromFiles(demoWith(SITE, demoSite));
    if (!result.ok) throw new Error(result.errors.map((e) => e.message).join('\n'));
    expect(result.project.site).not.toHaveProperty('extraCautions');
  });

  it('still refuses an empty list, located at the key', () => {
    const result = loadProjectFromFiles(demoWith(SITE, `${demoSite}cautions: []\n`));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.map((e) => e.message).join('\n')).toMatch(/data\/site\.yaml:\d+:\d+ .*cautions.*at least one caution/);
  });
});
