/**
 * The HTML report opened in a real headless Chromium (playwright-core driving Debian's /usr/bin/chromium):
 * every image loads, no console errors, a screenshot is not blank, and the print layout (A4, 180 mm of
 * text width = 680 CSS px at 96 px/in) has nothing wider than the page. Skipped, with that reason in its
 * name, only where no Chromium is installed (.ci/run installs it).
 */
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { cli } from '../cli/run.js';
import { countPixels, decodePng, isNotWhite } from '../images/helpers.js';

const CHROMIUM = '/usr/bin/chromium';
const haveChromium = existsSync(CHROMIUM);
const demo = join(import.meta.dirname, '../../demo/inverter-plate-fin.yaml');
const HEADLESS_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

describe('HTML report in headless Chromium', () => {
  it.skipIf(!haveChromium)(
    haveChromium
      ? 'loads every image, logs no error, shows content and fits an A4 page in print'
      : `SKIPPED: no Chromium at ${CHROMIUM} (apt-get install chromium)`,
    async () => {
      const out = mkdtempSync(join(tmpdir(), 'fincheck-browser-'));
      const r = await cli('report', demo, '--out', out, '--date', '2025-01-01');
      expect(r.code).toBe(0);
      const { chromium } = await import('playwright-core');
      const browser = await chromium.launch({ executablePath: CHROMIUM, args: HEADLESS_ARGS });
      try {
        const page = await browser.newPage({ viewport: { width: 1000, height: 1400 } });
        const problems: string[] = [];
        page.on('console', (m) => {
          if (m.type() === 'error') problems.push(`console: ${m.text()}`);
        });
        page.on('pageerror', (e) => problems.push(`page: ${e.message}`));
        page.on('requestfailed', (req) => problems.push(`request failed: ${req.url().slice(0, 80)}`));
        await page.goto(pathToFileURL(join(out, 'report.html')).href, { waitUntil: 'load' });

        const images = JSON.parse(
          (await page.evaluate('JSON.stringify(Array.from(document.images).map((i) => [i.complete, i.naturalWidth, i.naturalHeight]))')) as string,
        ) as [boolean, number, number][];
        // profile, flux, heat map and (issue 12) the sensitivities.
        expect(images).toEqual([
          [true, 1200, 750],
          [true, 1200, 750],
          [true, 1200, 750],
          [true, 1200, 750],
        ]);
        expect(problems).toEqual([]);

        const shot = decodePng(await page.screenshot({ fullPage: false }));
        // The first screen holds the title, the cautions box and the summary: well over 5 % of it is ink or tint.
        expect(countPixels(shot, 0, 0, shot.width, shot.height, isNotWhite)).toBeGreaterThan(0.05 * shot.width * shot.height);

        await page.emulateMedia({ media: 'print' });
        await page.setViewportSize({ width: 680, height: 960 });
        const overflow = (await page.evaluate('document.documentElement.scrollWidth')) as number;
        expect(overflow).toBeLessThanOrEqual(680);
        const pdf = await page.pdf({ format: 'A4', printBackground: true });
        expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
        // Title, cautions, tables, three figures and the error tables: a few A4 pages, not one and not dozens.
        const pages = (pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length;
        expect(pages).toBeGreaterThanOrEqual(3);
        expect(pages).toBeLessThanOrEqual(8);
        expect(readFileSync(join(out, 'report.html'), 'utf8').length).toBeGreaterThan(0);
      } finally {
        await browser.close();
        rmSync(out, { recursive: true, force: true });
      }
    },
  );
});
