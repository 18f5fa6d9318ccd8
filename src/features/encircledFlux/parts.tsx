// Pieces shared by the launch-condition screens (encircled flux, mandrel, offset launch): the verdict in words,
// the EF picture against the template, the power per group and the control-point table.
import type { HeadlineLine } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { BarChart, LinePlot, type Series } from '../../ui/Plot';
import { formatFixed, formatNumber, formatQuantity } from '../../ui/format';
import type { EfCheck, EfPointStatus, EncircledFluxCurve, GroupPower, MultimodeFiberSpec } from '../../physics';
import type { ResolvedFiber } from '../../fibers/resolved';

/** The picked fiber as the mode solver wants it. */
export function fiberSpec(f: ResolvedFiber): MultimodeFiberSpec {
  return { profile: f.profile, coreRadiusUm: f.coreRadiusUm, na: f.na, alpha: f.gradedAlpha };
}

const STATUS_WORDS: Record<EfPointStatus, string> = {
  within: 'within',
  'too-little-inside': 'overfilled',
  'too-much-inside': 'underfilled',
};

/** EF value with three decimals: the template's limits are given to four, the bands are ~0.01 wide. */
export function formatEf(v: number | undefined): string {
  return formatFixed(v, 3);
}

/** A template limit as the template prints it: four decimals. */
export function formatLimit(v: number | undefined): string {
  return formatFixed(v, 4);
}

/** The verdict against the template as one headline line. */
export function efVerdictLine(check: EfCheck | undefined, curve: EncircledFluxCurve): HeadlineLine {
  if (!check) {
    const r = Math.round(0.8 * curve.coreRadiusUm);
    const ef = curve.ef[curve.rUm.findIndex((x) => x >= r)] ?? 1;
    return { label: `EF at ${formatQuantity(r, 'µm')}`, value: formatEf(ef), verdict: 'No template here: the one in this app is for 50 µm fiber at 850 and 1300 nm', tone: 'info' };
  }
  const at = check.points.find((p) => p.radiusUm === check.decidingRadiusUm) ?? check.points[check.points.length - 1];
  const label = `EF at ${formatQuantity(at.radiusUm, 'µm')}`;
  const template = `${check.template.wavelengthNm} nm template`;
  switch (check.verdict) {
    case 'compliant':
      return { label, value: formatEf(at.ef), verdict: `Compliant with the ${template} at all ${check.points.length} radii, ${formatEf(check.marginEf)} inside the tightest limit`, tone: 'ok' };
    case 'underfilled':
      return { label, value: formatEf(at.ef), verdict: `Underfilled: above ${formatLimit(at.upper)}, reads loss low`, tone: 'bad' };
    case 'overfilled':
      return { label, value: formatEf(at.ef), verdict: `Overfilled: below ${formatLimit(at.lower)}, reads loss high`, tone: 'bad' };
    default:
      return { label, value: formatEf(at.ef), verdict: 'Outside the template both ways (too much at one radius, too little at another)', tone: 'bad' };
  }
}

/** Plain words for a report line. */
export function efVerdictText(check: EfCheck | undefined): string {
  if (!check) return 'no template for this core and wavelength';
  if (check.verdict === 'compliant') return `compliant with the ${check.template.wavelengthNm} nm template`;
  return `${check.verdict} at ${formatQuantity(check.decidingRadiusUm, 'µm')} (${check.template.wavelengthNm} nm template)`;
}

export interface CurveToShow {
  name: string;
  curve: EncircledFluxCurve;
  dashed?: boolean;
}

/** EF(r) of one or more launches with the template's limits at its control radii. */
export function EfPlot({ curves, check, title = 'Encircled flux against radius' }: { curves: CurveToShow[]; check?: EfCheck; title?: string }) {
  const series: Series[] = curves.map((c) => ({ name: c.name, points: c.curve.rUm.map((r, i): [number, number] => [r, c.curve.ef[i]]), dashed: c.dashed }));
  if (check) {
    series.push({ name: 'Template, lower limit', points: check.points.map((p): [number, number] => [p.radiusUm, p.lower]), dashed: true });
    series.push({ name: 'Template, upper limit', points: check.points.map((p): [number, number] => [p.radiusUm, p.upper]), dashed: true });
  }
  const a = curves[0]?.curve.coreRadiusUm ?? 25;
  return (
    <LinePlot
      title={title}
      xLabel="Radius from the core centre (µm)"
      yLabel="Share of the power inside that radius"
      series={series}
      markers={[{ x: a, label: 'core edge' }]}
      yRange={[0, 1]}
    />
  );
}

/** Power per principal mode group as bars (percent). */
export function GroupBars({ groups, title = 'Power in each mode group' }: { groups: GroupPower[]; title?: string }) {
  return (
    <BarChart
      title={title}
      xLabel="Mode group (1 = the fundamental; higher groups travel nearer the core edge)"
      yLabel="Share of the guided power (%)"
      bars={groups.map((g) => ({ label: String(g.principal), value: g.fraction * 100 }))}
      formatValue={(v) => formatNumber(v, 2)}
    />
  );
}

/** The control points: radius, EF, the band, and where it falls. */
export function ControlTable({ check }: { check: EfCheck }) {
  return (
    <DataTable
      caption={`Control radii of the ${check.template.wavelengthNm} nm template for 50 µm fiber`}
      rows={check.points}
      rowKey={(p) => p.radiusUm}
      rowClass={(p) => (p.status === 'within' ? undefined : 'row-bad')}
      columns={[
        { label: 'Radius', cell: (p) => formatQuantity(p.radiusUm, 'µm'), num: true },
        { label: 'EF', cell: (p) => formatEf(p.ef), num: true },
        { label: 'Allowed', cell: (p) => `${formatLimit(p.lower)} to ${formatLimit(p.upper)}`, num: true },
        { label: 'Reading', cell: (p) => STATUS_WORDS[p.status] },
      ]}
    />
  );
}

/** Share of the power in groups up to g (for words such as "82 % in groups 1–2"). */
export function shareUpTo(groups: GroupPower[], g: number): number {
  return groups.filter((x) => x.principal <= g).reduce((s, x) => s + x.fraction, 0);
}

/** Template source line, the same on every screen that judges EF. */
export function templateSource(check: EfCheck | undefined): string {
  return check ? check.template.source : 'no template applies to this core and wavelength';
}
