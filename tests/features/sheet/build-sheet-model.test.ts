import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { CRITERIA, parseScreeningSettings, validationReport } from '@/chem';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import { buildSheetModel } from '@/features/sheet/build-sheet-model';
import { csvHeader, csvNumber, sheetToCsv } from '@/features/sheet/sheet-csv';
import { cellNumber, cellText } from '@/features/sheet/sheet-format';
import { DEMO_COMPOUND, DEMO_SHORTLIST } from '@/persistence/demo-project';
import {
  projectSettingsSchema,
  type CandidateRecord,
  type ProjectRecord,
} from '@/persistence/records';

// The fictional demo compound (invented numbers) only drives the pipeline here: the assertions check
// structure and consistency between sheet and CSV, never a model's value.
const project: ProjectRecord = {
  id: 'prj_sheet',
  schemaVersion: 1,
  name: 'Sheet test project',
  createdAt: '2026-12-01T00:00:00.000Z',
  updatedAt: '2026-12-01T00:00:00.000Z',
  archived: false,
  isDemo: false,
  compound: DEMO_COMPOUND,
  settings: projectSettingsSchema.parse({}),
};
const candidates: CandidateRecord[] = [...DEMO_SHORTLIST, 'ion_deleted-in-house'].map(
  (ionId, order) => ({
    id: `cand_${order}`,
    schemaVersion: 1,
    projectId: project.id,
    ionId,
    drugPerSalt: ionId === 'sulfate' ? 2 : 1,
    counterIonPerSalt: 1,
    hydrateWater: 0,
    addedAt: '2026-12-01T00:00:00.000Z',
    order,
  }),
);

async function model() {
  const screening = await computeProjectScreening({
    project,
    candidates,
    measurements: [],
    customIons: [],
  });
  return buildSheetModel({
    project,
    screening,
    validation: validationReport(),
    generatedAt: '2026-12-01T12:00:00.000Z',
    appVersion: 'test',
  });
}

describe('sheet model from a real screening', () => {
  it('lists every shortlisted candidate once, ranked by score, the unscreenable one last with its reason', async () => {
    const m = await model();
    expect(m.rows.map((r) => r.id).sort()).toEqual(candidates.map((c) => c.id).sort());
    const ranked = m.rows.filter((r) => r.rank !== null);
    expect(ranked.map((r) => r.rank)).toEqual(ranked.map((_, i) => i + 1));
    const scores = ranked.map((r) => r.cells.score?.value as number);
    for (let i = 1; i < scores.length; i++)
      expect(scores[i]).toBeLessThanOrEqual(scores[i - 1] as number);
    const last = m.rows[m.rows.length - 1];
    expect(last?.rank).toBeNull();
    expect(last?.reasons.join(' ')).toMatch(/not in the counter-ion library/);
  });

  it('carries uncertainties and origins, and only finite numbers', async () => {
    const m = await model();
    for (const r of m.rows) {
      for (const cell of Object.values(r.cells)) {
        if (typeof cell.value === 'number') expect(Number.isFinite(cell.value)).toBe(true);
        if (cell.uncertainty != null) expect(cell.uncertainty).toBeGreaterThan(0);
      }
    }
    const first = m.rows[0];
    expect(first?.cells.phMax?.uncertainty).toBeGreaterThan(0);
    // The dose numbers carry the ±1σ range the Ranking shows (low < value < high).
    const d0 = first?.cells.worstDoseNumber;
    expect(d0?.range?.[0]).toBeLessThan(d0?.value as number);
    expect(d0?.range?.[1]).toBeGreaterThan(d0?.value as number);
    // ΔH_sol per drug ion: a number with its 1σ, or "not informative" in words (never a bare number).
    const dh = first?.cells.solutionEnthalpy;
    expect(dh?.origin).toBe('estimated');
    if (dh?.value === 'not informative') expect(dh.uncertainty ?? null).toBeNull();
    else expect(dh?.uncertainty).toBeGreaterThan(0);
    expect(m.energyCycles.length).toBeGreaterThan(0);
    expect(m.solubility?.series[0]?.kind).toBe('free-form');
    expect(m.confidence.length).toBeGreaterThan(0);
    // The project has no stored weights, so the sheet shows the screening defaults, in criterion order.
    const defaults = parseScreeningSettings({}).weights;
    expect(m.weights.map((w) => w.value)).toEqual(CRITERIA.map((k) => defaults[k]));
  });

  it('shows rank robustness where it was computed, as a percentage, and says how', async () => {
    const screening = await computeProjectScreening({
      project,
      candidates,
      measurements: [],
      customIons: [],
    });
    const m = buildSheetModel({
      project,
      screening,
      validation: [],
      generatedAt: '2026-12-01T12:00:00.000Z',
      appVersion: 'test',
      robustness: { results: [{ id: 'cand_0', pTop3: 0.25 }], iterations: 2000, seed: 7 },
    });
    // Binomial 1σ of a share over n draws, √(p(1−p)/n) (by hand: √(0.25·0.75/2000) = 0.009682 → 0.968
    // points), so the sheet prints P(top 3) to the digits 2000 draws support: "25.00 ± 0.97" (two digits of σ).
    const cell = m.rows.find((r) => r.id === 'cand_0')?.cells.pTop3;
    expect(cell).toMatchObject({ value: 25, origin: 'estimated' });
    expect(cell?.uncertainty).toBeCloseTo(0.9682, 4);
    expect(cellText(cell)).toBe('25.00 ± 0.97');
    expect(m.rows.find((r) => r.id === 'cand_1')?.cells.pTop3?.value).toBeNull();
    expect(m.notes.some((n) => n.includes('2000 Monte Carlo draws (seed 7)'))).toBe(true);
    expect((await model()).notes.some((n) => n.startsWith('P(top 3) was not computed'))).toBe(true);
  });

  it('writes the same numbers to the CSV, column by column', async () => {
    const m = await model();
    const parsed = Papa.parse<unknown[]>(sheetToCsv(m), {
      dynamicTyping: true,
      delimiter: ',',
      newline: '\r\n',
    });
    expect(parsed.errors).toEqual([]);
    const header = parsed.data[0] as string[];
    expect(header).toEqual(csvHeader(m.columns));
    // The free form comes first (not ranked, read against), then the ranked candidates.
    const all = [m.freeForm!, ...m.rows];
    expect((parsed.data[1] as unknown[])[1]).toMatch(
      /free base \(no salt; read against, not ranked\)/,
    );
    all.forEach((r, i) => {
      const line = parsed.data[i + 1] as unknown[];
      expect(line[1]).toBe(r.label);
      for (const c of m.columns) {
        const cell = r.cells[c.key];
        const v = cell?.value ?? null;
        const col = header.indexOf(c.unit ? `${c.label} (${c.unit})` : c.label);
        // The CSV writes each value at the precision the sheet prints (cellNumber: to its 1σ).
        expect(line[col]).toBe(typeof v === 'number' ? csvNumber(cellNumber(cell)!) : v);
        // A ±1σ range the app shows (dose numbers, solubilities) is in the CSV too, low and high.
        if (c.range && cell?.range) {
          const lo = header.indexOf(`${c.label} low (-1 sigma)${c.unit ? ` (${c.unit})` : ''}`);
          expect(line[lo]).toBe(Number(cell.range[0].toPrecision(2)));
          expect(line[lo + 1]).toBe(Number(cell.range[1].toPrecision(2)));
        }
      }
    });
  });
});
