import { useState } from 'preact/hooks';
import { reportText, type ReportSpec } from './copyText';

/**
 * Copy as text, share and print for a screen's one report. The report is built once, from the
 * screen's ReportSpec, so the copied text and the shared text are the same document.
 */
export function ReportActions({ report }: { report: ReportSpec }) {
  const [copied, setCopied] = useState<'idle' | 'copied' | 'failed'>('idle');
  const canShare = typeof navigator !== 'undefined' && typeof navigator.share === 'function';
  const text = () => reportText(report);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(text());
      setCopied('copied');
    } catch {
      setCopied('failed');
    }
  };
  const share = () => {
    navigator.share({ title: report.title, text: text() }).catch(() => undefined);
  };
  return (
    <div class="result-actions" role="group" aria-label="Hand the result over">
      <button type="button" onClick={copy}>Copy as text</button>
      {canShare && <button type="button" onClick={share}>Share</button>}
      <button type="button" onClick={() => window.print()}>Print</button>
      {copied === 'copied' && <span role="status">Copied.</span>}
      {copied === 'failed' && (
        <details open>
          <summary>Copying is blocked here: select the text below</summary>
          <textarea readOnly rows={8} value={text()} aria-label="Result as text" />
        </details>
      )}
    </div>
  );
}
