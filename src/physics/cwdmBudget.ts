// Loss budget of every channel of a coarse WDM plan (G.694.2 grid, wdmGrid.ts) over one fiber link: the fiber's
// attenuation differs from 1271 to 1611 nm (highest at the short end and, in fibers that have one, at the water
// peak near 1383 nm), so each channel has its own loss and its own margin. The sums are the link budget's
// (linkBudget.ts); the attenuation per channel is the fiber type's (attenuationSpectrum.ts).
import { InputError, isCalcError, requireInteger, requireNumber } from './errors';
import { attenuationAtWavelength, type SpectralAttenuation } from './attenuationSpectrum';
import { linkBudget, TYPICAL_VALUES, MAX_LINK_LENGTH_KM, type AttenuationAt, type LinkRuleSet, type WavelengthBudget } from './linkBudget';
import { CWDM_CHANNEL_COUNT, cwdmChannels, type CwdmChannel } from './wdmGrid';

/** Largest fiber length accepted for a coarse WDM link, km (unamplified CWDM spans are well under this). Common practice. */
export const MAX_CWDM_LENGTH_KM = 200;
/** Largest multiplexer + demultiplexer loss accepted, dB. */
export const MAX_MUX_LOSS_DB = 30;

export interface CwdmPlanInput {
  attenuationDbPerKm: AttenuationAt[];
  lengthKm: number;
  connectorPairs: number;
  splices: number;
  /** Insertion loss of the multiplexer and demultiplexer together for one channel, dB (data sheet). */
  muxDemuxLossDb: number;
  /** Channel numbers 1 … 18 to plan; absent: all 18. */
  channelNumbers?: number[];
  /** Weakest transmitter minus receiver sensitivity, dB; absent: losses only, no margin. */
  powerBudgetDb?: number;
  /** Kept in hand for repairs and ageing, dB. */
  reserveDb: number;
  ruleSet?: LinkRuleSet;
}

export interface CwdmChannelBudget {
  channel: CwdmChannel;
  /** Undefined when the fiber type's values cannot support an estimate at this wavelength (see `unavailable`). */
  attenuation?: SpectralAttenuation;
  budget?: WavelengthBudget;
  /** Highest loss plus reserve. */
  maxLossDb?: number;
  /** powerBudgetDb − maxLossDb, when a power budget is given. */
  marginDb?: number;
  /** Why this channel has no estimate. */
  unavailable?: string;
}

export interface CwdmPlanResult {
  channels: CwdmChannelBudget[];
  /** The channel with the highest loss among those with an estimate. */
  worst?: CwdmChannelBudget;
  /** Channels whose margin is negative (only with a power budget). */
  shortChannels: number[];
  /** Channels in the water-peak region estimated without a listed value there. */
  waterPeakUnlisted: number[];
  notes: string[];
}

function fmt(v: number): string {
  return (Math.round(v * 100) / 100).toFixed(2);
}

/** Loss (and margin) of each coarse WDM channel over a link of one fiber type. */
export function cwdmPlan(input: CwdmPlanInput): CwdmPlanResult {
  if (!input || typeof input !== 'object') throw new InputError('input', input, 'a coarse WDM plan');
  const lengthKm = requireNumber('lengthKm', input.lengthKm, { min: 0, max: Math.min(MAX_CWDM_LENGTH_KM, MAX_LINK_LENGTH_KM), unit: 'km' });
  const connectorPairs = requireInteger('connectorPairs', input.connectorPairs, 0, 100);
  const splices = requireInteger('splices', input.splices, 0, 1000);
  const muxDemuxLossDb = requireNumber('muxDemuxLossDb', input.muxDemuxLossDb, { min: 0, max: MAX_MUX_LOSS_DB, unit: 'dB' });
  const reserveDb = requireNumber('reserveDb', input.reserveDb, { min: 0, max: 60, unit: 'dB' });
  const powerBudgetDb = input.powerBudgetDb === undefined ? undefined : requireNumber('powerBudgetDb', input.powerBudgetDb, { min: 0, max: 100, unit: 'dB' });
  const all = cwdmChannels();
  let chosen = all;
  if (input.channelNumbers !== undefined) {
    if (!Array.isArray(input.channelNumbers) || input.channelNumbers.length === 0 || input.channelNumbers.length > CWDM_CHANNEL_COUNT) {
      throw new InputError('channelNumbers', input.channelNumbers, `1 to ${CWDM_CHANNEL_COUNT} channel numbers`);
    }
    const numbers = new Set(input.channelNumbers.map((n, i) => requireInteger(`channelNumbers[${i}]`, n, 1, CWDM_CHANNEL_COUNT)));
    chosen = all.filter((c) => numbers.has(c.number));
  }
  const ruleSet = input.ruleSet ?? TYPICAL_VALUES;

  const channels: CwdmChannelBudget[] = chosen.map((channel) => {
    let attenuation: SpectralAttenuation;
    try {
      attenuation = attenuationAtWavelength({ attenuationDbPerKm: input.attenuationDbPerKm, wavelengthNm: channel.wavelengthNm, label: 'fiber type' });
    } catch (e) {
      // A channel the fiber type's values cannot reach is reported, not fatal: the rest of the plan stands.
      if (isCalcError(e) && e.name === 'ModelError') return { channel, unavailable: e.message };
      throw e;
    }
    const budget = linkBudget({
      elements: [
        { kind: 'fiber', label: 'Fiber', lengthKm, fiberClass: 'single-mode', plant: 'outside', attenuationDbPerKm: [{ wavelengthNm: channel.wavelengthNm, dbPerKm: attenuation.dbPerKm }] },
        { kind: 'other', label: 'Multiplexer and demultiplexer', lossDb: { minDb: muxDemuxLossDb, typicalDb: muxDemuxLossDb, maxDb: muxDemuxLossDb } },
        { kind: 'connectorPair', label: 'Connector pairs', count: connectorPairs },
        { kind: 'splice', label: 'Splices', count: splices },
      ],
      wavelengthsNm: [channel.wavelengthNm],
      ruleSet,
      designMarginDb: reserveDb,
    }).wavelengths[0]!;
    const maxLossDb = budget.withMarginDb;
    return { channel, attenuation, budget, maxLossDb, ...(powerBudgetDb !== undefined ? { marginDb: powerBudgetDb - maxLossDb } : {}) };
  });

  const estimated = channels.filter((c) => c.maxLossDb !== undefined);
  const worst = estimated.reduce<CwdmChannelBudget | undefined>((a, b) => (!a || b.maxLossDb! > a.maxLossDb! ? b : a), undefined);
  const shortChannels = channels.filter((c) => c.marginDb !== undefined && c.marginDb < 0).map((c) => c.channel.number);
  const waterPeakUnlisted = channels.filter((c) => c.attenuation?.waterPeakUnlisted).map((c) => c.channel.number);
  const notes = [
    'Grid: ITU-T G.694.2 (12/2003), 18 nominal central wavelengths 1271–1611 nm, 20 nm apart.',
    'Fiber attenuation per channel from the fiber type’s listed values: linear between listed wavelengths; below the shortest, scaled as λ⁻⁴ (Rayleigh scattering) for up to 100 nm.',
    `Connectors and splices: ${ruleSet.connectorPairSource}; ${ruleSet.spliceSource}.`,
    `Multiplexer and demultiplexer: ${fmt(muxDemuxLossDb)} dB per channel as entered.`,
    'Losses in series add in dB; highest loss = sum of the highest allowances plus the reserve.',
  ];
  if (waterPeakUnlisted.length) {
    notes.push(
      'Water peak: the fiber type lists no value between 1360 and 1460 nm, so the estimate for channels there assumes a low-water-peak fiber (G.652.C/D, G.657). An older fiber can lose far more near 1383 nm: measure before lighting those channels.',
    );
  }
  return { channels, worst, shortChannels, waterPeakUnlisted, notes };
}
