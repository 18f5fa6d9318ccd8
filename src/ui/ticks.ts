// Axis ticks at 1-2-5 steps (linear) or decades (log). `lo`/`hi` are in plot space:
// log10 of the data for a log axis. Returned ticks are in data space.

export function niceStep(span: number, count: number): number {
  const raw = span / Math.max(1, count);
  const mag = 10 ** Math.floor(Math.log10(raw));
  const f = raw / mag;
  return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * mag;
}

export function niceTicks(lo: number, hi: number, count: number, log = false): number[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || hi <= lo) return [];
  if (log) {
    const ticks: number[] = [];
    for (let k = Math.ceil(lo); k <= Math.floor(hi); k++) ticks.push(10 ** k);
    if (ticks.length >= 2) return thin(ticks, count + 2);
    // Less than a decade: 1-2-5 ticks inside it.
    const out: number[] = [];
    for (let k = Math.floor(lo); k <= Math.ceil(hi); k++) {
      for (const m of [1, 2, 5]) {
        const v = m * 10 ** k;
        const lv = Math.log10(v);
        if (lv >= lo - 1e-9 && lv <= hi + 1e-9) out.push(v);
      }
    }
    return out;
  }
  const step = niceStep(hi - lo, count);
  const ticks: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) {
    ticks.push(Math.abs(v) < step * 1e-9 ? 0 : Number(v.toPrecision(12)));
    if (ticks.length > 50) break;
  }
  return ticks;
}

function thin(ticks: number[], max: number): number[] {
  if (ticks.length <= max) return ticks;
  const every = Math.ceil(ticks.length / max);
  return ticks.filter((_, i) => i % every === 0);
}
