// Hostile text and the Content-Security-Policy, in real Chromium on the production build.
// A backup file is the one way data from elsewhere enters the app: names and notes in it that
// look like markup or script must only ever be shown as text, never run. And should anything
// slip past that, the built page's policy must refuse to run script that is not a file of the app.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { BUILDS, closedAfterEach, waitForScreen } from './harness';
import { BACKUP_FORMAT_ID, BACKUP_FORMAT_VERSION } from '../../src/fibers/backup';

const { serve, profile } = closedAfterEach();



type Flags = { __pwned?: unknown; __inline?: unknown; __attr?: unknown; __eval?: unknown };

function flag(page: Page, name: keyof Flags): Promise<unknown> {
  return page.evaluate((n) => (window as unknown as Flags)[n], name);
}

/** Elements that would exist only if hostile text had been parsed as markup. */
function parsedMarkupCount(page: Page): Promise<number> {
  return page.evaluate(
    () => document.querySelectorAll('main img[src="x"], main script, main [onerror], main [onmouseover], main b').length,
  );
}

// The two classic payloads: an event-handler attribute, and a script element.
const IMG_PAYLOAD = '<img src=x onerror="window.__pwned=1">';
const SCRIPT_PAYLOAD = '<script>window.__pwned=1</script>';
// Names the library accepts (no tag) but that would break out of an attribute or decode as an
// entity if a name were ever pasted into markup.
const QUOTE_NAME = 'Drum 7" onmouseover="window.__pwned=1';
const ENTITY_NAME = 'Splice tray &lt;b&gt;bold&lt;/b&gt; & <3';
const HOSTILE_NOTES = `${IMG_PAYLOAD}${SCRIPT_PAYLOAD}<b>bold</b>`;

function hostileBackup(): string {
  const t = Date.UTC(2026, 2, 1);
  const base = { profile: 'step', coreDiameterUm: 9, claddingDiameterUm: 125, na: 0.13, attenuation: [], createdAt: t, updatedAt: t };
  return JSON.stringify({
    format: BACKUP_FORMAT_ID,
    formatVersion: BACKUP_FORMAT_VERSION,
    exportedAt: new Date(t).toISOString(),
    appVersion: 'crafted',
    recordCount: 4,
    records: [
      { ...base, id: 'x_img', name: IMG_PAYLOAD, notes: '' },
      { ...base, id: 'x_script', name: SCRIPT_PAYLOAD, notes: '' },
      { ...base, id: 'x_quote', name: QUOTE_NAME, notes: HOSTILE_NOTES, na: 0.14 },
      { ...base, id: 'x_entity', name: ENTITY_NAME, notes: '', coreDiameterUm: 50, na: 0.2 },
    ],
  });
}

describe('names and notes from an imported file are shown as text', () => {
  it('markup and script in a backup are shown verbatim in the import preview, the library list and the fiber picker, and never run', async () => {
    const server = await serve();
    const p = await profile();
    const errors: string[] = [];
    p.page.on('pageerror', (e) => errors.push(e.message));
    await p.page.goto(`${server.url}#/library`);
    await waitForScreen(p.page);
    await p.page.locator('#lib-saved').waitFor();

    await p.page.locator('.backup input[type="file"]').setInputFiles({ name: 'crafted.json', mimeType: 'application/json', buffer: Buffer.from(hostileBackup()) });
    const preview = p.page.locator('.import-preview');
    await preview.waitFor();
    // Names that look like markup are refused (validate.ts), and the refusal quotes them as text.
    const refused = await preview.locator('details li').allTextContents();
    expect(refused).toHaveLength(2);
    expect(refused[0]).toContain(`Fiber type 1 (“${IMG_PAYLOAD}”)`);
    expect(refused[1]).toContain(`Fiber type 2 (“${SCRIPT_PAYLOAD}”)`);
    expect(await parsedMarkupCount(p.page)).toBe(0);

    await p.page.getByRole('button', { name: 'Import 2 types' }).click();
    await p.page.getByText('Imported: 2 fiber types written.').waitFor();
    const names = p.page.locator('.fiber-list .fiber-name');
    expect(await names.allTextContents()).toEqual([QUOTE_NAME, ENTITY_NAME]);
    expect(await p.page.locator('.fiber-list .fiber-notes').allTextContents()).toEqual([HOSTILE_NOTES]);
    // The name reaches attributes as a whole value, not as markup: the quote did not close one.
    expect(await p.page.getByRole('button', { name: `Edit ${QUOTE_NAME}`, exact: true }).getAttribute('aria-label')).toBe(`Edit ${QUOTE_NAME}`);
    for (const n of await names.all()) await n.hover();
    await p.page.locator('.fiber-list .fiber-notes').hover();
    expect(await parsedMarkupCount(p.page)).toBe(0);

    // The fiber picker's saved list on a calculator.
    await p.page.evaluate(() => (location.hash = '#/single-mode'));
    await waitForScreen(p.page);
    // The chosen fiber is folded to one line: tap it open, as a person would.
    await p.page.locator('main details.fiber-picker > summary').first().click();
    await p.page.locator('#single-mode-source').selectOption('saved');
    const options = p.page.locator('#single-mode-saved option');
    await options.first().waitFor({ state: 'attached' });
    expect(await options.allTextContents()).toEqual([QUOTE_NAME, ENTITY_NAME]);
    expect(await options.evaluateAll((os) => os.map((o) => o.childElementCount))).toEqual([0, 0]);
    await p.page.locator('#single-mode-saved').selectOption({ label: QUOTE_NAME });
    // The one-line summary of the chosen fiber shows the name as text too.
    await expect.poll(() => p.page.locator('main details.fiber-picker .picker-line .user-text').first().textContent()).toBe(QUOTE_NAME);
    expect(await p.page.locator('main').textContent()).not.toMatch(/NaN|Infinity/);
    expect(await parsedMarkupCount(p.page)).toBe(0);

    // Time for a failed image load or a deferred handler to fire, had anything been parsed.
    await p.page.waitForTimeout(500);
    expect(await flag(p.page, '__pwned')).toBeUndefined();
    expect(errors).toEqual([]);
  });
});

describe('the content-security policy is enforced', () => {
  function builtPolicy(): Map<string, string[]> {
    const html = readFileSync(join(BUILDS.current, 'index.html'), 'utf8');
    const content = /<meta\s+http-equiv="Content-Security-Policy"\s+content="([^"]+)"/.exec(html)?.[1];
    expect(content, 'a CSP meta element in the built index.html').toBeDefined();
    return new Map(
      content!
        .split(';')
        .map((d) => d.trim().split(/\s+/))
        .filter((t) => t[0])
        .map((t) => [t[0], t.slice(1)]),
    );
  }

  it("the built page's policy allows script only from the app's own files: script-src 'self', no 'unsafe-inline', no 'unsafe-eval'", () => {
    const policy = builtPolicy();
    expect(policy.get('script-src')).toEqual(["'self'"]);
    for (const [directive, sources] of policy) {
      expect(sources, directive).not.toContain("'unsafe-inline'");
      expect(sources, directive).not.toContain("'unsafe-eval'");
    }
    expect(policy.get('object-src')).toEqual(["'none'"]);
  });

  it('a script element, an inline event handler and eval, injected at run time, do not run, and the browser reports each violation', async () => {
    const server = await serve();
    const p = await profile();
    await p.page.goto(`${server.url}#/`);
    await waitForScreen(p.page);
    await p.page.evaluate(() => {
      const w = window as unknown as { __violations: string[] };
      w.__violations = [];
      document.addEventListener('securitypolicyviolation', (e) => w.__violations.push(e.effectiveDirective));
    });

    const evalResult = await p.page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'window.__inline = 1';
      document.body.appendChild(s);
      const img = document.createElement('img');
      img.setAttribute('onerror', 'window.__attr = 1');
      img.src = 'x'; // not found: the error event fires, and its inline handler must not run
      document.body.appendChild(img);
      // DevTools' own evaluation is exempt from the policy, so eval is tried from a timer task,
      // where it runs as the page's code would.
      return new Promise<string>((resolve) =>
        setTimeout(() => {
          try {
            // eslint-disable-next-line no-eval -- the point of the test: the policy must refuse it
            (0, eval)('window.__eval = 1');
            resolve('ran');
          } catch (e) {
            resolve((e as Error).name);
          }
        }),
      );
    });

    const violations = () => p.page.evaluate(() => (window as unknown as { __violations: string[] }).__violations);
    await expect.poll(violations).toEqual(expect.arrayContaining(['script-src-elem', 'script-src-attr', 'script-src']));
    expect(evalResult).toBe('EvalError');
    expect(await flag(p.page, '__inline')).toBeUndefined();
    expect(await flag(p.page, '__attr')).toBeUndefined();
    expect(await flag(p.page, '__eval')).toBeUndefined();
  });

  it('check of the check: with the policy bypassed, the same injected script and handler do run', async () => {
    const server = await serve();
    const p = await profile({ bypassCSP: true });
    await p.page.goto(`${server.url}#/`);
    await waitForScreen(p.page);
    await p.page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'window.__inline = 1';
      document.body.appendChild(s);
      const img = document.createElement('img');
      img.setAttribute('onerror', 'window.__attr = 1');
      img.src = 'x';
      document.body.appendChild(img);
    });
    expect(await flag(p.page, '__inline')).toBe(1);
    await expect.poll(() => flag(p.page, '__attr')).toBe(1);
  });
});
