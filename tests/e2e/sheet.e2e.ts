import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { inflateSync } from 'node:zlib';
import Papa from 'papaparse';
import type { Page } from 'playwright-core';
import { getCounterIon } from '@/chem';
import { CAUTION_LINES } from '@/components/Cautions';
import { BASE_URL, openSession, type Session } from './support/browser';

/**
 * Text of a PDF as Chromium (Skia) writes it: Type0 fonts with Identity-H encoding and a ToUnicode
 * CMap (ISO 32000-1 §9.10.3), content streams compressed with FlateDecode. Enough for tests; not a
 * general PDF reader.
 */
function pdfText(pdf: Buffer): string {
  const src = pdf.toString('latin1');
  const objects = new Map<string, { dict: string; stream: Buffer | null }>();
  const objRe = /(\d+) 0 obj\s*([\s\S]*?)endobj/g;
  for (let m = objRe.exec(src); m; m = objRe.exec(src)) {
    const body = m[2] ?? '';
    const si = body.indexOf('stream');
    if (si < 0) {
      objects.set(m[1] ?? '', { dict: body, stream: null });
      continue;
    }
    const dict = body.slice(0, si);
    let start = si + 'stream'.length;
    if (body[start] === '\r') start++;
    if (body[start] === '\n') start++;
    const end = body.lastIndexOf('endstream');
    let raw = Buffer.from(body.slice(start, end), 'latin1');
    const len = /\/Length (\d+)/.exec(dict);
    if (len) raw = raw.subarray(0, Number(len[1]));
    let stream: Buffer | null = raw;
    if (/\/FlateDecode/.test(dict)) {
      try {
        stream = inflateSync(raw);
      } catch {
        stream = null;
      }
    }
    objects.set(m[1] ?? '', { dict, stream });
  }
  // ToUnicode CMaps of the fonts, by resource name (/F5 5 0 R …).
  const cmapOf = (id: string): Map<number, string> => {
    const map = new Map<number, string>();
    const text = objects.get(id)?.stream?.toString('latin1') ?? '';
    const hex = (h: string) =>
      String.fromCodePoint(...(h.match(/.{4}/g) ?? []).map((x) => parseInt(x, 16)));
    for (const block of text.matchAll(/beginbfchar([\s\S]*?)endbfchar/g)) {
      for (const p of (block[1] ?? '').matchAll(/<([0-9A-Fa-f]+)>\s*<([0-9A-Fa-f]+)>/g))
        map.set(parseInt(p[1] ?? '0', 16), hex(p[2] ?? ''));
    }
    for (const block of text.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
      for (const p of (block[1] ?? '').matchAll(
        /<([0-9A-Fa-f]+)>\s*<([0-9A-Fa-f]+)>\s*<([0-9A-Fa-f]+)>/g,
      )) {
        const lo = parseInt(p[1] ?? '0', 16);
        const hi = parseInt(p[2] ?? '0', 16);
        const base = parseInt(p[3] ?? '0', 16);
        for (let c = lo; c <= hi; c++) map.set(c, String.fromCodePoint(base + c - lo));
      }
    }
    return map;
  };
  const fonts = new Map<string, Map<number, string>>();
  for (const { dict } of objects.values()) {
    const fontDict = /\/Font\s*<<([\s\S]*?)>>/.exec(dict);
    if (!fontDict) continue;
    for (const f of (fontDict[1] ?? '').matchAll(/\/(\w+)\s+(\d+) 0 R/g)) {
      const font = objects.get(f[2] ?? '');
      const tu = font ? /\/ToUnicode (\d+) 0 R/.exec(font.dict) : null;
      if (tu && !fonts.has(f[1] ?? '')) fonts.set(f[1] ?? '', cmapOf(tu[1] ?? ''));
    }
  }
  const decode = (hexString: string, cmap: Map<number, string> | undefined) =>
    (hexString.match(/.{4}/g) ?? []).map((g) => cmap?.get(parseInt(g, 16)) ?? '').join('');
  const out: string[] = [];
  for (const { stream } of objects.values()) {
    const content = stream?.toString('latin1');
    if (!content || !/\bTf\b/.test(content)) continue;
    let cmap: Map<number, string> | undefined;
    const tokenRe = /\/(\w+)\s+[\d.]+\s+Tf|<([0-9A-Fa-f]*)>\s*Tj|\[([^\]]*)\]\s*TJ|\b(ET)\b/g;
    for (let t = tokenRe.exec(content); t; t = tokenRe.exec(content)) {
      if (t[1]) cmap = fonts.get(t[1]);
      else if (t[2] !== undefined) out.push(decode(t[2], cmap));
      else if (t[3] !== undefined) {
        for (const part of t[3].matchAll(/<([0-9A-Fa-f]*)>|(-?[\d.]+)/g)) {
          if (part[1] !== undefined) out.push(decode(part[1], cmap));
          else if (Number(part[2]) < -200) out.push(' ');
        }
      } else out.push('\n');
    }
  }
  return out.join('').normalize('NFKC');
}

/** Text compared without whitespace: PDF line breaks and table wrapping move spaces around. */
const squash = (s: string) => s.normalize('NFKC').replace(/\s+/g, '');

/** The open project's shortlist, read from IndexedDB with the raw API. */
async function shortlist(page: Page): Promise<{ ionId: string }[]> {
  return page.evaluate(
    () =>
      new Promise<{ ionId: string }[]>((res, rej) => {
        const open = indexedDB.open('saltsmith');
        open.onerror = () => rej(open.error);
        open.onsuccess = () => {
          const db = open.result;
          const tx = db.transaction(['settings', 'candidates'], 'readonly');
          const last = tx.objectStore('settings').get('lastProjectId');
          last.onsuccess = () => {
            const projectId = (last.result as { value: string }).value;
            const all = tx.objectStore('candidates').getAll();
            all.onsuccess = () => {
              res(
                (all.result as { projectId: string; ionId: string }[]).filter(
                  (c) => c.projectId === projectId,
                ),
              );
              db.close();
            };
          };
        };
      }),
  );
}

async function openSheet(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Comparison sheet' }).click();
  await page.locator('.comparison-sheet h1').waitFor({ timeout: 30_000 });
  await page.getByRole('table', { name: /^Salt formation/ }).waitFor();
}

async function downloadCsv(page: Page): Promise<string> {
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Download CSV' }).click(),
  ]);
  expect(download.suggestedFilename()).toMatch(/-comparison-\d{4}-\d{2}-\d{2}\.csv$/);
  return readFileSync(await download.path(), 'utf8');
}

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

describe('comparison sheet in Chromium', () => {
  it('prints to a PDF holding the compound, every shortlisted candidate and the cautions', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByRole('navigation', { name: 'Workbench areas' }).waitFor();
    await openSheet(page);
    const compound = (await page.getByTestId('sheet-compound').textContent()) ?? '';
    expect(compound).not.toBe('');
    const list = await shortlist(page);
    expect(list.length).toBeGreaterThan(0);

    // On paper only the sheet shows: the workbench around it is hidden by the print rules.
    await page.emulateMedia({ media: 'print' });
    await expect(
      page.getByRole('navigation', { name: 'Workbench areas' }).isVisible(),
    ).resolves.toBe(false);
    await expect(page.getByRole('button', { name: 'Download CSV' }).isVisible()).resolves.toBe(
      false,
    );
    await expect(page.locator('article.comparison-sheet').isVisible()).resolves.toBe(true);

    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = squash(pdfText(pdf));
    expect(text).toContain(squash(compound));
    for (const c of list) {
      const ion = getCounterIon(c.ionId);
      expect(ion, `library ion ${c.ionId}`).toBeDefined();
      // The salt's trade name holds the ion's name (hydrochloride, hemisulfate, hydrogen maleate).
      expect(text.toLowerCase()).toContain(squash(ion?.name ?? c.ionId).toLowerCase());
    }
    const labels = await page
      .getByRole('table', { name: /^Salt formation/ })
      .getByRole('rowheader')
      .allTextContents();
    // Every shortlisted candidate, after the free form (its own row, not ranked, read against).
    expect(labels).toHaveLength(list.length + 1);
    expect(labels[0]).toMatch(/free base \(no salt; read against, not ranked\)/);
    for (const l of labels) expect(text).toContain(squash(l));
    for (const line of CAUTION_LINES) expect(text).toContain(squash(line));
    // Letter paper works as well (the page size follows the print dialog).
    const letter = pdfText(await page.pdf({ format: 'Letter' }));
    expect(squash(letter)).toContain(squash(CAUTION_LINES[0] ?? ''));
    expect(s.errors).toEqual([]);
  });

  it('downloads a CSV that parses back to the numbers on the sheet', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await openSheet(page);
    const csv = await downloadCsv(page);
    const parsed = Papa.parse<(string | number | null)[]>(csv, {
      dynamicTyping: true,
      delimiter: ',',
      newline: '\r\n',
    });
    expect(parsed.errors).toEqual([]);
    const [header, ...rest] = parsed.data;
    const blank = rest.findIndex((r) => r.length === 1 && r[0] === null);
    const rows = rest.slice(0, blank);
    expect(header).toContain('Salt per dose (mg)');
    expect(header).toContain('ΔH_sol (kJ/mol per drug ion)');
    expect(header).toContain('ΔH_sol uncertainty (1 sigma) (kJ/mol per drug ion)');
    // Rank robustness comes from the Monte Carlo worker: every ranked demo candidate has a P(top 3).
    const pCol = (header ?? []).indexOf('P(top 3) (%)');
    expect(pCol).toBeGreaterThan(1);
    // (The free form, first, is not ranked and has none.)
    expect(rows[0]?.[1]).toMatch(/free base/);
    for (const r of rows.slice(1)) expect(typeof r[pCol]).toBe('number');

    // Every numeric cell of the sheet (data-value) is the same number in the CSV, in the column with
    // the same heading (label and unit), to 6 significant digits.
    const cells = await page.locator('.sheet-ranking td[data-value]').evaluateAll((tds) =>
      tds.map((td) => {
        const cell = td as HTMLTableCellElement;
        const table = cell.closest('table');
        return {
          label: cell.closest('tr')?.querySelector('th')?.textContent ?? '',
          heading: table?.tHead?.rows[0]?.cells[cell.cellIndex]?.textContent ?? '',
          value: Number(cell.getAttribute('data-value')),
        };
      }),
    );
    expect(cells.length).toBeGreaterThan(rows.length * 5);
    const labelCol = (header ?? []).indexOf('Candidate');
    for (const cell of cells) {
      const row = rows.find((r) => r[labelCol] === cell.label);
      expect(row, `CSV row for ${cell.label}`).toBeDefined();
      const col = (header ?? []).indexOf(cell.heading);
      expect(col, `CSV column "${cell.heading}"`).toBeGreaterThan(1);
      expect(row?.[col], `${cell.label} / ${cell.heading}`).toBe(Number(cell.value.toPrecision(6)));
    }
    expect(rows).toHaveLength(
      await page
        .getByRole('table', { name: /^Salt formation/ })
        .getByRole('rowheader')
        .count(),
    );
    // The cautions travel with the file.
    const footer = rest.slice(blank + 1).map((r) => r[0]);
    for (const line of CAUTION_LINES) expect(footer).toContain(`Caution: ${line}`);
    expect(s.errors).toEqual([]);
  });

  it('keeps hostile names inert in the page, the CSV and the sheet', async () => {
    const { page } = s;
    const dialogs: string[] = [];
    page.on('dialog', (d) => {
      dialogs.push(d.message());
      void d.dismiss();
    });
    const formula = '=HYPERLINK("http://x","y")';
    const markup = '<img src=x onerror=alert(1)>';
    await page.goto(`${BASE_URL}#/projects`);
    // Take the demo project's file, give it hostile names, import it.
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export to file' }).click(),
    ]);
    const file = JSON.parse(readFileSync(await download.path(), 'utf8')) as {
      project: { name: string; compound: { name: string } };
    };
    file.project.name = markup;
    file.project.compound.name = formula;
    await page.getByLabel('Import a project file').setInputFiles({
      name: 'hostile.json',
      mimeType: 'application/json',
      buffer: Buffer.from(JSON.stringify(file)),
    });
    await page.getByRole('button', { name: 'Import as a new project' }).click();
    await expect.poll(() => page.locator('.topbar-project').textContent()).toContain(markup);

    await openSheet(page);
    await expect(page.getByTestId('sheet-compound').textContent()).resolves.toBe(formula);
    await expect(page.locator('article.comparison-sheet').textContent()).resolves.toContain(markup);
    await expect(page.locator('img[src="x"]').count()).resolves.toBe(0);

    const csv = await downloadCsv(page);
    const rows = Papa.parse<string[]>(csv, { delimiter: ',', newline: '\r\n' }).data;
    const labels = rows
      .slice(1)
      .map((r) => r[1])
      .filter((l): l is string => !!l && l.includes('HYPERLINK'));
    expect(labels.length).toBeGreaterThan(0);
    // OWASP CSV Injection: a cell starting with "=" is prefixed with a single quote and quoted.
    for (const l of labels) expect(l.startsWith(`'${formula}`)).toBe(true);
    expect(csv).toContain(`"'=HYPERLINK(""http://x"",""y"")`);
    expect(csv).not.toMatch(/(^|,)=HYPERLINK/m);

    await page.emulateMedia({ media: 'print' });
    const text = squash(pdfText(await page.pdf({ format: 'A4' })));
    expect(text).toContain(squash(formula));
    expect(text).toContain(squash(markup));
    expect(dialogs).toEqual([]);
    expect(s.errors).toEqual([]);
  });
});
