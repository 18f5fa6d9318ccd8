export interface HowComputedProps {
  /** The formula's name and, where short, its form. */
  formula: string;
  /** Published source, short form (full entry in REFERENCES.md). */
  source: string;
  assumptions: string[];
  /** Where it stops being valid. */
  validity: string;
}

/** "How this is computed": the formula, its source, its assumptions and its limits. */
export function HowComputed({ formula, source, assumptions, validity }: HowComputedProps) {
  return (
    <details class="how-computed">
      <summary>How this is computed</summary>
      <dl class="kv">
        <dt>Formula</dt>
        <dd>{formula}</dd>
        <dt>Source</dt>
        <dd>{source}</dd>
        <dt>Assumes</dt>
        <dd>
          <ul>{assumptions.map((a) => <li key={a}>{a}</li>)}</ul>
        </dd>
        <dt>Valid</dt>
        <dd>{validity}</dd>
      </dl>
    </details>
  );
}
