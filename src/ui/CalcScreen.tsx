// The one calculator frame. Every calculator screen is three bands, in this order:
//   1. the headline answer: the number and verdict a technician came for, in an <output> that
//      sticks to the top of the viewport while any input below is edited;
//   2. the few inputs that matter;
//   3. the details (tables, plots, prose), "how this is computed" folded, and the report actions.
// Screens fill the bands; they never lay them out themselves.
import type { ComponentChildren } from 'preact';
import { useEffect, useLayoutEffect, useRef, useState } from 'preact/hooks';
import { HowComputed, type HowComputedProps } from './HowComputed';
import { ReportActions } from './ReportActions';
import { rendersAlike } from './rendersAlike';
import { sentences } from './sentences';
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
 * The details band, brought up to date a card or a few at a time, each step in its own task after a frame.
 *
 * A key typed in a field re-renders the screen. Drawing every table and plot below the inputs in that
 * same task, and laying them out in the frame after, took 50–180 ms on a slow phone: the field lagged
 * behind the thumb. So the band keeps showing what it showed, and catches up card by card once the
 * headline and the field have painted: each step's drawing and its layout fit in a short task (a step
 * takes as many cards as the last step's cost says fit in STEP_BUDGET_MS), and a newer key starts the
 * catching-up again from the first card that differs. The first load works the same way, so the
 * headline paints before any detail.
 *
 * A card the screen made anew from unchanged data (every key re-renders the screen; a worker's result
 * changes only when typing pauses) is left as it is: `rendersAlike` compares it with what is shown, and
 * the old vnode, kept, is skipped by Preact without rendering it.
 * `aria-busy` stays on the band while it is behind, for screen readers and for every test that waits
 * for a settled screen.
 */
/**
 * Drawing time (script) a step of the band aims at. A card that costs more goes alone; cheaper cards go
 * together, so a fast phone (or a desktop) brings the whole band up in one or two steps, not one per card.
 */
const STEP_BUDGET_MS = 8;

function DetailsBand({ children }: { children: ComponentChildren }) {
  // Slots by position: `{r && <Card/>}` keeps its place as false while there is no result.
  const target: ComponentChildren[] = Array.isArray(children) ? children : [children];
  const [shown, setShown] = useState<ComponentChildren[]>([]);
  // A card and what is shown in its slot are compared once: the band renders again after every step with the
  // same cards, and the step compares them too. A deep compare of a big card's data, repeated, was the costliest
  // script of a key on a table-heavy screen.
  const compared = useRef(new WeakMap<object, { shown: ComponentChildren; alike: boolean }>());
  const alike = (card: ComponentChildren, now: ComponentChildren): boolean => {
    if (typeof card !== 'object' || card === null) return rendersAlike(card, now);
    const last = compared.current.get(card);
    if (last && last.shown === now) return last.alike;
    const answer = rendersAlike(card, now);
    compared.current.set(card, { shown: now, alike: answer });
    return answer;
  };
  const behind = target.length !== shown.length || target.some((c, i) => !alike(c, shown[i]));
  // What a card cost to draw on the last step: from the step's start to its commit (layout effects run then).
  const cost = useRef({ startedMs: 0, cards: 0, msPerCard: Infinity });

  useLayoutEffect(() => {
    const c = cost.current;
    if (c.startedMs === 0) return;
    c.msPerCard = (performance.now() - c.startedMs) / Math.max(1, c.cards);
    c.startedMs = 0;
  });

  useEffect(() => {
    if (!behind) return;
    let timer: ReturnType<typeof setTimeout> | undefined;
    // After the next frame (the one that paints what has just changed), in a task of its own.
    const frame = requestAnimationFrame(() => {
      timer = setTimeout(() => {
        const c = cost.current;
        const cards = Math.max(1, Math.floor(STEP_BUDGET_MS / c.msPerCard));
        c.startedMs = performance.now();
        setShown((now) => {
          const next = nextStep(now, target, alike, cards);
          c.cards = next.taken;
          return next.shown;
        });
      }, 0);
    });
    return () => {
      cancelAnimationFrame(frame);
      if (timer !== undefined) clearTimeout(timer);
    };
  });

  return (
    <div class="calc-details" aria-busy={behind ? 'true' : undefined}>
      {shown}
    </div>
  );
}

/**
 * `now` with up to `cards` of its slots that draw differently from `target` taken from `target`, in order;
 * cut to length once all match. A slot the screen made anew from the same data keeps its old vnode, which
 * Preact skips.
 */
function nextStep(
  now: ComponentChildren[],
  target: ComponentChildren[],
  alike: (card: ComponentChildren, shown: ComponentChildren) => boolean,
  cards: number,
): { shown: ComponentChildren[]; taken: number } {
  const next = now.slice(0, target.length);
  let taken = 0;
  for (let i = 0; i < target.length && taken < cards; i++) {
    if (alike(target[i], now[i])) continue;
    next[i] = target[i];
    taken++;
  }
  return { shown: taken === 0 && next.length === now.length ? now : next, taken };
}

export function CalcScreen({ headline, status, inputs, inputsTitle = 'Inputs', children, how, report, powerCaution }: CalcScreenProps) {
  return (
    <div class="calc">
      <HeadlineBar headline={headline} status={status} />
      {powerCaution && <CautionLine />}
      <section class="calc-inputs" aria-labelledby="calc-inputs-title">
        <h2 id="calc-inputs-title">{inputsTitle}</h2>
        {inputs}
      </section>
      {children && <DetailsBand>{children}</DetailsBand>}
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
  const all = sentences(text);
  const head = all.slice(0, 2).join('').trim();
  const rest = all.slice(2).join('').trim();
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
