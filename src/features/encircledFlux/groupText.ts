// Typed power per mode group ("1, 1, 0.5"), read for the encircled-flux screen with errors in the field's own words.

/** Parses "1, 1, 0.5" into powers of groups 1, 2, 3; undefined with a reason when it cannot. */
export function parseGroupPowers(text: string): { groupPowers?: { principal: number; power: number }[]; error?: string } {
  const parts = text.trim().split(/[\s;,]+/).filter((s) => s !== '');
  if (parts.length === 0) return { error: 'Power in each group: type one number per group, such as 1, 1, 0.5.' };
  if (parts.length > 100 || text.length > 600) return { error: 'Power in each group: type at most 100 numbers.' };
  const groupPowers: { principal: number; power: number }[] = [];
  for (let i = 0; i < parts.length; i++) {
    const v = /^(\d+(\.\d*)?|\.\d+)$/.test(parts[i]) ? Number(parts[i]) : Number.NaN;
    if (!Number.isFinite(v)) return { error: `Power in each group: “${parts[i].slice(0, 12)}” (group ${i + 1}) is not a number ≥ 0; type numbers such as 1, 1, 0.5.` };
    groupPowers.push({ principal: i + 1, power: v });
  }
  if (!groupPowers.some((g) => g.power > 0)) return { error: 'Power in each group: at least one group needs some power.' };
  return { groupPowers };
}
