// Screenshots of the panel on a realistic profile, light and dark, written to test-output/webview/
// (git-ignored) for a person to look at. The test checks only that the charts were drawn.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoProfile } from './fixtures/demo-profile';
import { hostileProfile, PAYLOADS } from './fixtures/hostile-profile';
import { buildPanel, launch, openPanel, removeDir, servePanel, writeOutput, type BuiltPanel, type Chromium, type PanelServer, type ThemeName } from './panel-harness';

const URI = 'file:///work/demo/roastery-batches.csv';
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

async function shoot(theme: ThemeName, column: string, name: string, width = 900, options: { view?: 'counts' | 'cumulative'; hostile?: boolean; charts?: boolean } = {}): Promise<void> {
  const panel = await openPanel(browser.context, server, { theme, width, height: 1000, savedState: { uri: URI, column, bins: {}, groupBy: { green_weight_kg: 'origin' }, view: options.view ?? 'counts' } });
  const profile = options.hostile ? hostileProfile() : demoProfile();
  await panel.send({ type: 'profile', uri: URI, version: 1, fileLabel: options.hostile ? profile.source ?? '' : 'roastery-batches.csv', profile, settings });
  await panel.waitFor('rendered');
  // chart.js draws on the next frame once its box is sized.
  await panel.page.waitForFunction(() => Array.from(document.querySelectorAll('canvas')).every((c) => c.width > 0));
  await panel.page.waitForTimeout(100);
  const canvases = await panel.page.locator('canvas').count();
  if (options.charts !== false) expect(canvases).toBeGreaterThan(0);
  await writeOutput(name, await panel.page.screenshot({ fullPage: true }));
  if (process.env.ASSAY_SCREENSHOT_PARTS) {
    // Page-sized slices, for reading the design at full resolution.
    const height = await panel.page.evaluate(() => document.documentElement.scrollHeight);
    for (let y = 0, i = 0; y < height; y += 1000, i++) {
      // Each full-page capture resizes the viewport; let chart.js redraw after the last one.
      await panel.page.waitForTimeout(150);
      await writeOutput(name.replace('.png', `-part${i}.png`), await panel.page.screenshot({ fullPage: true, clip: { x: 0, y, width: Math.max(width, await panel.page.evaluate(() => document.documentElement.scrollWidth)), height: Math.min(1000, height - y) } }));
    }
  }
  await panel.page.close();
}

describe('panel screenshots', () => {
  for (const theme of ['light', 'dark'] as const) {
    it(`renders the demo profile in the ${theme} theme`, async () => {
      await shoot(theme, 'green_weight_kg', `panel-numeric-${theme}.png`);
      await shoot(theme, 'origin', `panel-categorical-${theme}.png`);
    });
  }
  it('renders a wide panel with the overview beside the detail', async () => {
    await shoot('dark', 'roast_level', 'panel-wide-dark.png', 1400);
    await shoot('light', 'roast_date', 'panel-wide-light.png', 1400, { charts: false });
    await shoot('dark', 'drop_temp_c', 'panel-cumulative-dark.png', 900, { view: 'cumulative' });
  });
  it('renders in a narrow panel beside the editor', async () => {
    await shoot('light', 'green_weight_kg', 'panel-narrow-light.png', 460);
  });
  it('renders in a high-contrast theme', async () => {
    await shoot('high-contrast', 'green_weight_kg', 'panel-numeric-high-contrast.png');
  });
  it('renders hostile values readably', async () => {
    await shoot('light', PAYLOADS.img, 'panel-hostile-light.png', 900, { hostile: true });
  });
});
