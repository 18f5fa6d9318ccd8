// The home screen's memory: the last three tools used, most recent first, and the filter that
// finds a tool by any word of its title or summary. Stored in localStorage; private mode or a
// full store simply means nothing is remembered.
import type { FeatureEntry } from '../features/registry';

const KEY = 'modewright.recentTools';
export const RECENT_COUNT = 3;

export function readRecent(): string[] {
  try {
    const raw: unknown = JSON.parse(globalThis.localStorage?.getItem(KEY) ?? '[]');
    return Array.isArray(raw) ? raw.filter((x): x is string => typeof x === 'string').slice(0, RECENT_COUNT) : [];
  } catch {
    return [];
  }
}

export function rememberUse(id: string): void {
  try {
    const next = [id, ...readRecent().filter((x) => x !== id)].slice(0, RECENT_COUNT);
    globalThis.localStorage?.setItem(KEY, JSON.stringify(next));
  } catch {
    /* not remembered */
  }
}

/** Folds case and accents, so "modo" finds "Modo" and "reflexión" finds "reflexion". */
function fold(s: string): string {
  return s.normalize('NFD').replace(/[\u0300-\u036f]/g, '').toLowerCase();
}

/** Every word typed must start a word of the title or summary (or the group's own words). */
export function matchesFilter(f: Pick<FeatureEntry, 'title' | 'summary'> & { keywords?: string }, filter: string): boolean {
  const words = fold(filter).split(/[^\p{L}\p{N}.]+/u).filter(Boolean);
  if (words.length === 0) return true;
  const hay = fold(`${f.title} ${f.summary} ${f.keywords ?? ''}`).split(/[^\p{L}\p{N}.]+/u).filter(Boolean);
  return words.every((w) => hay.some((h) => h.startsWith(w)));
}
