import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { BASE_URL, openSession, type Session } from './support/browser';

/** Every record of the workbench's IndexedDB database, read with the raw IndexedDB API. */
async function dumpDatabase(page: Page): Promise<Record<string, unknown[]>> {
  return page.evaluate(
    () =>
      new Promise<Record<string, unknown[]>>((res, rej) => {
        const open = indexedDB.open('saltsmith');
        open.onerror = () => rej(open.error);
        open.onsuccess = () => {
          const db = open.result;
          const names = Array.from(db.objectStoreNames).sort();
          const tx = db.transaction(names, 'readonly');
          const out: Record<string, unknown[]> = {};
          for (const n of names) {
            const req = tx.objectStore(n).getAll();
            req.onsuccess = () => {
              out[n] = req.result as unknown[];
            };
          }
          tx.oncomplete = () => {
            db.close();
            res(out);
          };
          tx.onerror = () => rej(tx.error);
        };
      }),
  );
}

/** A project file with the ids and the dates that an import legitimately renews taken out. */
function comparable(text: string) {
  const f = JSON.parse(text) as {
    project: Record<string, unknown>;
    candidates: { id: string }[];
    measurements: { id: string; candidateId: string }[];
    customIons: { id: string }[];
  };
  const order = new Map(f.candidates.map((c, i) => [c.id, i]));
  const { updatedAt: _u, isDemo: _d, ...project } = f.project;
  return {
    project,
    candidates: f.candidates.map(({ id: _id, ...rest }) => rest),
    measurements: f.measurements
      .map(({ id: _id, candidateId, ...rest }) => ({ ...rest, candidate: order.get(candidateId) }))
      .sort((a, b) => JSON.stringify(a).localeCompare(JSON.stringify(b))),
    customIons: f.customIons
      .map(({ id: _id, ...rest }) => rest)
      .sort((a, b) => JSON.stringify(a).localeCompare(JSON.stringify(b))),
  };
}

async function exportOpenProject(page: Page): Promise<{ name: string; text: string }> {
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Export to file' }).click(),
  ]);
  const path = await download.path();
  return { name: download.suggestedFilename(), text: readFileSync(path, 'utf8') };
}

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

describe('project files in Chromium', () => {
  it('exports a project, deletes it, imports it and finds it identical', async () => {
    const { page } = s;
    await page.goto(`${BASE_URL}#/projects`);
    const panel = page.getByRole('region', { name: 'Project files' });
    await panel.waitFor();
    const projectName = await panel
      .getByLabel('Project', { exact: true })
      .evaluate((el) => (el as HTMLSelectElement).selectedOptions[0]?.textContent ?? '');
    expect(projectName).not.toBe('');

    const first = await exportOpenProject(page);
    expect(first.name).toMatch(/\.saltsmith\.json$/);
    const parsed = JSON.parse(first.text) as {
      format: string;
      version: number;
      candidates: unknown[];
    };
    expect(parsed.format).toBe('saltsmith-project');
    expect(parsed.version).toBe(3); // format 3: with the salt-screen plan
    // The demo project comes with a shortlist, so the round trip carries candidates, not just a name.
    expect(parsed.candidates.length).toBeGreaterThan(0);

    page.once('dialog', (d) => void d.accept());
    await page.getByRole('button', { name: `Delete ${projectName}` }).click();
    await page
      .getByRole('button', { name: `Delete ${projectName}` })
      .waitFor({ state: 'detached' })
      .catch(() => undefined);
    await expect
      .poll(async () => page.getByRole('heading', { name: projectName, exact: true }).count())
      .toBe(0);

    await page.getByLabel('Import a project file').setInputFiles({
      name: first.name,
      mimeType: 'application/json',
      buffer: Buffer.from(first.text),
    });
    await page.getByRole('button', { name: 'Import as a new project' }).click();
    // The import checks the file's structures with the lazily loaded openchemlib, then opens the new
    // project's Compound area: wait for that before going back to the projects.
    await page.getByLabel('Name', { exact: true }).waitFor({ timeout: 30_000 });
    await page.goto(`${BASE_URL}#/projects`);
    await page.getByRole('heading', { name: projectName, exact: true }).waitFor();
    await page
      .getByRole('region', { name: 'Project files' })
      .getByLabel('Project', { exact: true })
      .selectOption({ label: projectName });
    const second = await exportOpenProject(page);
    expect(comparable(second.text)).toStrictEqual(comparable(first.text));
    expect(s.errors).toEqual([]);
  });

  it.each([
    ['project-truncated.saltsmith.json', /cut off/],
    ['project-invalid.saltsmith.json', /does not pass validation/],
    ['project-newer-version.saltsmith.json', /newer Saltsmith/],
  ])('refuses %s with a message and leaves the database unchanged', async (fixture, message) => {
    const { page } = s;
    await page.goto(`${BASE_URL}#/projects`);
    await page.getByRole('region', { name: 'Project files' }).waitFor();
    await page.getByRole('button', { name: 'Export to file' }).waitFor();
    const before = await dumpDatabase(page);
    const text = readFileSync(resolve(process.cwd(), 'fixtures/files', fixture));
    await page
      .getByLabel('Import a project file')
      .setInputFiles({ name: fixture, mimeType: 'application/json', buffer: text });
    const alert = page.getByRole('alert').filter({ hasText: 'was not imported' });
    await alert.waitFor();
    await expect(alert.textContent()).resolves.toMatch(message);
    await expect(
      page.getByRole('button', { name: 'Import as a new project' }).count(),
    ).resolves.toBe(0);
    expect(await dumpDatabase(page)).toStrictEqual(before);
    expect(s.errors).toEqual([]);
  });
});
