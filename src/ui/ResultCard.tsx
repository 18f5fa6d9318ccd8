import type { ComponentChildren } from 'preact';

export interface ResultCardProps {
  title: string;
  /** True when the shown result belongs to earlier inputs. */
  stale?: boolean;
  /** Plain-words reason this card has no result for the current inputs (not repeated from the headline). */
  error?: string;
  busy?: boolean;
  /** @deprecated Screens not yet on CalcScreen: the old per-card copy button. CalcScreen's `report` replaces it. */
  copyText?: string;
  children?: ComponentChildren;
}

/**
 * A block of details below the headline answer, with its state said in words: current,
 * not current, or working. The headline (CalcScreen) carries the answer and the report actions.
 */
export function ResultCard({ title, stale, error, busy, copyText, children }: ResultCardProps) {
  const hasBody = children !== undefined && children !== null && children !== false;
  return (
    <section class={`result-card${stale ? ' is-stale' : ''}`} aria-label={title} aria-busy={busy ? 'true' : undefined}>
      <h2>{title}</h2>
      {busy && <p class="status status-busy" role="status">Working…</p>}
      {error && (
        <p class="status status-error">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
      {stale && hasBody && <p class="status status-stale">Not current: for earlier values.</p>}
      {hasBody ? <div class="result-body">{children}</div> : !error && !busy && <p class="status">No result yet.</p>}
      {copyText && hasBody && !stale && (
        <div class="result-actions">
          <button type="button" onClick={() => void navigator.clipboard.writeText(copyText).catch(() => undefined)}>Copy as text</button>
        </div>
      )}
    </section>
  );
}
