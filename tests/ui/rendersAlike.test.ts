// The details band leaves a card alone when the screen made it anew from the same data (src/ui/rendersAlike.ts).
// A wrong "alike" would leave an old number on screen, so every way a card can change must read as a change.
import { describe, expect, it } from 'vitest';
import { h } from 'preact';
import { rendersAlike } from '../../src/ui/rendersAlike';
import { DataTable } from '../../src/ui/DataTable';

function Card(props: { title: string; children?: unknown }) {
  return h('section', null, props.title);
}
const card = (lossDb: number, points: number[][], extra: Record<string, unknown> = {}) =>
  h(Card, { title: 'Loss', ...extra }, h('dd', { class: 'num' }, `${lossDb} dB`), h('svg', { points }));

describe('a card made anew from the same data is left as drawn', () => {
  it('the same numbers, arrays and text, in new objects, render alike', () => {
    expect(rendersAlike(card(0.12, [[0, 1], [2, 3]]), card(0.12, [[0, 1], [2, 3]]))).toBe(true);
  });

  it('a missing card (false while there is no result) is alike only to another missing card', () => {
    expect(rendersAlike(false, false)).toBe(true);
    expect(rendersAlike(false, card(0.12, []))).toBe(false);
    expect(rendersAlike(undefined, null)).toBe(false);
  });

  it('NaN is alike to NaN, and −0 is not alike to 0 (it is written "−0")', () => {
    expect(rendersAlike({ v: NaN }, { v: NaN })).toBe(true);
    expect(rendersAlike({ v: -0 }, { v: 0 })).toBe(false);
  });

  it('typed arrays compare by their entries', () => {
    expect(rendersAlike(new Float64Array([1, 2]), new Float64Array([1, 2]))).toBe(true);
    expect(rendersAlike(new Float64Array([1, 2]), new Float64Array([1, 2.5]))).toBe(false);
    expect(rendersAlike(new Float64Array([1, 2]), [1, 2])).toBe(false);
  });
});

describe('every change reads as a change', () => {
  it('a new value in the text, in a plotted point or in a prop', () => {
    const before = card(0.12, [[0, 1], [2, 3]]);
    expect(rendersAlike(before, card(0.13, [[0, 1], [2, 3]]))).toBe(false);
    expect(rendersAlike(before, card(0.12, [[0, 1], [2, 3.0001]]))).toBe(false);
    expect(rendersAlike(before, card(0.12, [[0, 1]]))).toBe(false);
    expect(rendersAlike(before, card(0.12, [[0, 1], [2, 3]], { stale: true }))).toBe(false);
  });

  it('another element or component, or another key', () => {
    expect(rendersAlike(h('dd', null, '1'), h('dt', null, '1'))).toBe(false);
    expect(rendersAlike(h(Card, { title: 'a' }), h(() => null, { title: 'a' }))).toBe(false);
    expect(rendersAlike(h('li', { key: 'a' }, 'x'), h('li', { key: 'b' }, 'x'))).toBe(false);
  });

  it('a handler made anew, even with the same source, since it may hold new state', () => {
    const make = (n: number) => () => n;
    expect(rendersAlike(h('button', { onClick: make(1) }), h('button', { onClick: make(2) }))).toBe(false);
    const same = make(1);
    expect(rendersAlike(h('button', { onClick: same }), h('button', { onClick: same }))).toBe(true);
  });

  it('a map, a date or a class instance is alike only to itself', () => {
    expect(rendersAlike(new Map([[1, 2]]), new Map([[1, 2]]))).toBe(false);
    expect(rendersAlike(new Date(0), new Date(0))).toBe(false);
    const m = new Map();
    expect(rendersAlike({ m }, { m })).toBe(true);
  });

  it('a vnode is never alike to a plain object that looks like one', () => {
    expect(rendersAlike(h('dd', null, '1'), { type: 'dd', props: { children: '1' }, key: undefined, ref: undefined })).toBe(false);
  });

  it('a structure nested deeper than any card reads as changed rather than being walked for ever', () => {
    const deep = (n: number): unknown => (n === 0 ? 1 : [deep(n - 1)]);
    expect(rendersAlike(deep(500), deep(500))).toBe(false);
    expect(rendersAlike(deep(50), deep(50))).toBe(true);
  });
});

describe('a table is compared by the cells it draws', () => {
  // The screen makes its column functions anew on every key; the table must stay as drawn when the cells
  // come out the same, and be redrawn when any cell, row key or row mark would come out different.
  const rows = [
    { wavelengthNm: 1310, lossDb: 0.35 },
    { wavelengthNm: 1550, lossDb: 0.22 },
  ];
  const table = (decimals: number, data = rows, mark?: number) =>
    h(DataTable<(typeof rows)[number]>, {
      caption: 'Attenuation',
      rows: data,
      rowKey: (r) => r.wavelengthNm,
      rowClass: (r) => (r.wavelengthNm === mark ? 'row-chosen' : undefined),
      columns: [
        { label: 'Wavelength', cell: (r) => `${r.wavelengthNm} nm`, num: true },
        { label: 'Loss', cell: (r) => `${r.lossDb.toFixed(decimals)} dB/km`, num: true },
      ],
    });

  it('new column functions that draw the same cells: alike', () => {
    expect(rendersAlike(table(2), table(2))).toBe(true);
    expect(rendersAlike(h('section', null, table(2)), h('section', null, table(2)))).toBe(true);
  });

  it('a function that now draws differently (it holds new state), a changed row, or a newly marked row: changed', () => {
    expect(rendersAlike(table(2), table(3))).toBe(false);
    expect(rendersAlike(table(2), table(2, [rows[0]!, { wavelengthNm: 1550, lossDb: 0.25 }]))).toBe(false);
    expect(rendersAlike(table(2), table(2, rows, 1550))).toBe(false);
  });

  it('a component not marked as drawing from its props alone still counts new functions as a change', () => {
    const Unmarked = (p: { cell: () => string }) => h('td', null, p.cell());
    expect(rendersAlike(h(Unmarked, { cell: () => 'x' }), h(Unmarked, { cell: () => 'x' }))).toBe(false);
  });
});
