import { APP_BUILD, APP_VERSION } from '../app/version';

export interface ReportSpec {
  title: string;
  inputs: [label: string, value: string][];
  outputs: [label: string, value: string][];
  assumptions?: string[];
  /** Defaults to now; tests pass a fixed date. */
  date?: Date;
}

/**
 * A result as plain text for a report or a message: inputs, outputs, assumptions,
 * date and app version. Plain text only, so it pastes cleanly anywhere.
 */
export function reportText(spec: ReportSpec): string {
  const date = (spec.date ?? new Date()).toISOString().replace('T', ' ').slice(0, 16) + ' UTC';
  const lines = [spec.title, '='.repeat(Math.min(60, spec.title.length)), '', 'Inputs'];
  for (const [k, v] of spec.inputs) lines.push(`  ${k}: ${v}`);
  lines.push('', 'Results');
  for (const [k, v] of spec.outputs) lines.push(`  ${k}: ${v}`);
  if (spec.assumptions && spec.assumptions.length > 0) {
    lines.push('', 'Assumptions');
    for (const a of spec.assumptions) lines.push(`  - ${a}`);
  }
  lines.push('', `Computed ${date} with Modewright ${APP_VERSION} (build ${APP_BUILD}).`);
  lines.push('Laser safety: never look into a fiber end or connector; follow your site’s laser-safety rules and local codes.');
  // Plain text pastes anywhere: the no-break spaces that keep numbers whole on screen become spaces.
  return lines.join('\n').replace(/[\u00a0\u202f]/g, ' ');
}
