import { lazy, Suspense } from 'preact/compat';
import { useEffect, useMemo, useRef } from 'preact/hooks';
import { FEATURES, findFeature, GROUP_TITLES, type FeatureGroup } from '../features/registry';
import { hrefFor, useRoute } from './route';
import { SafetyReminder } from '../ui/SafetyNotice';
import { ThemeSwitch } from '../ui/ThemeSwitch';
import { APP_BUILD, APP_VERSION } from './version';
import { UpdatePrompt } from '../pwa/UpdatePrompt';

const screens = new Map(FEATURES.map((f) => [f.id, lazy(f.load)]));

export function App() {
  const route = useRoute();
  const feature = findFeature(route);
  const Screen = feature ? screens.get(feature.id) : undefined;
  const main = useRef<HTMLElement>(null);
  useEffect(() => {
    document.title = feature ? `${feature.title} — Modewright` : 'Modewright — fiber field calculator';
    main.current?.focus({ preventScroll: true });
  }, [feature]);
  return (
    <div class="frame">
      <header class="topbar">
        <a class="brand" href={hrefFor('')}>Modewright</a>
        {feature ? <span class="topbar-title">{feature.title}</span> : <span class="spacer" />}
        <ThemeSwitch />
      </header>
      <SafetyReminder />
      <main id="main" ref={main} tabIndex={-1} class="main">
        {Screen ? (
          <Suspense fallback={<p class="loading">Loading…</p>}>
            <h1 class="screen-title">{feature!.title}</h1>
            <Screen />
          </Suspense>
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

function Home({ unknown }: { unknown?: string }) {
  const groups = useMemo(() => {
    const m = new Map<FeatureGroup, typeof FEATURES>();
    for (const f of FEATURES) m.set(f.group, [...(m.get(f.group) ?? []), f]);
    return [...m.entries()];
  }, []);
  return (
    <div class="home">
      <h1 class="screen-title">Field calculator</h1>
      {unknown && <p role="alert">There is no screen called “{unknown}”. Pick one below.</p>}
      {groups.map(([g, list]) => (
        <section key={g} aria-labelledby={`grp-${g}`}>
          <h2 id={`grp-${g}`}>{GROUP_TITLES[g]}</h2>
          <ul class="feature-list">
            {list.map((f) => (
              <li key={f.id}>
                <a class="feature-link" href={hrefFor(f.id)}>
                  <span class="feature-title">{f.title}</span>
                  <span class="feature-summary">{f.summary}</span>
                </a>
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
