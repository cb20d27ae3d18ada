// A quiet, complete install: every dependency that carries an install script has a decision in
// package.json's `allowScripts` (npm 11 runs none without one and warns at the end of `npm install`).
// The list comes from npm's own lockfile flag `hasInstallScript`, so a new dependency with a script
// fails here until it is approved or denied.
import { readFileSync } from 'node:fs';
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

const root = new URL('../', import.meta.url);
const pkg = JSON.parse(readFileSync(new URL('package.json', root), 'utf8')) as {
  allowScripts?: Record<string, boolean>;
};
const lock = JSON.parse(readFileSync(new URL('package-lock.json', root), 'utf8')) as {
  packages: Record<string, { hasInstallScript?: boolean; version?: string }>;
};

/** Package name from a lockfile key such as `node_modules/a/node_modules/@s/b`. */
function nameOf(key: string): string {
  return key.slice(key.lastIndexOf('node_modules/') + 'node_modules/'.length);
}

describe('install scripts', () => {
  const withScripts = Object.entries(lock.packages)
    .filter(([key, entry]) => key !== '' && entry.hasInstallScript === true)
    .map(([key]) => nameOf(key));

  it('the lockfile lists esbuild as the one package with an install script', () => {
    expect([...new Set(withScripts)].sort()).toEqual(['esbuild']);
  });

  it('every package with an install script has an allowScripts decision', () => {
    const decided = Object.keys(pkg.allowScripts ?? {}).map((k) => k.replace(/(.)@.*$/, '$1'));
    const undecided = withScripts.filter((name) => !decided.includes(name));
    expect(undecided).toEqual([]);
    expect(pkg.allowScripts?.['esbuild']).toBe(true);
  });

  it('esbuild, approved, runs its platform binary', () => {
    const version = lock.packages['node_modules/esbuild']?.version;
    // After its postinstall, bin/esbuild is the platform binary itself (before, a node launcher).
    const out = execFileSync(new URL('node_modules/esbuild/bin/esbuild', root).pathname, ['--version'], {
      encoding: 'utf8',
    });
    expect(out.trim()).toBe(version);
  });
});
