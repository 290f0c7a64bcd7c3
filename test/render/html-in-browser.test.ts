import {existsSync} from 'node:fs';
import {mkdir, stat} from 'node:fs/promises';
import path from 'node:path';
import {pathToFileURL} from 'node:url';
import {chromium, type Browser} from 'playwright-core';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {buildReport} from '../../src/build-report.js';

/** Debian's Chromium, installed by .ci/run; never a downloaded browser. */
const executablePath = '/usr/bin/chromium';
const hasChromium = existsSync(executablePath);
if (!hasChromium) console.warn(`Browser checks skipped: ${executablePath} is missing (apt-get install chromium).`);

const sample = new URL('../../samples/concrete/report.md', import.meta.url).pathname;
const outputFolder = new URL('out/', import.meta.url).pathname;

describe.runIf(hasChromium)('the sample report in a real browser', () => {
  let browser: Browser;
  let html: string;

  beforeAll(async () => {
    const result = await buildReport(sample, {out: path.join(outputFolder, 'sample')});
    expect(result.ok).toBe(true);
    html = result.written.find((file) => file.endsWith('report.html'))!;
    browser = await chromium.launch({executablePath, args: ['--no-sandbox', '--disable-gpu']});
  }, 60_000);

  afterAll(async () => {
    await browser?.close();
  });

  it('opens without console errors or network requests, with every chart visible', async () => {
    const page = await browser.newPage({viewport: {width: 1000, height: 1400}});
    const problems: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error' || message.type() === 'warning') problems.push(`${message.type()}: ${message.text()}`);
    });
    page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
    page.on('request', (request) => {
      if (!request.url().startsWith('file:')) problems.push(`request: ${request.url()}`);
    });
    await page.goto(pathToFileURL(html).href, {waitUntil: 'load'});

    const charts = await page.locator('figure.stet-chart svg').evaluateAll((svgs) =>
      svgs.map((svg) => {
        const box = svg.getBoundingClientRect();
        return {id: svg.closest('figure')?.id, width: box.width, height: box.height, caption: svg.closest('figure')?.querySelector('figcaption')?.textContent};
      }),
    );
    expect(charts.length).toBeGreaterThanOrEqual(4);
    for (const chart of charts) {
      expect(chart.width, chart.id).toBeGreaterThan(100);
      expect(chart.height, chart.id).toBeGreaterThan(100);
      expect(chart.caption, chart.id).toMatch(/^Figure \d+\. /);
    }
    // Cross-references lead to an element that exists.
    const targets = await page.locator('a[href^="#"]').evaluateAll((links) =>
      links.map((link) => Boolean(document.getElementById(link.getAttribute('href')!.slice(1)))),
    );
    expect(targets.length).toBeGreaterThan(0);
    expect(targets.every(Boolean)).toBe(true);
    await expect(page.locator('.stet-caution').textContent()).resolves.toMatch(/not a decision rule by itself/);

    await mkdir(outputFolder, {recursive: true});
    const screenshot = path.join(outputFolder, 'sample-report.png');
    await page.screenshot({path: screenshot, fullPage: true});
    expect((await stat(screenshot)).size).toBeGreaterThan(10_000);
    expect(problems).toEqual([]);
    await page.close();
  }, 60_000);

  it('prints to PDF on A4 and Letter, never splitting a figure', async () => {
    const page = await browser.newPage();
    await page.goto(pathToFileURL(html).href, {waitUntil: 'load'});
    await page.emulateMedia({media: 'print'});
    const breaks = await page.locator('figure.stet-chart').evaluateAll((figures) => figures.map((figure) => getComputedStyle(figure).breakInside));
    expect(breaks.every((value) => value === 'avoid')).toBe(true);
    for (const format of ['A4', 'Letter']) {
      const pdf = await page.pdf({format, printBackground: true});
      expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
      // One page per section at least: the sample has four sections.
      const pages = pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g)?.length ?? 0;
      expect(pages, format).toBeGreaterThanOrEqual(4);
    }
    await page.close();
  }, 60_000);
});
