import type { ComponentType } from 'preact';
import { useEffect, useMemo, useRef, useState } from 'preact/hooks';
import { FEATURES, findFeature, GROUP_ORDER, GROUP_TITLES, type FeatureEntry } from '../features/registry';
import { hrefFor, useRoute } from './route';
import { SafetyReminder } from '../ui/SafetyNotice';
import { ThemeSwitch } from '../ui/ThemeSwitch';
import { APP_BUILD, APP_VERSION } from './version';
import { UpdatePrompt } from '../pwa/UpdatePrompt';
import { matchesFilter, readRecent, rememberUse } from './recent';

/** Screens already loaded, by feature id: coming back to a screen draws it at once. */
const loadedScreens = new Map<string, ComponentType>();

type ScreenLoad = { state: 'ready'; Screen: ComponentType } | { state: 'loading' } | { state: 'failed' };

/**
 * The feature's screen, loaded on first use (each screen is its own chunk). Written here rather than
 * taken from preact/compat's lazy and Suspense: importing compat installs hooks that rewrite the props of
 * every element Preact renders, on every render, which cost a phone a fifth of each key's work.
 */
function useScreen(feature: FeatureEntry | undefined): ScreenLoad | undefined {
  const [, setVersion] = useState(0);
  const [failed, setFailed] = useState<string | undefined>(undefined);
  const id = feature?.id;
  useEffect(() => {
    if (!feature || loadedScreens.has(feature.id)) return;
    let current = true;
    feature.load().then(
      (m) => {
        loadedScreens.set(feature.id, m.default);
        if (current) setVersion((v) => v + 1);
      },
      () => current && setFailed(feature.id),
    );
    return () => {
      current = false;
    };
  }, [id]);
  if (!feature) return undefined;
  const Screen = loadedScreens.get(feature.id);
  if (Screen) return { state: 'ready', Screen };
  return failed === feature.id ? { state: 'failed' } : { state: 'loading' };
}

export function App() {
  const route = useRoute();
  const feature = findFeature(route);
  const screen = useScreen(feature);
  const main = useRef<HTMLElement>(null);
  useEffect(() => {
    document.title = feature ? `${feature.title} — Modewright` : 'Modewright — fiber field calculator';
    if (feature) rememberUse(feature.id);
    main.current?.focus({ preventScroll: true });
  }, [feature]);
  return (
    <div class="frame">
      <header class="topbar">
        <a class="brand" href={hrefFor('')} aria-label="Modewright: all tools">
          Modewright
        </a>
        <span class="spacer" />
        <ThemeSwitch />
      </header>
      <SafetyReminder />
      <main id="main" ref={main} tabIndex={-1} class="main">
        {screen?.state === 'ready' ? (
          <>
            <h1 class="screen-title">{feature!.title}</h1>
            <screen.Screen />
          </>
        ) : screen?.state === 'loading' ? (
          <p class="loading">Loading…</p>
        ) : screen?.state === 'failed' ? (
          <p role="alert">This screen could not be loaded. Connect once and reload the page; after that it works offline.</p>
        ) : (
          <Home unknown={route !== '' && !feature ? route : undefined} />
        )}
      </main>
      <footer class="footer note">
        Modewright {APP_VERSION} · build <span data-build-id>{APP_BUILD}</span> · works offline once loaded · no data leaves this device
      </footer>
      <UpdatePrompt />
    </div>
  );
}

function FeatureLink({ f }: { f: FeatureEntry }) {
  return (
    <li>
      <a class="feature-link" href={hrefFor(f.id)}>
        <span class="feature-title">{f.title}</span>
        <span class="feature-summary">{f.summary}</span>
      </a>
    </li>
  );
}

/** Home: the last tools used on top, a filter that finds a tool by any word, then the tools by situation. */
function Home({ unknown }: { unknown?: string }) {
  const [filter, setFilter] = useState('');
  const recent = useMemo(() => readRecent().map(findFeature).filter((f): f is FeatureEntry => f !== undefined), []);
  const shown = useMemo(() => FEATURES.filter((f) => matchesFilter(f, filter)), [filter]);
  const groups = GROUP_ORDER.map((g) => [g, shown.filter((f) => f.group === g)] as const).filter(([, list]) => list.length > 0);
  return (
    <div class="home">
      <h1 class="screen-title">Field calculator</h1>
      {unknown && <p role="alert">There is no screen called “{unknown}”. Pick one below.</p>}
      <div class="field home-filter">
        <label for="tool-filter">Find a tool</label>
        <input id="tool-filter" type="search" inputMode="search" autoComplete="off" placeholder="splice, budget, PON…" value={filter} onInput={(e) => setFilter((e.currentTarget as HTMLInputElement).value)} />
      </div>
      {filter.trim() === '' && recent.length > 0 && (
        <section aria-labelledby="grp-recent">
          <h2 id="grp-recent">Used last</h2>
          <ul class="feature-list">
            {recent.map((f) => <FeatureLink key={f.id} f={f} />)}
          </ul>
        </section>
      )}
      {groups.length === 0 && <p role="status">No tool matches “{filter.trim()}”. Try another word, such as loss, splice or budget.</p>}
      {groups.map(([g, list]) => (
        <section key={g} aria-labelledby={`grp-${g}`}>
          <h2 id={`grp-${g}`}>{GROUP_TITLES[g]}</h2>
          <ul class="feature-list">
            {list.map((f) => <FeatureLink key={f.id} f={f} />)}
          </ul>
        </section>
      ))}
    </div>
  );
}
