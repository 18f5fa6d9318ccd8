// Every function exported by the physics door (src/physics/index.ts) must have a fuzz entry in
// tests/robustness/*.fuzz.test.ts, so a new export cannot slip past the robustness contract.
// An entry is the literal call `fuzz(M, '<name>'` (see fuzzKit.fuzz); classes count as functions.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as physics from '../../src/physics';

const DIR = join(import.meta.dirname, '.');

function fuzzedNames(): Map<string, string> {
  const names = new Map<string, string>();
  for (const file of readdirSync(DIR).filter((f) => f.endsWith('.fuzz.test.ts'))) {
    const text = readFileSync(join(DIR, file), 'utf8');
    for (const m of text.matchAll(/\bfuzz\(\s*M\s*,\s*'([A-Za-z_$][\w$]*)'/g)) names.set(m[1]!, file);
  }
  return names;
}

const exported = Object.entries(physics)
  .filter(([, v]) => typeof v === 'function')
  .map(([k]) => k)
  .sort();

describe('every exported physics function is fuzzed', () => {
  const fuzzed = fuzzedNames();
  it('the physics door exports functions at all (the check below is not vacuous)', () => {
    expect(exported.length).toBeGreaterThan(50);
  });
  it.each(exported)('%s has a fuzz entry with 10,000 generated inputs', (name) => {
    expect(fuzzed.has(name), `${name} is exported from src/physics/index.ts but no tests/robustness/*.fuzz.test.ts has fuzz(M, '${name}', …)`).toBe(true);
  });
  it('every fuzz entry names a function the door still exports (no stale entries)', () => {
    const stale = [...fuzzed.keys()].filter((n) => !exported.includes(n));
    expect(stale).toEqual([]);
  });
});
