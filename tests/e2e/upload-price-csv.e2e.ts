/**
 * Journey 1: a planner uploads a price CSV from sample-data/ through the
 * dropzone, checks the browser's preview, sends it and sees it charted; then drops a
 * broken file, reads the line-numbered errors from the preview and from the server,
 * and nothing was stored ("A failed upload stores nothing").
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { newLocalContext, screenshot, useBrowser } from './support/browser';
import { apiGet, signIn } from './support/session';

const sampleDir = path.resolve(import.meta.dirname, '..', '..', 'sample-data');
const goodFile = path.join(sampleDir, 'prices-week-2026-05-04-15min.csv');
const brokenFile = path.join(sampleDir, 'broken', 'non-finite-values.csv');

interface ExpectedIssues {
  file: string;
  issues: { line: number; messageIncludes: string }[];
}
/** [S] sample-data/broken/expected-issues.json: the lines and phrases the parser must report, kept beside the broken files. */
const expected = (
  JSON.parse(readFileSync(path.join(sampleDir, 'broken', 'expected-issues.json'), 'utf8')) as ExpectedIssues[]
).find((e) => e.file === 'non-finite-values.csv');

/** [D] read from the file itself (not hard-coded): data rows, first and last label, extremes. */
function describeCsv(file: string) {
  const rows = readFileSync(file, 'utf8')
    .trim()
    .split(/\r?\n/)
    .slice(1)
    .map((line) => line.split(','));
  const values = rows.map((r) => Number(r[1]));
  return {
    rows: rows.length,
    first: rows[0]?.[0] ?? '',
    last: rows.at(-1)?.[0] ?? '',
    min: Math.min(...values),
    max: Math.max(...values),
  };
}

/** The (line, problem) pairs of an issues table, as shown. */
async function issueRows(page: Page, tableName: RegExp) {
  const table = page.getByRole('alert', { name: tableName });
  await table.getByRole('row').nth(1).waitFor();
  const rows = await table.getByRole('row').all();
  const cells = await Promise.all(rows.slice(1).map((r) => r.getByRole('cell').allInnerTexts()));
  return cells.map(([line, message]) => ({ line: Number(line), message: message ?? '' }));
}

/** The form sits in a disclosure (open when the site has no profiles yet): open it with the keyboard if closed. */
async function openUploadForm(page: Page) {
  const summary = page.getByText('Upload a profile', { exact: true });
  await summary.waitFor();
  if (await page.getByRole('form', { name: 'Upload a profile' }).isVisible()) return;
  await summary.focus();
  await page.keyboard.press('Enter');
}

describe('uploading a price CSV', () => {
  const browser = useBrowser();

  it('previews, stores and charts a good file, and stores nothing from a broken one while listing its lines', async () => {
    const { context, offsite } = await newLocalContext(browser());
    const page = await context.newPage();
    await signIn(page, 'planner');

    // To the demo site through the navigation.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' }).click();
    await page.getByRole('link', { name: 'Harbourside Depot' }).click();
    await page.getByRole('heading', { name: 'Harbourside Depot', level: 1 }).waitFor();
    const siteId = new URL(page.url()).pathname.split('/').at(-1) ?? '';
    const countProfiles = async () => (await apiGet<unknown[]>(page, `/api/sites/${siteId}/profiles`)).length;
    const before = await countProfiles();

    const form = page.getByRole('form', { name: 'Upload a profile' });
    await openUploadForm(page);
    await form.getByLabel('Kind').waitFor();
    expect(await form.getByLabel('Kind').inputValue()).toBe('price');
    expect(await form.getByRole('button', { name: 'Upload profile' }).isDisabled()).toBe(true);

    // The dropzone's file input takes the file as a drop would.
    const name = `E2E prices ${new Date().toISOString()}`;
    await form.getByLabel('CSV file').setInputFiles(goodFile);
    const preview = form.getByRole('region', { name: 'Preview' });
    await preview.getByText('First lines of the file').waitFor();
    const csv = describeCsv(goodFile);
    const facts = await preview.locator('dl > div').allInnerTexts();
    const fact = (term: string) =>
      facts
        .find((f) => f.toLowerCase().startsWith(term.toLowerCase()))
        ?.split('\n')
        .slice(1)
        .join(' ')
        .trim();
    expect(fact('Intervals')).toBe(csv.rows.toLocaleString('en-US'));
    expect(fact('Resolution')).toBe('15 min');
    expect(fact('Delimiter')).toMatch(/comma/);
    // "2026-05-04T00:00:00+02:00" is shown as "2026-05-04 00:00 +02:00".
    expect(fact('From')).toBe(`${csv.first.slice(0, 10)} ${csv.first.slice(11, 16)} ${csv.first.slice(19)}`);
    expect(fact('Min / max')).toContain(String(csv.min));
    expect(await preview.locator('pre').innerText()).toContain(csv.first);
    await preview.getByRole('figure').locator('svg path').first().waitFor();
    // The file was parsed off the page's thread, so a large file cannot freeze the form.
    expect(page.workers().map((w) => w.url())).toEqual([expect.stringMatching(/parse-profile\.worker/)]);
    await form.getByLabel('Name (optional)').fill(name);
    await screenshot(page, 'upload-1-preview');

    await form.getByRole('button', { name: 'Upload profile' }).click();
    const stored = form.getByRole('status').filter({ hasText: 'Stored' });
    await stored.waitFor({ timeout: 60_000 });
    expect(await stored.innerText()).toContain(`${csv.rows.toLocaleString('en-US')} intervals`);
    expect(await countProfiles()).toBe(before + 1);
    // The stored file leaves the form, so a second press cannot store it twice.
    expect(await form.getByRole('button', { name: 'Upload profile' }).isDisabled()).toBe(true);
    await screenshot(page, 'upload-2-stored');

    // Open the stored profile: facts, chart and the numbers behind it.
    await stored.getByRole('link', { name: 'Open it' }).click();
    await page.getByRole('heading', { name, level: 1 }).waitFor();
    const chart = page.getByRole('figure', { name: new RegExp(`^${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')} in EUR/MWh`) });
    await chart.locator('svg path').first().waitFor({ timeout: 30_000 });
    const line = await chart
      .locator('svg path[d]')
      .evaluateAll((paths) => Math.max(...paths.map((p) => (p.getAttribute('d') ?? '').length)));
    expect(line).toBeGreaterThan(500); // a drawn series, not an empty axis
    await page
      .getByRole('cell', { name: csv.first.slice(0, 10) + ' 00:00 +02:00' })
      .first()
      .waitFor();
    await screenshot(page, 'upload-3-profile-charted');

    // A broken file: the preview lists its lines; sending it anyway, the server lists them too and keeps nothing.
    await page.goBack();
    await page.getByRole('heading', { name: 'Harbourside Depot', level: 1 }).waitFor();
    const reopened = page.getByRole('form', { name: 'Upload a profile' });
    await openUploadForm(page);
    const beforeBroken = await countProfiles();
    await reopened.getByLabel('CSV file').setInputFiles(brokenFile);
    const previewIssues = await issueRows(page, /^The preview found \d+ problems?/);
    expect(expected).toBeDefined();
    expect(previewIssues.map((i) => i.line)).toEqual(expected?.issues.map((i) => i.line));
    expected?.issues.forEach((e, k) => expect(previewIssues[k]?.message).toContain(e.messageIncludes));
    await screenshot(page, 'upload-4-broken-preview');

    await reopened.getByRole('button', { name: 'Upload profile' }).click();
    const serverIssues = await issueRows(page, /^The server refused the file/);
    expect(serverIssues.map((i) => i.line)).toEqual(expected?.issues.map((i) => i.line));
    await screenshot(page, 'upload-5-broken-refused');
    expect(await countProfiles()).toBe(beforeBroken);

    expect(offsite).toEqual([]);
    await context.close();
  });
});
