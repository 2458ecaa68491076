// Browser tests of the built panel bundle (webview/main.ts) in Debian's Chromium under a strict CSP:
// hostile names and values stay inert text, nothing leaves the page, the panel speaks the protocol
// (every posted message passes the host's guard), keyboard users can open a column, and the
// selected column survives a reload. The injection cases are those listed in issue 6.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isPanelToHost, type PanelToHost } from '../../../src/protocol/webview';
import { demoProfile } from './fixtures/demo-profile';
import { BIDI_CONTROLS, hostileProfile, PAYLOADS } from './fixtures/hostile-profile';
import { buildPanel, launch, openPanel, removeDir, servePanel, type BuiltPanel, type Chromium, type PanelPage, type PanelServer } from './panel-harness';

const URI = 'file:///work/data/delivery.csv';
const settings = { significantDigits: 4, bins: { rule: 'fd' }, edges: 'nice' };

let built: BuiltPanel;
let server: PanelServer;
let browser: Chromium;

beforeAll(async () => {
  built = await buildPanel();
  server = await servePanel(built);
  browser = await launch();
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
  if (built) await removeDir(built.dir);
});

/** What the page holds that an injection would create or set off. */
async function tripwires(panel: PanelPage) {
  return panel.page.evaluate(() => {
    const w = window as unknown as { __pwned?: unknown; __violations: string[] };
    const all = Array.from(document.querySelectorAll('*'));
    return {
      pwned: w.__pwned ?? null,
      violations: w.__violations,
      img: document.querySelectorAll('img').length,
      script: document.querySelectorAll('script').length,
      a: document.querySelectorAll('a').length,
      other: document.querySelectorAll('iframe, svg, object, embed, style, form, base, meta[http-equiv="refresh"]').length,
      link: document.querySelectorAll('link').length,
      // No element carries an event-handler attribute, a URL attribute or an inline style.
      handlers: all.filter((e) => Array.from(e.attributes).some((a) => a.name.startsWith('on'))).length,
      urls: all.filter((e) => e.tagName !== 'LINK' && e.tagName !== 'SCRIPT' && ['href', 'src', 'srcdoc', 'action', 'formaction', 'xlink:href'].some((n) => e.hasAttribute(n))).length,
      styled: all.filter((e) => e.hasAttribute('style') && e.tagName !== 'CANVAS').length,
      policy: document.querySelector('meta[http-equiv="Content-Security-Policy"]')?.getAttribute('content') ?? null,
      text: document.body.innerText,
      longestText: Math.max(0, ...Array.from(document.querySelectorAll('body *')).map((e) => (e.childNodes.length === 1 && e.firstChild?.nodeType === 3 ? (e.textContent ?? '').length : 0))),
      longestTitle: Math.max(0, ...Array.from(document.querySelectorAll('[title]')).map((e) => (e.getAttribute('title') ?? '').length)),
    };
  });
}

async function openHostile(csp: boolean): Promise<{ panel: PanelPage; dialogs: string[] }> {
  const panel = await openPanel(browser.context, server, { csp });
  const dialogs: string[] = [];
  panel.page.on('dialog', (d) => { dialogs.push(d.message()); void d.dismiss(); });
  await panel.send({ type: 'profile', uri: URI, version: 3, fileLabel: PAYLOADS.img, profile: hostileProfile(), settings });
  await panel.waitFor('rendered');
  return { panel, dialogs };
}

async function expectInert(panel: PanelPage, dialogs: string[], csp: boolean): Promise<void> {
  const t = await tripwires(panel);
  expect(t.pwned).toBeNull();
  expect(dialogs).toEqual([]);
  expect(t.img).toBe(0);
  expect(t.script).toBe(1); // the bundle itself
  expect(t.a).toBe(0);
  expect(t.other).toBe(0);
  expect(t.link).toBe(2); // the theme and panel stylesheets
  expect(t.handlers).toBe(0);
  expect(t.urls).toBe(0);
  expect(t.styled).toBe(0);
  if (csp) {
    // The host's policy is in force (no inline script or style allowed), and nothing broke it.
    expect(t.policy).toMatch(/default-src 'none'/);
    expect(t.policy).not.toMatch(/unsafe-inline|unsafe-eval/);
    expect(t.violations).toEqual([]);
  } else {
    expect(t.policy).toBeNull();
  }
  // Shown as text, readable: the markup is there as characters.
  expect(t.text).toContain('<img src=x onerror="window.__pwned=1;alert(1)">');
  expect(t.text).toContain('</script><script>window.__pwned=2</script>');
  // Bidi controls never reach the page as characters; they are drawn as marks.
  expect(BIDI_CONTROLS.test(t.text)).toBe(false);
  expect(t.text).toContain('U+202E');
  // The 10 000-character value is cut on screen; its tooltip is capped too.
  expect(t.longestText).toBeLessThan(1000);
  expect(t.longestTitle).toBeLessThanOrEqual(2001);
  // Nothing but the page, the bundle and the stylesheets was requested.
  for (const url of panel.requests) expect(url.startsWith(server.origin) && server.paths.includes(new URL(url).pathname)).toBe(true);
}

describe('panel bundle with a hostile profile', () => {
  for (const csp of [true, false]) {
    it(`renders every hostile name and value as inert text (${csp ? 'strict CSP' : 'no CSP: the DOM building alone'})`, async () => {
      const { panel, dialogs } = await openHostile(csp);
      const rendered = (await panel.posted()).find((m) => m.type === 'rendered');
      const p = hostileProfile();
      expect(rendered).toEqual({ type: 'rendered', uri: URI, version: 3, columns: p.columns.map((c) => c.name), rows: 13, flags: 13, partial: true });
      await expectInert(panel, dialogs, csp);

      // Open every column's detail (charts, tables, flags, group comparison) and check again.
      const buttons = panel.page.locator('.col-link');
      const n = await buttons.count();
      expect(n).toBe(p.columns.length);
      for (let i = 0; i < n; i++) {
        await buttons.nth(i).click();
        await panel.page.waitForFunction(() => document.querySelector('.detail') !== null);
      }
      // The numeric column ("__proto__") with a group comparison chosen from the profile's own.
      await panel.page.locator('.col-link').nth(3).click();
      await panel.page.selectOption('.detail select >> nth=1', { index: 1 });
      await panel.page.waitForFunction(() => document.querySelectorAll('.detail canvas').length >= 2);
      await expectInert(panel, dialogs, csp);
      for (const m of await panel.posted()) expect(isPanelToHost(m), JSON.stringify(m).slice(0, 200)).toBe(true);
      await panel.page.close();
    });
  }

  it('shows the first-pass marker, the notices and the header notes', async () => {
    const { panel } = await openHostile(true);
    const text = await panel.page.locator('header.strip').innerText();
    expect(text).toContain('First pass — partial');
    expect(text).toContain('Warning');
    expect(text).toContain('repeats an earlier name');
    await panel.page.close();
  });

  it('ignores messages that fail the protocol guard', async () => {
    const panel = await openPanel(browser.context, server);
    await panel.send({ type: 'profile', uri: URI, version: 1, fileLabel: 'x', profile: null, settings });
    await panel.send({ type: 'focus-column', uri: URI });
    await panel.send('<img src=x onerror=alert(1)>');
    await panel.page.waitForTimeout(50);
    expect((await panel.posted()).map((m) => m.type)).toEqual(['ready']);
    expect(await panel.page.locator('.placeholder').innerText()).toContain('Waiting for a data file');
    await panel.page.close();
  });
});

describe('panel behaviour', () => {
  const demo = demoProfile();

  async function openDemo(savedState?: unknown): Promise<PanelPage> {
    const panel = await openPanel(browser.context, server, { savedState });
    await panel.send({ type: 'profile', uri: URI, version: 7, fileLabel: 'delivery.csv', profile: demo, settings });
    await panel.waitFor('rendered');
    return panel;
  }

  it('reports what it rendered', async () => {
    const panel = await openDemo();
    const rendered = await panel.waitFor('rendered');
    const flags = demo.columns.reduce((s, c) => s + c.flagTotals.reduce((t, f) => t + f.total, 0), 0) + 2;
    expect(rendered).toEqual({ type: 'rendered', uri: URI, version: 7, columns: demo.columns.map((c) => c.name), rows: demo.rows, flags, partial: false });
    await panel.page.close();
  });

  it('reaches the column buttons with Tab and opens a column with Enter', async () => {
    const panel = await openDemo();
    const page = panel.page;
    let reached = '';
    for (let i = 0; i < 40 && reached === ''; i++) {
      await page.keyboard.press('Tab');
      reached = await page.evaluate(() => (document.activeElement?.classList.contains('col-link') ? document.activeElement.textContent ?? '' : ''));
    }
    expect(reached).toBe('batch_id');
    await page.keyboard.press('Tab');
    await page.keyboard.press('Enter');
    expect(await page.locator('.detail-title').innerText()).toBe('roast_date');
    // Focus moved to the detail's heading, so the next Tab continues inside the detail.
    expect(await page.evaluate(() => document.activeElement?.classList.contains('detail-title'))).toBe(true);
    expect(await panel.waitFor('select-column')).toEqual({ type: 'select-column', uri: URI, column: 'roast_date' });
    // Space works on a button as well; "All columns" returns to the list.
    await page.locator('.detail-actions button', { hasText: 'All columns' }).focus();
    await page.keyboard.press('Space');
    expect(await page.locator('.detail').count()).toBe(0);
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('roast_date');
    await page.close();
  });

  it('says that counts past the distinct cap are estimates, and by how much they may be low', async () => {
    // The profile's own statement (frequencyError) is what the note must carry, whatever its value.
    const capped = structuredClone(demo);
    const origin = capped.columns.find((c) => c.name === 'origin')!;
    Object.assign(origin, { distinctExact: false, frequencyError: 37, frequencyTable: null, sortedDistinct: null });
    const panel = await openPanel(browser.context, server, {});
    await panel.send({ type: 'profile', uri: URI, version: 8, fileLabel: 'delivery.csv', profile: capped, settings });
    await panel.waitFor('rendered');
    await panel.page.locator('.col-link', { hasText: 'origin' }).click();
    const text = await panel.page.locator('.detail').innerText();
    expect(text).toContain('Each count may be up to 37 below the true one, and a value not listed may occur up to 37 times more than the last one listed.');
    await panel.page.close();
  });

  it('says when quantiles and histogram counts come from a rank sketch, and within how many ranks', async () => {
    // The profile's own statement (approximate, grouped.approximateNote) is what the panel must carry.
    const sketched = structuredClone(demo);
    const weight = sketched.columns.find((c) => c.name === 'green_weight_kg')!;
    const note = 'This column has more values than are kept exactly (486), so its median comes from a rank sketch: within 12 ranks.';
    weight.approximate = { method: 'rank-sketch', values: 486, rankError: 12, relativeRankError: 12 / 486, note };
    weight.grouped = { ...weight.grouped!, approximateNote: 'Counts from a rank sketch: each within 24 of the exact count.' };
    const panel = await openPanel(browser.context, server, {});
    await panel.send({ type: 'profile', uri: URI, version: 9, fileLabel: 'delivery.csv', profile: sketched, settings });
    await panel.waitFor('rendered');
    await panel.page.locator('.col-link', { hasText: 'green_weight_kg' }).click();
    const text = await panel.page.locator('.detail').innerText();
    expect(text).toContain(note);
    expect(text).toContain('quartiles by a rank sketch (approximate)');
    expect(text).toContain('Counts from a rank sketch: each within 24 of the exact count.');
    await panel.page.close();
  });

  it('keeps the selected column across a reload', async () => {
    const first = await openDemo();
    await first.page.locator('.col-link', { hasText: 'roast_loss_pct' }).click();
    const saved = await first.state();
    expect(saved).toMatchObject({ uri: URI, column: 'roast_loss_pct' });
    await first.page.close();
    const second = await openDemo(saved);
    expect(await second.page.locator('.detail-title').innerText()).toBe('roast_loss_pct');
    await second.page.close();
  });

  it('sends reveal, copy and bin requests, and draws the bins the host returns', async () => {
    const panel = await openDemo();
    const page = panel.page;
    await page.locator('.col-link', { hasText: 'green_weight_kg' }).click();
    const weight = demo.columns.find((c) => c.name === 'green_weight_kg');
    const firstFlag = weight?.flags[0];
    await page.locator('.detail .flag').first().click();
    expect(await panel.waitFor('reveal')).toEqual({ type: 'reveal', uri: URI, row: firstFlag?.row, field: firstFlag?.field });
    await page.locator('.detail .block', { hasText: 'Grouped frequency table' }).locator('button', { hasText: 'Copy as Markdown' }).click();
    expect(await panel.waitFor('copy')).toEqual({ type: 'copy', uri: URI, version: 7, target: 'grouped', column: 'green_weight_kg' });
    await page.locator('header button', { hasText: 'Save report' }).click();
    expect(await panel.waitFor('copy', 2)).toEqual({ type: 'copy', uri: URI, version: 7, target: 'report' });

    await page.selectOption('.detail select >> nth=0', 'sturges');
    const request = await panel.waitFor('request-bins') as Extract<PanelToHost, { type: 'request-bins' }>;
    expect(request).toMatchObject({ uri: URI, version: 7, column: 'green_weight_kg', bins: { rule: 'sturges' } });
    expect(await page.locator('.bin-result').first().innerText()).toBe('computing…');
    const histogram = { rule: 'sturges', label: 'Sturges, 10 intervals of width 5', edgeMode: 'nice', width: 5, edges: [35, 40, 45, 50, 55, 60, 65, 70, 75, 80, 85], counts: [1, 1, 8, 58, 166, 181, 55, 11, 2, 3] };
    const grouped = { rule: 'sturges', label: histogram.label, total: 486, rows: histogram.counts.map((count, i) => ({ lower: 35 + 5 * i, upper: 40 + 5 * i, closed: false, count, cumulative: 0, relative: count / 486, cumulativeRelative: 0 })) };
    // A stale reply (older request id) is ignored; the current one is drawn.
    await panel.send({ type: 'bins-result', uri: URI, version: 7, requestId: request.requestId - 1, column: 'green_weight_kg', histogram: { ...histogram, label: 'stale' }, grouped });
    await panel.send({ type: 'bins-result', uri: URI, version: 7, requestId: request.requestId, column: 'green_weight_kg', histogram, grouped });
    await page.waitForFunction(() => document.querySelector('.bin-result')?.textContent === 'Sturges, 10 intervals of width 5');
    expect(await page.locator('.detail table', { hasText: 'Sturges' }).locator('tbody tr').count()).toBe(10);
    expect(await page.locator('.detail table', { hasText: 'Sturges' }).locator('tbody tr').first().innerText()).toContain('[35, 40)');
    await page.close();
  });

  it('asks the host for a group comparison it does not hold, and draws the reply', async () => {
    const panel = await openDemo();
    const page = panel.page;
    await page.locator('.col-link', { hasText: 'roast_loss_pct' }).click();
    const split = page.locator('.detail .block', { hasText: 'Compare groups' }).locator('select');
    await split.selectOption({ label: 'roaster' });
    const request = await panel.waitFor('request-groups') as Extract<PanelToHost, { type: 'request-groups' }>;
    expect(request).toMatchObject({ uri: URI, version: 7, numeric: 'roast_loss_pct', by: 'roaster' });
    const comparison = { numeric: 'roast_loss_pct', by: 'roaster', groups: [{ value: 'North drum', count: 200, mean: 14.1, sd: 1.2, median: 14.2, iqr: 1.6 }, { value: 'South drum', count: 286, mean: 14.3, sd: 1.4, median: 14.3, iqr: 1.8 }] };
    await panel.send({ type: 'groups-result', uri: URI, version: 6, requestId: request.requestId, comparison });
    await page.waitForTimeout(50);
    expect(await page.locator('.detail table', { hasText: 'South drum' }).count()).toBe(0); // an older version's reply is dropped
    await panel.send({ type: 'groups-result', uri: URI, version: 7, requestId: request.requestId, comparison });
    await page.waitForFunction(() => Array.from(document.querySelectorAll('.detail table caption')).some((c) => c.textContent === 'roast_loss_pct by roaster'));
    expect(await page.locator('.detail table', { hasText: 'South drum' }).locator('tbody tr').count()).toBe(2);
    await page.locator('.detail .block', { hasText: 'Compare groups' }).locator('button', { hasText: 'Copy as Markdown' }).click();
    expect(await panel.waitFor('copy')).toEqual({ type: 'copy', uri: URI, version: 7, target: 'groups', column: 'roast_loss_pct', by: 'roaster' });
    await page.close();
  });

  it('shows progress and failure, and opens the column the host focuses', async () => {
    const panel = await openDemo();
    const page = panel.page;
    await panel.send({ type: 'progress', uri: URI, version: 8, fraction: 0.4, message: 'Profiling delivery.csv: 40 %' });
    expect(await page.locator('[role=status]').innerText()).toContain('40 %');
    await panel.send({ type: 'failed', uri: URI, version: 8, message: 'memory ceiling reached' });
    expect(await page.locator('[role=alert]').innerText()).toContain('memory ceiling reached');
    await panel.send({ type: 'focus-column', uri: URI, column: 'origin' });
    expect(await page.locator('.detail-title').innerText()).toBe('origin');
    expect(await page.locator('.columns-table tr.selected').innerText()).toContain('origin');
    // The host moved the selection: the panel does not echo it back.
    expect((await panel.posted()).some((m) => m.type === 'select-column')).toBe(false);
    await page.close();
  });
});
