// The one calculator frame. Every calculator screen is three bands, in this order:
//   1. the headline answer: the number and verdict a technician came for, in an <output> that
//      sticks to the top of the viewport while any input below is edited;
//   2. the few inputs that matter;
//   3. the details (tables, plots, prose), "how this is computed" folded, and the report actions.
// Screens fill the bands; they never lay them out themselves.
import type { ComponentChildren } from 'preact';
import { useEffect, useState } from 'preact/hooks';
import { HowComputed, type HowComputedProps } from './HowComputed';
import { ReportActions } from './ReportActions';
import { CautionLine } from './SafetyNotice';
import type { ReportSpec } from './copyText';

/** How the answer reads at a glance; always said in words too, never by colour alone. */
export type Tone = 'ok' | 'warn' | 'bad' | 'info';

export interface HeadlineLine {
  /** Short label before the value, e.g. "1310 nm". */
  label?: string;
  /** The number with its unit, formatted (see src/ui/format.ts), e.g. "0.065 dB". */
  value?: string;
  /** The verdict in words, e.g. "Fits, 1.2 dB to spare". */
  verdict?: string;
  tone?: Tone;
}

export interface Headline extends HeadlineLine {
  /** Further answers of the same weight (one verdict per wavelength, say). */
  more?: HeadlineLine[];
  /** A default that is not neutral, said next to the answer (e.g. "includes a 3 dB margin"). */
  note?: string;
}

export interface CalcStatus {
  /** True when the headline belongs to earlier inputs (the current ones give no answer). */
  stale?: boolean;
  /** Plain-words reason the current inputs give no answer. */
  error?: string;
  busy?: boolean;
}

export interface CalcScreenProps {
  /** The answer; undefined until there is one. */
  headline: Headline | undefined;
  status: CalcStatus;
  /** The inputs band. */
  inputs: ComponentChildren;
  /** Heading of the inputs band (h2). */
  inputsTitle?: string;
  /** The details band: result cards, tables, plots. */
  children?: ComponentChildren;
  how?: HowComputedProps;
  /** The result as one plain-text report, for copy, share and print; only offered while current. */
  report?: ReportSpec;
  /** Optical power is entered on this screen: a compact caution line with a link to the full cautions. */
  powerCaution?: boolean;
}

/**
 * False in a screen's first render, true once the browser has painted it (Preact runs effects after the
 * paint). The details wait for it: on a slow phone the headline shows first, and tables, plots and
 * mode pictures follow a frame later instead of holding the answer back.
 */
function usePainted(): boolean {
  const [painted, setPainted] = useState(false);
  useEffect(() => setPainted(true), []);
  return painted;
}

export function CalcScreen({ headline, status, inputs, inputsTitle = 'Inputs', children, how, report, powerCaution }: CalcScreenProps) {
  const painted = usePainted();
  return (
    <div class="calc">
      <HeadlineBar headline={headline} status={status} />
      {powerCaution && <CautionLine />}
      <section class="calc-inputs" aria-labelledby="calc-inputs-title">
        <h2 id="calc-inputs-title">{inputsTitle}</h2>
        {inputs}
      </section>
      {children && (
        <div class="calc-details" aria-busy={painted ? undefined : 'true'}>
          {painted && children}
        </div>
      )}
      {how && <HowComputed {...how} />}
      {report && !status.stale && <ReportActions report={report} />}
    </div>
  );
}

/** The answer strip: an <output> (a polite live region), pinned to the top while inputs are edited. */
export function HeadlineBar({ headline, status }: { headline: Headline | undefined; status: CalcStatus }) {
  const lines = headline ? [headline, ...(headline.more ?? [])] : [];
  return (
    <div class={`answer-bar${status.stale ? ' is-stale' : ''}`}>
      <output class="headline" aria-live="polite" aria-atomic="true" aria-busy={status.busy ? 'true' : undefined}>
        {lines.length > 0 ? (
          lines.map((l, i) => <AnswerLine key={i} line={l} />)
        ) : (
          <span class="answer-empty">{status.busy ? 'Working…' : status.error ? 'No answer yet.' : 'No answer yet: fill in the values below.'}</span>
        )}
        {status.stale && lines.length > 0 && <span class="answer-stale">Not current: for earlier values.</span>}
        {status.error && <span class="answer-error">⚠ {status.error}</span>}
        {headline?.note && <span class="answer-note">{headline.note}</span>}
      </output>
    </div>
  );
}

function AnswerLine({ line }: { line: HeadlineLine }) {
  const tone = line.tone ?? 'info';
  return (
    <span class={`answer-line tone-${tone}`}>
      {line.label && <span class="answer-label">{line.label}</span>}
      {line.value && <span class="answer-value num">{line.value}</span>}
      {line.verdict && (
        <span class="answer-verdict">
          <span aria-hidden="true">{TONE_MARK[tone]}</span>
          {line.verdict}
        </span>
      )}
    </span>
  );
}

/** A symbol beside the words, so the state never rests on colour (sunlight, grey print, colour vision). */
const TONE_MARK: Record<Tone, string> = { ok: '✓ ', warn: '! ', bad: '✗ ', info: '' };

/**
 * Prose for a result card, kept short on a phone: the first two sentences show, the rest folds
 * under "More". Trainers open it; the installer reads the two.
 */
export function ShortProse({ text }: { text: string }) {
  const sentences = text.match(/[^.!?]+[.!?]+(?:\s+|$)|[^.!?]+$/g) ?? [text];
  const head = sentences.slice(0, 2).join('').trim();
  const rest = sentences.slice(2).join('').trim();
  return (
    <div class="prose note">
      <p>{head}</p>
      {rest && (
        <details>
          <summary>More on this</summary>
          <p>{rest}</p>
        </details>
      )}
    </div>
  );
}
