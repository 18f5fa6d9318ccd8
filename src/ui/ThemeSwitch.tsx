import { useEffect, useState } from 'preact/hooks';

type ThemeChoice = 'system' | 'light' | 'dark';
const KEY = 'modewright.theme';
const NEXT: Record<ThemeChoice, ThemeChoice> = { system: 'light', light: 'dark', dark: 'system' };
const LABEL: Record<ThemeChoice, string> = { system: 'Theme: auto', light: 'Theme: day', dark: 'Theme: dark' };

function readChoice(): ThemeChoice {
  try {
    const v = localStorage.getItem(KEY);
    return v === 'light' || v === 'dark' ? v : 'system';
  } catch {
    return 'system'; // storage can be off (private mode, blocked): follow the system
  }
}

/** Follows the system colour scheme unless the person picks daylight or dark by hand. */
export function ThemeSwitch() {
  const [choice, setChoice] = useState<ThemeChoice>(readChoice);
  useEffect(() => {
    const root = document.documentElement;
    if (choice === 'system') delete root.dataset.theme;
    else root.dataset.theme = choice;
    try {
      localStorage.setItem(KEY, choice);
    } catch {
      /* not remembered, still applied */
    }
  }, [choice]);
  return (
    <button type="button" class="theme-switch" onClick={() => setChoice(NEXT[choice])} aria-label={`${LABEL[choice]}: change theme`}>
      {LABEL[choice]}
    </button>
  );
}
