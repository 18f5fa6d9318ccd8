// Hash routing: #/ is home, #/<feature-id> a calculator. Hash routes keep every screen
// under the one precached index.html, so deep links and the back button work offline.
import { useEffect, useState } from 'preact/hooks';

export function currentRoute(): string {
  const h = typeof location === 'undefined' ? '' : location.hash;
  return h.replace(/^#\/?/, '').split('?')[0] ?? '';
}

export function useRoute(): string {
  const [route, setRoute] = useState(currentRoute);
  useEffect(() => {
    const onHash = () => setRoute(currentRoute());
    window.addEventListener('hashchange', onHash);
    return () => window.removeEventListener('hashchange', onHash);
  }, []);
  return route;
}

export function hrefFor(id: string): string {
  return id ? `#/${id}` : '#/';
}
