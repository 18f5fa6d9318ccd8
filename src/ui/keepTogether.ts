// A number and its unit never part. Text built from data (fiber notes, reasons, assumptions, prose)
// says "1260 nm" with an ordinary space, where a narrow screen may break the line. One rule, applied
// once to every text node Preact renders: the space between a number and a unit that follows it
// becomes a no-break space. Formatted values (src/ui/format.ts) already carry one.
import { options } from 'preact';

/** Units the app writes after a number (the trade's symbols), longest first so "dBm" wins over "dB". */
const UNITS = ['dB/km', 'dBm', 'dB', 'nm', 'µm', 'μm', 'um', 'mm', 'cm', 'km', 'm', 'mW', 'µW', 'nW', 'W', 'THz', 'GHz', 'MHz', 'ps/√km', 'ps', 'ns', 'µs', '%', '°', 'turns?', 'Gb/s', 'Mb/s', 'dB/turn'];
const UNIT_AFTER_SPACE = new RegExp(`(\\d)[ \\u2009](?=(?:${UNITS.map((u) => u.replace(/[/]/g, '\\/')).join('|')})(?![\\p{L}\\d]))`, 'gu');

/** "0.1 / 0.3 / 0.5 dB": the slashes of a spread stay with their numbers. */
const SPREAD = /(\d) \/ (?=[\d−-])/g;

/** Both rules need a digit then an ordinary or thin space; most texts have none and are returned as they are. */
const DIGIT_THEN_SPACE = /\d[ \u2009]/;

export function keepNumbersWithUnits(text: string): string {
  if (!DIGIT_THEN_SPACE.test(text)) return text;
  return text.replace(UNIT_AFTER_SPACE, '$1\u00a0').replace(SPREAD, '$1\u00a0/\u00a0');
}

let installed = false;

/**
 * Texts already kept together, by their text as written. Every render makes each text vnode anew, and
 * the Unicode-aware rule above is slow next to a lookup: on a phone it was a third of a key's script time.
 * Cleared when full: the texts of one screen are a few hundred.
 */
const kept = new Map<string, string>();
const KEPT_MAX = 2000;

function keptTogether(text: string): string {
  let out = kept.get(text);
  if (out === undefined) {
    if (kept.size >= KEPT_MAX) kept.clear();
    out = keepNumbersWithUnits(text);
    kept.set(text, out);
  }
  return out;
}

/** Installs the rule on Preact's vnode hook (once); text vnodes carry their string as props. */
export function installKeepTogether(): void {
  if (installed) return;
  installed = true;
  const previous = options.vnode;
  options.vnode = (vnode) => {
    if (vnode.type === null && typeof vnode.props === 'string') {
      (vnode as unknown as { props: string }).props = keptTogether(vnode.props);
    }
    previous?.(vnode);
  };
}
