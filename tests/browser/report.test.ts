/**
 * The HTML report of a real simulated shot, opened in headless Chromium (playwright-core,
 * the system's /usr/bin/chromium): no console errors, no network request of any kind, every
 * plot rendered with a non-zero size, the safety notice above everything else. A screenshot is
 * saved to test-artifacts/ (gitignored) for a person to look at.
 *
 * Without /usr/bin/chromium the test is skipped locally with a message, and fails under CI.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import { designToStation, judgeInputsFromDesign, judgeShot, loadDesign, shotReportHtml, simulateShot, writeOutputFile } from '@fluxkick/core';

const CHROMIUM = '/usr/bin/chromium';
const missing = !existsSync(CHROMIUM);
const inCi = Boolean(process.env.CI);
const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const ARTIFACTS = join(ROOT, 'test-artifacts');

if (missing && !inCi) {
  console.warn(`tests/browser/report.test.ts: skipped, ${CHROMIUM} not found (this test fails instead when CI is set).`);
}

const dir = mkdtempSync(join(tmpdir(), 'fluxkick-browser-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('HTML report in a real browser', () => {
  it.skipIf(missing && !inCi)('renders a simulated shot with no console errors, no network and every plot visible', async () => {
    if (missing) throw new Error(`CI is set but ${CHROMIUM} is missing: the browser test cannot run`);
    // a station with a coupled sleeve and two probes, so the plot has several phases and field lines
    const design = loadDesign(join(ROOT, 'examples', 'sleeved-rotor.yaml'));
    const station = designToStation(design, 'examples/sleeved-rotor.yaml');
    const result = simulateShot(station);
    const verdict = judgeShot(station, judgeInputsFromDesign(design), result);
    const file = join(dir, 'report.html');
    writeOutputFile(file, shotReportHtml({ station, result, verdict, subtitle: 'examples/sleeved-rotor.yaml' }));

    const browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-quic'],
    });
    try {
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

      expect(errors).toEqual([]);
      expect(requests).toEqual([]);

      const svgs = page.locator('svg');
      const count = await svgs.count();
      expect(count).toBeGreaterThanOrEqual(1);
      for (let i = 0; i < count; i++) {
        const box = await svgs.nth(i).boundingBox();
        expect(box, `svg ${i}`).not.toBeNull();
        expect(box!.width).toBeGreaterThan(100);
        expect(box!.height).toBeGreaterThan(100);
      }
      // every plotted series drew a line with extent
      const paths = page.locator('svg path.series');
      expect(await paths.count()).toBeGreaterThanOrEqual(4);
      for (let i = 0; i < (await paths.count()); i++) {
        const b = await paths.nth(i).boundingBox();
        expect(b, `series ${i}`).not.toBeNull();
        expect(b!.width).toBeGreaterThan(10);
      }

      // the safety notice is the first thing on the page, above the plot
      const safety = await page.locator('section.safety').boundingBox();
      const plot = await svgs.first().boundingBox();
      expect(safety).not.toBeNull();
      expect(safety!.y).toBeLessThan(200);
      expect(safety!.y).toBeLessThan(plot!.y);
      expect(await page.locator('section.safety').innerText()).toContain('dielectric absorption');
      // the verdict table has one row per item, each with its status written out
      if (verdict.items.length > 0) {
        const rows = page.locator('table.t-verdict tbody tr');
        expect(await rows.count()).toBe(verdict.items.length);
        expect(await rows.first().locator('td.status').innerText()).toMatch(/PASS|WARN|FAIL|info/);
      }

      mkdirSync(ARTIFACTS, { recursive: true });
      await page.screenshot({ path: join(ARTIFACTS, 'report.png'), fullPage: true });
      await page.locator('figure').first().screenshot({ path: join(ARTIFACTS, 'report-plot.png') });
    } finally {
      await browser.close();
    }
  });
});
