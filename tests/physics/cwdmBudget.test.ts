import { describe, expect, it } from 'vitest';
import { cwdmPlan } from '../../src/physics';

const G652D = [
  { wavelengthNm: 1310, dbPerKm: 0.4 },
  { wavelengthNm: 1550, dbPerKm: 0.3 },
  { wavelengthNm: 1625, dbPerKm: 0.4 },
];

describe('coarse WDM plan per channel', () => {
  const base = { attenuationDbPerKm: G652D, lengthKm: 20, connectorPairs: 2, splices: 2, muxDemuxLossDb: 3, reserveDb: 0, powerBudgetDb: 18 };
  const r = cwdmPlan(base);
  it('plans all 18 channels; the 1551 nm channel loses 20 × 0.3 + 3 + 2 × 0.5 + 2 × 0.1 = 10.2 dB', () => {
    expect(r.channels).toHaveLength(18);
    const c15 = r.channels.find((c) => c.channel.wavelengthNm === 1551)!;
    // 1551 nm is within 2 nm of the listed 1550 nm: 0.3 dB/km. Connectors 0.5 dB and splices 0.1 dB highest
    // (typical installed values, common practice).
    expect(c15.attenuation?.basis).toBe('listed');
    expect(c15.maxLossDb!).toBeCloseTo(10.2, 9);
    expect(c15.marginDb!).toBeCloseTo(18 - c15.maxLossDb!, 12);
  });
  it('the 1271 nm channel costs most (λ⁻⁴ below the listed 1310 nm)', () => {
    expect(r.worst?.channel.wavelengthNm).toBe(1271);
  });
  it('the five channels in the water-peak region (1371–1451 nm) are flagged when the fiber lists no value there', () => {
    expect(r.waterPeakUnlisted).toEqual([6, 7, 8, 9, 10]);
    expect(r.notes.join(' ')).toMatch(/Water peak/);
    const listed = cwdmPlan({ ...base, attenuationDbPerKm: [...G652D, { wavelengthNm: 1383, dbPerKm: 0.4 }] });
    expect(listed.waterPeakUnlisted).toEqual([]);
  });
  it('a fiber type listing only 1550 nm gives no estimate below 1450 nm nor beyond 1580 nm: those channels say why, the rest stand', () => {
    const only1550 = cwdmPlan({ ...base, attenuationDbPerKm: [{ wavelengthNm: 1550, dbPerKm: 0.23 }] });
    const missing = only1550.channels.filter((c) => c.unavailable).map((c) => c.channel.number);
    expect(missing).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 17, 18]);
    expect(only1550.channels[0]!.unavailable).toMatch(/add the attenuation|no attenuation can be estimated/);
    expect(only1550.channels[9]!.maxLossDb).toBeGreaterThan(0);
  });
  it('a tight power budget names the short channels', () => {
    const tight = cwdmPlan({ ...base, powerBudgetDb: 10.5 });
    expect(tight.shortChannels.length).toBeGreaterThan(0);
    expect(tight.shortChannels).toContain(1);
  });
  it('a subset of channels plans only those', () => {
    expect(cwdmPlan({ ...base, channelNumbers: [15, 16] }).channels.map((c) => c.channel.wavelengthNm)).toEqual([1551, 1571]);
  });
});
