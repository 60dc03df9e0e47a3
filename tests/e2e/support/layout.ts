/**
 * Checks of a page's layout as a phone or a desktop shows it, measured in the page: nothing
 * wider than the viewport, chart time labels that neither overlap nor get cut off, wide tables
 * that say they scroll, and no ordinary chart line drawn in the colours kept for warnings
 * (amber) and violations (brick).
 */
import type { Page } from 'playwright-core';
import { appUrl } from './session';

/** Waits until the page has settled: its heading, no loading state left, every chart drawn. */
export async function openSettled(page: Page, pathname: string): Promise<void> {
  await page.goto(appUrl(pathname));
  await page.getByRole('heading', { level: 1 }).first().waitFor({ timeout: 30_000 });
  await page.waitForFunction(
    () =>
      [...document.querySelectorAll('[role="status"]')].every((el) => !el.textContent?.startsWith('Loading')) &&
      [...document.querySelectorAll('figure')].every((figure) => figure.querySelector('svg path') !== null),
    undefined,
    { timeout: 60_000 },
  );
  await page.evaluate(() => document.fonts.ready.then(() => new Promise((done) => requestAnimationFrame(done))));
}

export interface LayoutFindings {
  scrollWidth: number;
  innerWidth: number;
  /** Time-axis labels that overlap their neighbour, or reach past their chart's edge. */
  crowdedLabels: string[];
  clippedLabels: string[];
  /** How many axis labels were measured (so a check that found nothing had something to look at). */
  labelsMeasured: number;
  /** Scroll boxes whose content is wider than they are but that show no cue. */
  silentScrollers: string[];
  /** Line series stroked in amber or brick. */
  reservedColourLines: string[];
}

/** What the page looks like at its current viewport. */
export function measureLayout(page: Page): Promise<LayoutFindings> {
  return page.evaluate(() => {
    const reserved = ['#e0961f', '#b23a26', 'rgb(224, 150, 31)', 'rgb(178, 58, 38)'];
    const crowdedLabels: string[] = [];
    const clippedLabels: string[] = [];
    let labelsMeasured = 0;
    for (const svg of document.querySelectorAll('figure svg[aria-label]')) {
      const box = svg.getBoundingClientRect();
      // The bottom axis: tick labels below the plot, in the lowest third of the chart.
      const labels = [...svg.querySelectorAll('text')]
        .map((t) => ({ text: t.textContent ?? '', r: t.getBoundingClientRect() }))
        .filter((l) => l.r.width > 0 && l.r.top > box.top + (box.height * 2) / 3 && l.text.trim() !== '')
        .sort((a, b) => a.r.left - b.r.left);
      labelsMeasured += labels.length;
      const rows = new Map<number, typeof labels>();
      for (const l of labels) rows.set(Math.round(l.r.top), [...(rows.get(Math.round(l.r.top)) ?? []), l]);
      for (const row of rows.values())
        for (let i = 1; i < row.length; i += 1)
          if (row[i]!.r.left < row[i - 1]!.r.right - 0.5) crowdedLabels.push(`${row[i - 1]!.text} / ${row[i]!.text}`);
      for (const l of labels)
        if (l.r.right > box.right + 0.5 || l.r.left < box.left - 0.5)
          clippedLabels.push(`${l.text} (${svg.getAttribute('aria-label')})`);
    }
    const silentScrollers = [...document.querySelectorAll('[role="region"][tabindex="0"]')]
      .filter((el) => el.scrollWidth > el.clientWidth + 1)
      .filter((el) => !el.parentElement?.parentElement?.querySelector('[data-scroll-cue]'))
      .map((el) => el.getAttribute('aria-label') ?? '?');
    const reservedColourLines = [...document.querySelectorAll('figure svg path')]
      .filter((p) => p.getAttribute('fill') === 'none' || p.getAttribute('fill') === 'transparent' || !p.getAttribute('fill'))
      .filter((p) => reserved.includes((p.getAttribute('stroke') ?? '').toLowerCase()))
      .map((p) => p.closest('figure')?.querySelector('figcaption')?.textContent ?? '?');
    return {
      scrollWidth: document.documentElement.scrollWidth,
      innerWidth: window.innerWidth,
      crowdedLabels,
      clippedLabels,
      labelsMeasured,
      silentScrollers,
      reservedColourLines,
    };
  });
}
