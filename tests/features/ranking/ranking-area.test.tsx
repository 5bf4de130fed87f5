import { beforeEach, describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { parseScreeningSettings } from '@/chem';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { projectSettingsSchema, type ProjectRecord } from '@/persistence/records';
import { RankingArea } from '@/features/ranking/components/RankingArea';
import { conditionsDraftOf, conditionsFromDraft } from '@/features/ranking/settings-form-model';
import { screeningSettingsOf } from '@/screening-data/screening-settings';
import { useRankingViewStore } from '@/stores/ranking-view-store';

describe('screening-conditions form model', () => {
  const project = projectSettingsSchema.parse({});
  const settings = parseScreeningSettings({});
  const draft = conditionsDraftOf(project, settings);

  it('starts from the stored values', () => {
    expect(draft.gastricChlorideM).toBe(String(project.gastricChlorideM));
    expect(draft.temperatureC).toBe('37');
  });

  it('names each bad field and its accepted range', () => {
    const r = conditionsFromDraft(
      { ...draft, microenvironmentPh: '15', temperatureC: 'warm', gastricChlorideM: '-1' },
      project,
      settings,
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.microenvironmentPh).toBe('Microenvironment pH must be from 0 to 14');
    expect(r.errors.temperatureC).toBe('Temperature must be a number');
    expect(r.errors.gastricChlorideM).toBe('Chloride in gastric medium must be from 0 to 5 mol/L');
  });

  it('keeps the cocrystal band below the salt band (Cruz-Cabeza 2012 bands are ordered)', () => {
    const r = conditionsFromDraft(
      { ...draft, cocrystalBelow: '4', saltAbove: '3' },
      project,
      settings,
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.saltAbove).toMatch(/above the cocrystal band/);
  });

  it('accepts a decimal comma and converts °C to K (T/K = t/°C + 273.15)', () => {
    const r = conditionsFromDraft(
      { ...draft, microenvironmentPh: '6,5', temperatureC: '25' },
      project,
      settings,
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.projectSettings.microenvironmentPh).toBe(6.5);
    expect(r.screening.temperatureK).toBeCloseTo(298.15, 10);
  });
});

describe('Ranking area (formula-only compound, so no structure parser is loaded)', () => {
  let project: ProjectRecord;
  beforeEach(async () => {
    await resetDbForTests();
    useRankingViewStore.setState({
      sortKey: 'rank',
      sortDir: 'asc',
      chartIds: null,
      focusCandidateId: null,
    });
    project = await projectsRepo.create('Ranking test', {
      ...DEMO_COMPOUND,
      name: 'Ranking test',
      smiles: '',
    });
    for (const ion of ['chloride', 'tosylate', 'mesylate'])
      await candidatesRepo.add(project.id, ion);
  });

  const rows = () =>
    within(screen.getByRole('table', { name: /Ranked candidates/ }))
      .getAllByRole('row')
      .slice(1)
      .filter((r) => !r.classList.contains('free-form-row')); // the free form is read against, not ranked
  // The active-fraction cell found by its heading (the candidate is a row header, not a cell), so a new
  // column cannot silently point the check at another cell.
  const fractions = () => {
    const heads = within(screen.getByRole('table', { name: /Ranked candidates/ })).getAllByRole(
      'columnheader',
    );
    const col = heads.findIndex((h) => /Active fraction/.test(h.textContent ?? '')) - 1;
    const values = rows().map((r) =>
      Number(/(\d+) %/.exec(within(r).getAllByRole('cell')[col]!.textContent ?? '')?.[1]),
    );
    expect(values.every(Number.isFinite)).toBe(true);
    return values;
  };

  it('ranks the shortlist with the cautions beside it and re-orders as a weight moves', async () => {
    render(<RankingArea project={project} />);
    await screen.findByRole('table', { name: /Ranked candidates/ }, { timeout: 15000 });
    expect(rows()).toHaveLength(3);
    expect(screen.getByRole('complementary', { name: /Cautions/ })).toHaveTextContent(
      /do not establish a salt form/,
    );

    for (const label of [
      'Salt formation (ΔpKa)',
      'Dose dissolves, pH 1.2–6.8',
      'Dose dissolves in gastric fluid',
      'Stays a salt in the tablet',
      'Counter-ion class',
      'Moisture uptake (measured)',
    ]) {
      fireEvent.change(screen.getByLabelText(label), { target: { value: '0' } });
    }
    fireEvent.change(screen.getByLabelText('Tablet mass'), { target: { value: '3' } });
    // Mass cost alone: the order is by active fraction, highest first.
    const f = fractions();
    expect(f).toEqual([...f].sort((a, b) => b - a));
    // …and the weights reach the project (after the save delay).
    await waitFor(
      async () =>
        expect(screeningSettingsOf((await projectsRepo.get(project.id))!).weights.massCost).toBe(3),
      { timeout: 3000 },
    );
  });

  it('sorts by a column when its header is pressed', async () => {
    const user = userEvent.setup();
    render(<RankingArea project={project} />);
    await screen.findByRole('table', { name: /Ranked candidates/ }, { timeout: 15000 });
    const header = screen.getByRole('columnheader', { name: /Active fraction/ });
    await user.click(within(header).getByRole('button'));
    expect(header).toHaveAttribute('aria-sort', 'ascending');
    const f = fractions();
    expect(f).toEqual([...f].sort((a, b) => a - b));
  });

  it('folds each candidate’s reasons behind a “Why” button until asked, then lists them', async () => {
    const user = userEvent.setup();
    render(<RankingArea project={project} />);
    const table = await screen.findByRole(
      'table',
      { name: /Ranked candidates/ },
      { timeout: 15000 },
    );
    const first = rows()[0]!;
    const why = within(first).getByRole('button', { name: /^Why \(\d+\)$/ });
    expect(why).toHaveAttribute('aria-expanded', 'false');
    expect(within(table).queryAllByRole('listitem')).toHaveLength(0);
    const count = Number(/\((\d+)\)/.exec(why.textContent ?? '')![1]);
    await user.click(why);
    expect(why).toHaveAttribute('aria-expanded', 'true');
    const list = document.getElementById(why.getAttribute('aria-controls')!)!;
    expect(within(first).getByRole('list')).toBe(list);
    // Every reason the screen gave for this candidate, in words (plus the rule behind each flag).
    expect(within(list).getAllByRole('listitem').length).toBeGreaterThanOrEqual(count);
    expect(list).toHaveTextContent(/ΔpKa|pKa/);
    await user.click(why);
    expect(why).toHaveAttribute('aria-expanded', 'false');
    expect(within(table).queryAllByRole('listitem')).toHaveLength(0);
  });

  it('says what is missing when the compound cannot be screened', async () => {
    await projectsRepo.updateCompound(project.id, {
      ...project.compound,
      intrinsicSolubilityMgPerMl: null,
      meltingPointC: null,
    });
    const fresh = (await projectsRepo.get(project.id))!;
    render(<RankingArea project={fresh} />);
    expect(await screen.findByRole('alert', {}, { timeout: 15000 })).toHaveTextContent(
      /Intrinsic solubility S₀: no intrinsic solubility/,
    );
  });
});
