// Which Ethernet optical interfaces a fiber link carries: its length against each interface's operating range on
// the fiber category, its insertion loss against the channel insertion loss the interface allows (IEEE 802.3).
//
// The figures are the standard's per-category rows. Where a number could be checked against an outside text it
// says so in `source`; the rest were written from memory of IEEE 802.3 and are marked "from memory". A link
// that fits both limits is carried by any compliant transceiver pair; one that misses either may still work with
// particular parts, which is outside what the standard promises.
import { InputError, requireNumber } from './errors';

export type FiberCategory = 'OM1' | 'OM2' | 'OM3' | 'OM4' | 'OM5' | 'OS1' | 'OS2';
export const FIBER_CATEGORIES: readonly FiberCategory[] = ['OM1', 'OM2', 'OM3', 'OM4', 'OM5', 'OS1', 'OS2'];

/** Operating windows a loss can be given for (nm). */
export type LossWindow = 850 | 1300 | 1310 | 1550;

export interface CategoryReach {
  category: FiberCategory;
  maxReachM: number;
  channelInsertionLossDb: number;
  note?: string;
}

export interface EthernetInterface {
  name: string;
  /** Clause and table of IEEE 802.3 the rows come from. */
  clause: string;
  /** The window the link's loss is read at for this interface. */
  window: LossWindow;
  reaches: CategoryReach[];
  source: string;
  /** Extra condition a technician must know on multimode fiber (e.g. the offset-launch cord). */
  condition?: string;
}

const OFFSET_CORD = 'needs a mode-conditioning (offset-launch) cord at each transmitter on multimode fiber (IEEE 802.3 clause 38.11.4)';
const OM3_ROW_NOTE = 'OM3, OM4 and OM5 meet the 500 MHz·km row; 802.3 lists no longer reach for them';

export const ETHERNET_INTERFACES: readonly EthernetInterface[] = [
  {
    name: '1000BASE-SX',
    clause: 'IEEE 802.3 clause 38, Tables 38-2 (operating range) and 38-6 (link power budget)',
    window: 850,
    reaches: [
      { category: 'OM1', maxReachM: 275, channelInsertionLossDb: 2.6, note: '62.5 µm, 200 MHz·km row (220 m and 2.38 dB on 160 MHz·km fiber)' },
      { category: 'OM2', maxReachM: 550, channelInsertionLossDb: 3.56 },
      { category: 'OM3', maxReachM: 550, channelInsertionLossDb: 3.56, note: OM3_ROW_NOTE },
      { category: 'OM4', maxReachM: 550, channelInsertionLossDb: 3.56, note: OM3_ROW_NOTE },
      { category: 'OM5', maxReachM: 550, channelInsertionLossDb: 3.56, note: OM3_ROW_NOTE },
    ],
    source: 'reaches 220/275/500/550 m checked against equipment guides quoting 802.3z; channel insertion losses from memory (a summary gives the 2.6 to 3.56 dB span)',
  },
  {
    name: '1000BASE-LX',
    clause: 'IEEE 802.3 clause 38, Tables 38-6 and 38-10 (link power budget)',
    window: 1310,
    reaches: [
      { category: 'OM1', maxReachM: 550, channelInsertionLossDb: 2.35 },
      { category: 'OM2', maxReachM: 550, channelInsertionLossDb: 2.35 },
      { category: 'OM3', maxReachM: 550, channelInsertionLossDb: 2.35 },
      { category: 'OM4', maxReachM: 550, channelInsertionLossDb: 2.35 },
      { category: 'OM5', maxReachM: 550, channelInsertionLossDb: 2.35 },
      { category: 'OS1', maxReachM: 5000, channelInsertionLossDb: 4.57 },
      { category: 'OS2', maxReachM: 5000, channelInsertionLossDb: 4.57 },
    ],
    source: 'reaches 550 m / 5 km checked against equipment guides quoting 802.3z; channel insertion losses from memory (a summary gives the 2.35 to 4.57 dB span)',
    condition: OFFSET_CORD,
  },
  {
    name: '10GBASE-SR',
    clause: 'IEEE 802.3 clause 52, Tables 52-6 (operating range) and 52-9 (link power budget)',
    window: 850,
    reaches: [
      { category: 'OM1', maxReachM: 33, channelInsertionLossDb: 1.6, note: '62.5 µm, 200 MHz·km row (26 m on 160 MHz·km fiber)' },
      { category: 'OM2', maxReachM: 82, channelInsertionLossDb: 1.8 },
      { category: 'OM3', maxReachM: 300, channelInsertionLossDb: 2.6 },
      { category: 'OM4', maxReachM: 300, channelInsertionLossDb: 2.6, note: '2000 MHz·km row; 400 m on OM4 is often quoted but was not checked' },
      { category: 'OM5', maxReachM: 300, channelInsertionLossDb: 2.6, note: '2000 MHz·km row' },
    ],
    source: 'reaches 26 to 82 m and 300 m checked against a university network reference chart; channel insertion losses from memory',
  },
  {
    name: '10GBASE-LRM',
    clause: 'IEEE 802.3 clause 68 (10GBASE-LRM), table of channel insertion loss and operating range',
    window: 1310,
    reaches: [
      { category: 'OM1', maxReachM: 220, channelInsertionLossDb: 1.9, note: 'with the offset launch of clause 68 (mode-conditioning cord)' },
      { category: 'OM2', maxReachM: 220, channelInsertionLossDb: 1.9, note: 'with the offset launch of clause 68 (mode-conditioning cord)' },
      { category: 'OM3', maxReachM: 220, channelInsertionLossDb: 1.9 },
      { category: 'OM4', maxReachM: 220, channelInsertionLossDb: 1.9, note: 'as OM3' },
      { category: 'OM5', maxReachM: 220, channelInsertionLossDb: 1.9, note: 'as OM3' },
    ],
    source: 'ranges and 1.9 dB checked against an equipment guide reproducing the 802.3aq table (OM1, OM2, OM3 rows); OM4 and OM5 taken as OM3',
  },
  {
    name: '10GBASE-LR',
    clause: 'IEEE 802.3 clause 52, Tables 52-11 and 52-14 (table numbers from memory)',
    window: 1310,
    reaches: [
      { category: 'OS1', maxReachM: 10_000, channelInsertionLossDb: 6.2 },
      { category: 'OS2', maxReachM: 10_000, channelInsertionLossDb: 6.2 },
    ],
    source: '10 km checked against equipment data quoting 802.3ae; 6.2 dB from memory',
  },
  {
    name: '10GBASE-ER',
    clause: 'IEEE 802.3 clause 52, Table 52-24 (channel insertion loss)',
    window: 1550,
    reaches: [
      { category: 'OS1', maxReachM: 30_000, channelInsertionLossDb: 11, note: '40 km as an engineered link' },
      { category: 'OS2', maxReachM: 30_000, channelInsertionLossDb: 11, note: '40 km as an engineered link' },
    ],
    source: '11 dB from Table 52-24 checked against a message on the IEEE 802.3 reflector (2012); 30 km (40 km engineered) from memory',
  },
  {
    name: '25GBASE-SR',
    clause: 'IEEE 802.3 clause 112 (table numbers from memory)',
    window: 850,
    reaches: [
      { category: 'OM3', maxReachM: 70, channelInsertionLossDb: 1.8 },
      { category: 'OM4', maxReachM: 100, channelInsertionLossDb: 1.9 },
      { category: 'OM5', maxReachM: 100, channelInsertionLossDb: 1.9 },
    ],
    source: 'from memory',
  },
  {
    name: '40GBASE-SR4',
    clause: 'IEEE 802.3 clause 86, Table 86-2 (operating range; loss table number from memory)',
    window: 850,
    reaches: [
      { category: 'OM3', maxReachM: 100, channelInsertionLossDb: 1.9 },
      { category: 'OM4', maxReachM: 150, channelInsertionLossDb: 1.5, note: 'the lower loss allowance goes with the longer reach' },
      { category: 'OM5', maxReachM: 150, channelInsertionLossDb: 1.5 },
    ],
    source: 'OM3 100 m checked against a university network reference chart; OM4 150 m and the losses from memory (the same chart says 125 m on OM4)',
  },
  {
    name: '40GBASE-LR4',
    clause: 'IEEE 802.3 clause 87 (table numbers from memory)',
    window: 1310,
    reaches: [
      { category: 'OS1', maxReachM: 10_000, channelInsertionLossDb: 6.7 },
      { category: 'OS2', maxReachM: 10_000, channelInsertionLossDb: 6.7 },
    ],
    source: '10 km checked against a university network reference chart; 6.7 dB from memory',
  },
  {
    name: '100GBASE-SR4',
    clause: 'IEEE 802.3 clause 95 (table numbers from memory)',
    window: 850,
    reaches: [
      { category: 'OM3', maxReachM: 70, channelInsertionLossDb: 1.8 },
      { category: 'OM4', maxReachM: 100, channelInsertionLossDb: 1.9 },
      { category: 'OM5', maxReachM: 100, channelInsertionLossDb: 1.9 },
    ],
    source: 'from memory',
  },
  {
    name: '100GBASE-LR4',
    clause: 'IEEE 802.3 clause 88 (table numbers from memory)',
    window: 1310,
    reaches: [
      { category: 'OS1', maxReachM: 10_000, channelInsertionLossDb: 6.3 },
      { category: 'OS2', maxReachM: 10_000, channelInsertionLossDb: 6.3 },
    ],
    source: '10 km checked against a university network reference chart; 6.3 dB from memory',
  },
];

export type ApplicationVerdict = 'carried' | 'too long' | 'too much loss' | 'too long and too much loss' | 'not on this fiber' | 'length fits, loss not given';

export interface ApplicationCheck {
  name: string;
  clause: string;
  window: LossWindow;
  verdict: ApplicationVerdict;
  /** Absent when the interface has no row for the category. */
  maxReachM?: number;
  channelInsertionLossDb?: number;
  /** Metres to spare (negative: over). */
  reachMarginM?: number;
  /** dB to spare against the channel insertion loss (negative: over); absent when no loss was given for the window. */
  lossMarginDb?: number;
  /** The link's loss at the interface's window, when given. */
  lossDb?: number;
  note?: string;
  condition?: string;
  source: string;
}

/** Longest link accepted (m): beyond every interface listed. */
export const MAX_APPLICATION_LINK_M = 200_000;
/** Loss readings accepted (dB): a slightly negative reading is a reference error, kept as typed. */
export const MIN_APPLICATION_LOSS_DB = -5;
export const MAX_APPLICATION_LOSS_DB = 100;

const MULTIMODE_WINDOWS: readonly LossWindow[] = [850, 1300];
const SINGLE_MODE_WINDOWS: readonly LossWindow[] = [1310, 1550];

function isMultimode(c: FiberCategory): boolean {
  return c.startsWith('OM');
}

/**
 * Every interface of the list against one link. The loss used for an interface is the one given for its window
 * (on multimode fiber the 1300 nm reading stands for 1310 nm interfaces, the trade's second multimode window).
 */
export function applicationsForLink(input: { category: FiberCategory; lengthM: number; lossDbByWindow?: Partial<Record<LossWindow, number>> }): ApplicationCheck[] {
  const category = input?.category;
  if (!FIBER_CATEGORIES.includes(category)) throw new InputError('category', category, FIBER_CATEGORIES.join(', '));
  const lengthM = requireNumber('lengthM', input.lengthM, { min: 0, max: MAX_APPLICATION_LINK_M, unit: 'm' });
  const given = input.lossDbByWindow ?? {};
  if (given === null || typeof given !== 'object') throw new InputError('lossDbByWindow', given, 'losses by window, e.g. { 850: 2.1 }');
  const windows = isMultimode(category) ? MULTIMODE_WINDOWS : SINGLE_MODE_WINDOWS;
  const losses = new Map<LossWindow, number>();
  for (const [key, value] of Object.entries(given)) {
    const w = Number(key) as LossWindow;
    if (!windows.includes(w)) throw new InputError('lossDbByWindow', key, `losses at ${windows.join(' or ')} nm for ${category} fiber`);
    if (value === undefined) continue;
    losses.set(w, requireNumber(`lossDbByWindow[${key}]`, value, { min: MIN_APPLICATION_LOSS_DB, max: MAX_APPLICATION_LOSS_DB, unit: 'dB' }));
  }
  return ETHERNET_INTERFACES.map((itf) => {
    const row = itf.reaches.find((r) => r.category === category);
    const base = { name: itf.name, clause: itf.clause, window: itf.window, source: itf.source, condition: row && isMultimode(category) ? itf.condition : undefined };
    if (!row) return { ...base, verdict: 'not on this fiber' as const };
    const window: LossWindow = isMultimode(category) && itf.window === 1310 ? 1300 : itf.window;
    const lossDb = losses.get(window);
    const reachMarginM = row.maxReachM - lengthM;
    const lossMarginDb = lossDb === undefined ? undefined : row.channelInsertionLossDb - lossDb;
    const long = reachMarginM < 0;
    const lossy = lossMarginDb !== undefined && lossMarginDb < 0;
    const verdict: ApplicationVerdict = long && lossy ? 'too long and too much loss' : long ? 'too long' : lossy ? 'too much loss' : lossDb === undefined ? 'length fits, loss not given' : 'carried';
    return { ...base, window, verdict, maxReachM: row.maxReachM, channelInsertionLossDb: row.channelInsertionLossDb, reachMarginM, lossMarginDb, lossDb, note: row.note };
  });
}
