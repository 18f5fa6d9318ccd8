// Data is only ever rendered as text (issue 8): no source file under src/ may reach for the ways a string
// becomes markup or code. ESLint bans some of these in src; this scan is the backstop that also covers
// what the lint rules do not name (insertAdjacentHTML, outerHTML, document.write, setTimeout with a string).
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const SRC = join(import.meta.dirname, '../../src');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.(ts|tsx|js|mjs)$/.test(name) ? [path] : [];
  });
}

const FORBIDDEN: [what: string, pattern: RegExp][] = [
  ['innerHTML', /\binnerHTML\b/],
  ['outerHTML', /\bouterHTML\b/],
  ['dangerouslySetInnerHTML', /dangerouslySetInnerHTML/],
  ['insertAdjacentHTML', /insertAdjacentHTML/],
  ['document.write', /document\.write(ln)?\s*\(/],
  ['eval(', /(^|[^\w.])eval\s*\(/],
  ['new Function', /new\s+Function\s*\(/],
  ['setTimeout/setInterval with a string', /set(Timeout|Interval)\s*\(\s*['"`]/],
  ['a javascript: URL in an href or src', /(href|src)\s*=\s*[{'"`]*\s*javascript:/i],
];

describe('no source file turns data into markup or code', () => {
  const files = sourceFiles(SRC);
  it('the scan sees the whole source tree (at least the physics, the screens and the store)', () => {
    const rel = files.map((f) => relative(SRC, f));
    expect(rel).toEqual(expect.arrayContaining(['physics/index.ts', 'fibers/db.ts', 'features/library/Screen.tsx', 'main.tsx']));
  });
  it.each(FORBIDDEN)('no %s anywhere in src/', (what, pattern) => {
    const hits = files.flatMap((f) =>
      readFileSync(f, 'utf8')
        .split('\n')
        .map((line, i) => ({ line, i }))
        .filter(({ line }) => pattern.test(line) && !/^\s*(\/\/|\*)/.test(line))
        .map(({ line, i }) => `${relative(SRC, f)}:${i + 1}: ${line.trim()}`),
    );
    expect(hits, `${what} found`).toEqual([]);
  });
});
