// Result-card prose shows its first two sentences on a phone and folds the rest (issue 11). The cut must
// fall between sentences, never inside a number.
import { describe, expect, it } from 'vitest';
import { sentences } from '../../src/ui/sentences';

describe('cutting card prose into sentences', () => {
  it('keeps a decimal number whole: "b = 0.01" and "V = 2.405" are not sentence ends', () => {
    const text = 'The cutoff (1260 nm) is below 1310 nm. In theory LP11 is guided, but weakly (b = 0.01) that it is lost. V = 2.405 is the edge!';
    expect(sentences(text)).toEqual([
      'The cutoff (1260 nm) is below 1310 nm. ',
      'In theory LP11 is guided, but weakly (b = 0.01) that it is lost. ',
      'V = 2.405 is the edge!',
    ]);
  });
  it('keeps a last sentence without a closing mark, and "?" and "…" style runs of marks', () => {
    expect(sentences('Is it single-mode?? Yes... mostly')).toEqual(['Is it single-mode?? ', 'Yes... ', 'mostly']);
  });
  it('gives every character back, in order, and nothing for an empty text', () => {
    const text = 'A 0.5 dB splice. Then 2.5 km of fiber at 0.35 dB/km. Total 1.4 dB.';
    expect(sentences(text).join('')).toBe(text);
    expect(sentences('')).toEqual([]);
  });
});
