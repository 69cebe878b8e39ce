/**
 * The exploration outputs opened in headless Chromium (playwright-core, the system's
 * /usr/bin/chromium), as tests/browser/report.test.ts does for the shot report: the tolerance
 * run's HTML page (safety notice, tables, the histogram inline) and the sweep map SVG. No
 * console errors, no network request, every plot rendered with a non-zero size, the histogram's
 * bars and the map's cells drawn. Screenshots go to test-artifacts/ (gitignored).
 *
 * Without /usr/bin/chromium the test is skipped locally with a message, and fails under CI.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import {
  loadDesign,
  mapPlotSvg,
  parseToleranceSpec,
  parseVarySpec,
  resolveTolerance,
  resolveVaryAxis,
  runSweep,
  runTolerance,
  sweepMapInput,
  toleranceReportHtml,
  writeOutputFile,
} from '@fluxkick/core';

const CHROMIUM = '/usr/bin/chromium';
const missing = !existsSync(CHROMIUM);
const inCi = Boolean(process.env.CI);
const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const ARTIFACTS = join(ROOT, 'test-artifacts');
const DEMO = join(ROOT, 'examples', 'demo-station.yaml');

if (missing && !inCi) {
  console.warn(`tests/browser/explore.test.ts: skipped, ${CHROMIUM} not found (this test fails instead when CI is set).`);
}

const dir = mkdtempSync(join(tmpdir(), 'fluxkick-browser-explore-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Open a file in a fresh page; collect console errors and every non-file request. */
async function open(browser: Browser, file: string): Promise<{ page: Page; errors: string[]; requests: string[] }> {
  const page = await browser.newPage({ viewport: { width: 1000, height: 900 } });
  const errors: string[] = [];
  const requests: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(m.text());
  });
  page.on('pageerror', (e) => errors.push(String(e)));
  page.on('request', (r) => {
    if (!r.url().startsWith('file:') && !r.url().startsWith('data:')) requests.push(r.url());
  });
  await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });
  return { page, errors, requests };
}

describe('exploration outputs in a real browser', () => {
  it.skipIf(missing && !inCi)('the tolerance report and the sweep map render with no console errors, no network and visible plots', async () => {
    if (missing) throw new Error(`CI is set but ${CHROMIUM} is missing: the browser test cannot run`);
    const design = loadDesign(DEMO);
    const tolerance = await runTolerance(design, [resolveTolerance(parseToleranceSpec('bank.capacitance=±10%'), design)], { threads: 0, samples: 200, seed: 1 });
    const tolFile = join(dir, 'tolerance.html');
    writeOutputFile(tolFile, toleranceReportHtml(tolerance, design, 'examples/demo-station.yaml'));
    const axes = [resolveVaryAxis(parseVarySpec('bank.capacitance=1m:5m:5'), design), resolveVaryAxis(parseVarySpec('bank.voltage=1k:2k:5'), design)];
    const sweep = await runSweep(design, axes, { threads: 0 });
    const mapFile = join(dir, 'map.svg');
    writeOutputFile(mapFile, mapPlotSvg(sweepMapInput(sweep)));

    const browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-quic'],
    });
    try {
      mkdirSync(ARTIFACTS, { recursive: true });

      // tolerance report: safety notice above the histogram, the histogram drawn with its bars
      const tol = await open(browser, tolFile);
      expect(tol.errors).toEqual([]);
      expect(tol.requests).toEqual([]);
      const svgs = tol.page.locator('svg');
      expect(await svgs.count()).toBeGreaterThanOrEqual(1);
      const box = await svgs.first().boundingBox();
      expect(box).not.toBeNull();
      expect(box!.width).toBeGreaterThan(100);
      expect(box!.height).toBeGreaterThan(100);
      const bars = tol.page.locator('svg rect.bar');
      expect(await bars.count()).toBeGreaterThan(3);
      let counted = 0;
      for (let i = 0; i < (await bars.count()); i++) {
        const b = await bars.nth(i).boundingBox();
        expect(b, `bar ${i}`).not.toBeNull();
        expect(b!.width).toBeGreaterThan(0);
        counted += Number(await bars.nth(i).getAttribute('data-count'));
      }
      expect(counted).toBe(tolerance.completed); // every shot sits in one bar
      const safety = await tol.page.locator('section.safety').boundingBox();
      expect(safety).not.toBeNull();
      expect(safety!.y).toBeLessThan(box!.y);
      await tol.page.screenshot({ path: join(ARTIFACTS, 'tolerance.png'), fullPage: true });

      // sweep map: a standalone SVG file with 25 cells, the level line and the outlined feasible region
      const map = await open(browser, mapFile);
      expect(map.errors).toEqual([]);
      expect(map.requests).toEqual([]);
      const root = await map.page.locator('svg').first().boundingBox();
      expect(root).not.toBeNull();
      expect(root!.width).toBeGreaterThan(100);
      expect(root!.height).toBeGreaterThan(100);
      const cells = map.page.locator('svg rect.cell');
      expect(await cells.count()).toBe(25);
      for (let i = 0; i < 25; i++) expect((await cells.nth(i).boundingBox())!.width, `cell ${i}`).toBeGreaterThan(10);
      const level = await map.page.locator('svg path.level-line').first().boundingBox();
      expect(level).not.toBeNull();
      expect(level!.width).toBeGreaterThan(10); // the grid spans the required field, so its level line crosses the map
      expect(await map.page.locator('svg path.feasible-outline').count()).toBe(1);
      const svgText = await map.page.locator('svg').first().innerHTML();
      expect(svgText).toContain('required field');
      expect(svgText).toContain('every limit holds');
      await map.page.screenshot({ path: join(ARTIFACTS, 'sweep-map.png') });
    } finally {
      await browser.close();
    }
  });
});
