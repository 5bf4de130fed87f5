import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { CounterIonsPanel } from '@/features/counter-ions/components/CounterIonsPanel';
import { useCounterIonsViewStore } from '@/features/counter-ions/counter-ions-store';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import type { Compound } from '@/chem';

/** A user-typed compound for the UI: a base with pKa(BH⁺) 8.0 (input, not an expected value). */
const compound: Compound = {
  name: 'Test base',
  smiles: '',
  formula: 'C10H15N',
  kind: 'base',
  pKas: [{ value: 8.0, origin: 'measured' }],
  ionCharge: 1,
  intrinsicSolubilityMgPerMl: null,
  meltingPointC: null,
  logP: null,
  logPOrigin: null,
  doseMg: null,
  densityGPerCm3: null,
  notes: '',
};

beforeEach(async () => {
  await resetDbForTests();
  useCounterIonsViewStore.getState().reset();
});

async function setup() {
  const project = await projectsRepo.create('UI test', compound);
  const user = userEvent.setup();
  render(<CounterIonsPanel project={project} />);
  const table = await screen.findByRole('table', { name: 'Counter-ion library' });
  return { project, user, table };
}

describe('Counter-ions area', () => {
  it('lists the anions for a base with ΔpKa and the verdict; the search narrows by formula', async () => {
    const { user, table } = await setup();
    const row = within(table)
      .getByRole('rowheader', { name: /^Mesylate/ })
      .closest('tr')!;
    // 8.0 − (−1.2) = 9.2: methanesulfonic acid pKa as bundled (Stahl & Wermuth, from memory).
    expect(within(row).getByText(/9\.2 · salt expected/)).toBeInTheDocument();
    expect(within(table).queryByRole('rowheader', { name: /^Sodium/ })).toBeNull();
    await user.type(screen.getByLabelText('Search counter-ions'), 'C7H7O3S');
    expect(
      within(table)
        .getAllByRole('rowheader')
        .map((h) => h.textContent),
    ).toEqual(['Tosylate']);
  });

  it('filters by minimum ΔpKa and says when the filter is not a number', async () => {
    const { user, table } = await setup();
    await user.type(screen.getByLabelText('Minimum ΔpKa'), '5');
    expect(within(table).queryByRole('rowheader', { name: /^Acetate/ })).toBeNull();
    expect(within(table).getByRole('rowheader', { name: /^Chloride/ })).toBeInTheDocument();
    await user.clear(screen.getByLabelText('Minimum ΔpKa'));
    await user.type(screen.getByLabelText('Minimum ΔpKa'), 'x');
    expect(screen.getByText('Minimum ΔpKa must be a number')).toBeInTheDocument();
  });

  it('adds a chosen salt form to the shortlist', async () => {
    const { user, table, project } = await setup();
    const row = within(table)
      .getByRole('rowheader', { name: /^Sulfate/ })
      .closest('tr')!;
    await user.click(
      within(row).getByRole('button', {
        name: /Add Sulfate \(hemisulfate \(2:1\)\) to the shortlist/,
      }),
    );
    expect(await within(row).findByText('On shortlist')).toBeInTheDocument();
    const list = await candidatesRepo.listForProject(project.id);
    expect(list).toMatchObject([{ ionId: 'sulfate', drugPerSalt: 2, counterIonPerSalt: 1 }]);
  });

  it('shows a shortlisted salt form with its stoichiometry, and takes it off after a second yes (issue 19)', async () => {
    const { user, table, project } = await setup();
    const row = () =>
      within(table)
        .getByRole('rowheader', { name: /^Sulfate/ })
        .closest('tr')!;
    await user.click(
      within(row()).getByRole('button', {
        name: /Add Sulfate \(hemisulfate \(2:1\)\) to the shortlist/,
      }),
    );
    // Two drug ions per sulfate: the order of the numbers is said in words.
    expect(
      await within(row()).findByText('hemisulfate, 2:1 (drug:counter-ion)'),
    ).toBeInTheDocument();
    await user.click(within(row()).getByRole('button', { name: /Remove Sulfate .* shortlist/ }));
    await user.click(within(row()).getByRole('button', { name: 'Keep' }));
    expect(await candidatesRepo.listForProject(project.id)).toHaveLength(1);
    await user.click(within(row()).getByRole('button', { name: /Remove Sulfate .* shortlist/ }));
    await user.click(within(row()).getByRole('button', { name: 'Remove' }));
    await waitFor(async () => expect(await candidatesRepo.listForProject(project.id)).toEqual([]));
    expect(
      await within(row()).findByRole('button', { name: /Add Sulfate .* to the shortlist/ }),
    ).toBeInTheDocument();
  });

  it('writes a 1:1 form as "1:1" and a 2:1 form with the order named', async () => {
    const { stoichiometryWords } = await import('@/features/counter-ions/components/ShortlistCell');
    expect(stoichiometryWords({ drugPerSalt: 1, counterIonPerSalt: 1 })).toBe('1:1');
    expect(stoichiometryWords({ drugPerSalt: 2, counterIonPerSalt: 1 })).toBe(
      '2:1 (drug:counter-ion)',
    );
  });

  it('adds an in-house ion (validated) and marks it in-house', async () => {
    const { user, table } = await setup();
    await user.click(screen.getByText('Add an in-house counter-ion'));
    await user.type(screen.getByLabelText('Ion name'), 'Lab sulfonate');
    await user.type(screen.getByLabelText('Ion formula'), 'C3Qq');
    await user.type(screen.getByLabelText('pKa values of the parent'), '-1.5');
    await user.click(screen.getByRole('button', { name: 'Save in-house ion' }));
    expect(await screen.findByText(/unknown element 'Qq'/)).toBeInTheDocument();
    expect(await customIonsRepo.listAll()).toEqual([]);
    await user.clear(screen.getByLabelText('Ion formula'));
    await user.type(screen.getByLabelText('Ion formula'), 'C3H7O3S');
    await user.click(screen.getByRole('button', { name: 'Save in-house ion' }));
    expect(await screen.findByText(/Saved “Lab sulfonate”/)).toBeInTheDocument();
    const header = await within(table).findByRole('rowheader', { name: /^Lab sulfonate/ });
    expect(within(header).getByText('in-house')).toBeInTheDocument();
  });

  it('edits a bundled value for this project, marks it, and restores the original', async () => {
    const { user, table } = await setup();
    await user.click(within(table).getByRole('button', { name: 'Acetate' }));
    const form = screen.getByRole('form', { name: 'Edit Acetate for this project' });
    const pka = within(form).getByLabelText('pKa values');
    await user.clear(pka);
    await user.type(pka, '4.5');
    await user.click(within(form).getByRole('button', { name: 'Save for this project' }));
    const header = await within(table).findByRole('rowheader', {
      name: /^Acetate.*edited for this project/,
    });
    expect(within(header.closest('tr')!).getByText('4.50')).toBeInTheDocument();
    // The bundled value (4.76, aqion table) is still shown as the original.
    expect(await screen.findByText(/Bundled: pKa 4\.76/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Restore bundled values' }));
    expect(await within(table).findByRole('rowheader', { name: 'Acetate' })).toBeInTheDocument();
  });
});

describe('Counter-ions area: removing an in-house ion', () => {
  it('asks once more, then removes it from the library', async () => {
    const { user, table } = await setup();
    await user.click(screen.getByText('Add an in-house counter-ion'));
    await user.type(screen.getByLabelText('Ion name'), 'Temporary acid');
    await user.type(screen.getByLabelText('Ion formula'), 'C2H3O2');
    await user.type(screen.getByLabelText('pKa values of the parent'), '4.8');
    await user.click(screen.getByRole('button', { name: 'Save in-house ion' }));
    await user.click(await within(table).findByRole('button', { name: 'Temporary acid' }));
    await user.click(screen.getByRole('button', { name: 'Remove…' }));
    await user.click(screen.getByRole('button', { name: 'Remove in-house ion' }));
    await waitFor(() =>
      expect(within(table).queryByRole('rowheader', { name: /Temporary acid/ })).toBeNull(),
    );
    expect(await customIonsRepo.listAll()).toEqual([]);
  });
});

describe('Counter-ions area: reference ions', () => {
  it('hides ions bundled only for the thermochemistry models unless asked', async () => {
    const { user, table } = await setup();
    expect(within(table).queryByRole('rowheader', { name: /^Perchlorate/ })).toBeNull();
    await user.click(screen.getByLabelText(/Include reference ions/));
    const header = await within(table).findByRole('rowheader', { name: /^Perchlorate/ });
    expect(within(header).getByText('reference only')).toBeInTheDocument();
  });
});

describe('an unreadable stored in-house record (issue 13)', () => {
  it('is named once with its reason; acknowledged, it is not reported again in any project', async () => {
    const { getDb } = await import('@/persistence/db');
    await getDb().customIons.put({
      id: 'inhouse_bad',
      schemaVersion: 1,
      projectId: null,
      overridesIonId: null,
      ion: { name: 5 },
      updatedAt: 'x',
    });
    const { user, table } = await setup();
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('inhouse_bad');
    // The library itself still works.
    expect(within(table).getAllByRole('row').length).toBeGreaterThan(10);
    await user.click(screen.getByRole('button', { name: 'Keep them, stop telling me' }));
    await waitFor(() => expect(screen.queryByRole('alert')).not.toBeInTheDocument());
    const other = await projectsRepo.create('Another project', compound);
    render(<CounterIonsPanel project={other} />);
    await screen.findAllByRole('table', { name: 'Counter-ion library' });
    expect(screen.queryByText(/inhouse_bad/)).not.toBeInTheDocument();
  });
});
