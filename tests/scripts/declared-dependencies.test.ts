/**
 * Every npm package that our own source, scripts or tests import must be
 * declared in package.json: a package that is present only as a transitive
 * dependency can vanish or change version when an unrelated package is
 * upgraded. Checked against package.json itself (the outside source); no
 * tolerance — a single undeclared import fails.
 */
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { builtinModules } from 'node:module';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '../..');
const scannedDirs = ['app', 'components', 'lib', 'models', 'migrations', 'scripts', 'tests', 'types'];
// Type-only imports are left out: their packages come from declared @types packages.
const importPattern =
  /(?:^|\n)\s*(?:import(?!\s+type\s)|export(?!\s+type\s))[^'"]*?from\s+['"]([^'"]+)['"]|\bimport\(\s*['"]([^'"]+)['"]\s*\)/g;

function sourceFiles(dir: string): string[] {
  const entries = readdirSync(dir);
  return entries.flatMap((entry) => {
    const full = path.join(dir, entry);
    if (statSync(full).isDirectory()) return entry === 'node_modules' ? [] : sourceFiles(full);
    return /\.(ts|tsx|mts|mjs)$/.test(entry) ? [full] : [];
  });
}

/** `@scope/name/sub` → `@scope/name`; `name/sub` → `name`; null for relative, alias or built-in. */
function packageName(specifier: string): string | null {
  if (specifier.startsWith('.') || specifier.startsWith('@/') || specifier.startsWith('node:')) return null;
  const parts = specifier.split('/');
  const name = specifier.startsWith('@') ? parts.slice(0, 2).join('/') : parts[0];
  return builtinModules.includes(name) ? null : name;
}

describe('declared dependencies (package.json)', () => {
  it('declares every package imported by the project, directly', () => {
    const pkg = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8'));
    const declared = new Set([...Object.keys(pkg.dependencies ?? {}), ...Object.keys(pkg.devDependencies ?? {})]);
    const undeclared = new Set<string>();
    const files = [
      ...scannedDirs.flatMap((d) => sourceFiles(path.join(root, d))),
      path.join(root, 'vitest.config.mts'),
    ];
    for (const file of files) {
      for (const match of readFileSync(file, 'utf8').matchAll(importPattern)) {
        const name = packageName(match[1] ?? match[2]);
        if (name && !declared.has(name)) undeclared.add(`${name} (${path.relative(root, file)})`);
      }
    }
    expect([...undeclared]).toEqual([]);
  });
});
