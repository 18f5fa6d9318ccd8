import type { ComponentChildren } from 'preact';
import { useState } from 'preact/hooks';

export interface ResultCardProps {
  title: string;
  /** True when the shown result belongs to earlier inputs. */
  stale?: boolean;
  /** Plain-words reason the current inputs give no result. */
  error?: string;
  busy?: boolean;
  /** Plain-text form of the result (reportText) for copy and share. */
  copyText?: string;
  children?: ComponentChildren;
}

/** A result with its state said in words: current, not current (with the reason), or working. */
export function ResultCard({ title, stale, error, busy, copyText, children }: ResultCardProps) {
  const [copied, setCopied] = useState<'idle' | 'copied' | 'failed'>('idle');
  const hasBody = children !== undefined && children !== null && children !== false;
  const canShare = typeof navigator !== 'undefined' && typeof navigator.share === 'function';
  const copy = async () => {
    if (!copyText) return;
    try {
      await navigator.clipboard.writeText(copyText);
      setCopied('copied');
    } catch {
      setCopied('failed');
    }
  };
  const share = () => {
    if (copyText) navigator.share({ title, text: copyText }).catch(() => undefined);
  };
  return (
    <section class={`result-card${stale ? ' is-stale' : ''}`} aria-label={title} aria-busy={busy ? 'true' : undefined}>
      <h2>{title}</h2>
      {busy && <p class="status status-busy" role="status">Working…</p>}
      {error && (
        <p class="status status-error" role="alert">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
      {stale && hasBody && <p class="status status-stale">Not current: this is the last good result, for earlier values.</p>}
      {hasBody ? <div class="result-body">{children}</div> : !error && !busy && <p class="status">No result yet.</p>}
      {copyText && hasBody && !stale && (
        <div class="result-actions">
          <button type="button" onClick={copy}>Copy as text</button>
          {canShare && <button type="button" onClick={share}>Share</button>}
          <button type="button" onClick={() => window.print()}>Print</button>
          {copied === 'copied' && <span role="status">Copied.</span>}
          {copied === 'failed' && (
            <details open>
              <summary>Copying is blocked here: select the text below</summary>
              <textarea readOnly rows={8} value={copyText} aria-label="Result as text" />
            </details>
          )}
        </div>
      )}
    </section>
  );
}
