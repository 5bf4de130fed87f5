import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { BASE_URL, openSession, type Session } from './support/browser';
import { area } from './support/navigation';

// Issue 18: two pages of one browser on one project. Every form writes only the fields changed in
// it, each stamped, so neither page's older copy lands over the other's newer value — replays of a
// closed page's writes included (README, "Saving and two tabs").

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

async function openDemo(page: Page): Promise<void> {
  await page.goto(BASE_URL);
  await page.getByText('Demorazine is fictional').waitFor();
}

/** A fresh page reads what IndexedDB holds (not a tab's copy). */
async function freshPage(): Promise<Page> {
  const page = await s.context.newPage();
  await openDemo(page);
  return page;
}

const meltingPoint = (page: Page) => page.getByLabel('Melting point', { exact: false });

async function openConditions(page: Page): Promise<void> {
  await area(page, 'Ranking');
  await page.getByRole('table', { name: /Ranked candidates/ }).waitFor({ timeout: 30_000 });
  await page.getByText('Screening conditions', { exact: true }).click();
}
const conditions = (page: Page) => page.getByRole('form', { name: 'Screening conditions' });

describe('two pages of one browser on one project (Chromium, production build)', () => {
  it('compound: A sets 150 and is closed at once; B, still showing the old value, types 160: 160 stays after reloads', async () => {
    const { page: a } = s;
    await openDemo(a);
    const b = await freshPage();
    const shownInB = await meltingPoint(b).inputValue();
    await meltingPoint(a).fill('150');
    const gone = a.waitForEvent('close');
    await a.close({ runBeforeUnload: true });
    await gone;
    await meltingPoint(b).fill('160');
    await b.getByText('All changes saved').waitFor();
    expect(shownInB).not.toBe('160');
    await b.reload();
    await b.getByText('Demorazine is fictional').waitFor();
    await expect(meltingPoint(b).inputValue()).resolves.toBe('160');
    const c = await freshPage();
    await expect(meltingPoint(c).inputValue()).resolves.toBe('160');
    expect(s.errors).toEqual([]);
  });

  it('screening conditions: A sets gastric chloride, then B (opened before) sets the temperature: both stay', async () => {
    const { page: a } = s;
    await openDemo(a);
    const b = await freshPage();
    await openConditions(a);
    await openConditions(b);
    await conditions(a)
      .getByLabel(/Chloride in gastric medium/)
      .fill('0.2');
    await a.getByText('Saved', { exact: true }).waitFor();
    await a.waitForTimeout(600);
    await conditions(b)
      .getByLabel(/Temperature/)
      .fill('25');
    await b.waitForTimeout(600);
    await b.getByText('Saved', { exact: true }).waitFor();
    const c = await freshPage();
    await openConditions(c);
    await expect(
      conditions(c)
        .getByLabel(/Chloride in gastric medium/)
        .inputValue(),
    ).resolves.toBe('0.2');
    await expect(
      conditions(c)
        .getByLabel(/Temperature/)
        .inputValue(),
    ).resolves.toBe('25');
    expect(s.errors).toEqual([]);
  });

  it('weights: sliders moved in both pages within 400 ms are both kept', async () => {
    const { page: a } = s;
    await openDemo(a);
    const b = await freshPage();
    for (const p of [a, b]) {
      await area(p, 'Ranking');
      await p.getByRole('table', { name: /Ranked candidates/ }).waitFor({ timeout: 30_000 });
    }
    await a.getByLabel('Tablet mass', { exact: true }).fill('3');
    await b.getByLabel('Counter-ion class', { exact: true }).fill('2');
    await a.waitForTimeout(1500);
    const c = await freshPage();
    await area(c, 'Ranking');
    await c.getByRole('table', { name: /Ranked candidates/ }).waitFor({ timeout: 30_000 });
    await expect(c.getByLabel('Tablet mass', { exact: true }).inputValue()).resolves.toBe('3');
    await expect(c.getByLabel('Counter-ion class', { exact: true }).inputValue()).resolves.toBe(
      '2',
    );
    expect(s.errors).toEqual([]);
  });

  it('dissolution media: a medium added in each page — both are kept', async () => {
    const { page: a } = s;
    await openDemo(a);
    const b = await freshPage();
    const add = async (p: Page, name: string) => {
      const form = p.getByRole('form', { name: 'Add a dissolution medium' });
      await form.getByLabel('Medium name').fill(name);
      await form.getByLabel('pH', { exact: true }).fill('6.8');
      await form.getByLabel('Counter-ion in it').selectOption('chloride');
      await form.getByLabel(/Its concentration/).fill('0.05');
      await form.getByRole('button', { name: 'Add medium' }).click();
    };
    for (const p of [a, b]) {
      await area(p, 'Ranking');
      await p.getByRole('table', { name: /Ranked candidates/ }).waitFor({ timeout: 30_000 });
    }
    await add(a, 'Buffer from A');
    await a.getByRole('button', { name: 'Remove medium Buffer from A' }).waitFor();
    await add(b, 'Buffer from B');
    await b.getByRole('button', { name: 'Remove medium Buffer from B' }).waitFor();
    const c = await freshPage();
    await area(c, 'Ranking');
    await c.getByRole('button', { name: 'Remove medium Buffer from A' }).waitFor();
    await c.getByRole('button', { name: 'Remove medium Buffer from B' }).waitFor();
    expect(s.errors).toEqual([]);
  });

  it('bench data: A sets a hydrate; B, opened before, records a measurement and another hydrate: all kept', async () => {
    const { page: a } = s;
    await openDemo(a);
    const b = await freshPage();
    const water = (p: Page) => p.getByLabel(/Water of crystallisation/);
    const pick = async (p: Page, name: RegExp) =>
      p
        .getByRole('navigation', { name: 'Shortlisted candidates' })
        .getByRole('button', { name })
        .click();
    for (const p of [a, b]) await area(p, 'Bench data');
    await pick(a, /mesylate/i);
    await pick(b, /mesylate/i);
    await water(a).fill('0.5');
    const form = b.getByRole('form', { name: /New measurement for mesylate/ });
    await form.getByLabel(/^Solubility/).fill('4.2');
    await form.getByLabel('pH at equilibrium').fill('3.1');
    await form.getByRole('button', { name: 'Save measurement' }).click();
    await b.getByText(/Saved: solubility for mesylate/).waitFor();
    await pick(b, /hydrochloride/);
    await water(b).fill('1');
    await b.waitForTimeout(800);
    const c = await freshPage();
    await area(c, 'Bench data');
    await pick(c, /mesylate/i);
    await expect(water(c).inputValue()).resolves.toBe('0.5');
    await c.getByText(/4\.2/).first().waitFor();
    await pick(c, /hydrochloride/);
    await expect(water(c).inputValue()).resolves.toBe('1');
    expect(s.errors).toEqual([]);
  });

  it('counter-ion edits: A keeps a note, B (form opened before) changes the pKa values: both kept', async () => {
    const { page: a } = s;
    await openDemo(a);
    const b = await freshPage();
    const openMesylate = async (p: Page) => {
      await area(p, 'Counter-ions');
      await p.getByLabel('Search counter-ions').fill('Mesylate');
      await p.getByRole('button', { name: 'Mesylate', exact: true }).click();
      return p.getByRole('form', { name: 'Edit Mesylate for this project' });
    };
    const formA = await openMesylate(a);
    const formB = await openMesylate(b);
    await formA.getByLabel('Note').fill('Note kept by tab A');
    await formA.getByRole('button', { name: 'Save for this project' }).click();
    await a.getByText('Saved for this project.', { exact: false }).waitFor();
    await formB.getByLabel('pKa values').fill('-1.5');
    await formB.getByRole('button', { name: 'Save for this project' }).click();
    await b.getByText('Saved for this project.', { exact: false }).waitFor();
    const c = await freshPage();
    const formC = await openMesylate(c);
    await expect(formC.getByLabel('Note').inputValue()).resolves.toBe('Note kept by tab A');
    await expect(formC.getByLabel('pKa values').inputValue()).resolves.toBe('-1.5');
    expect(s.errors).toEqual([]);
  });
});
