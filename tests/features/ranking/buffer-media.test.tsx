import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import type { ProjectRecord } from '@/persistence/records';
import { RankingArea } from '@/features/ranking/components/RankingArea';
import { bufferFromDraft, EMPTY_BUFFER } from '@/features/ranking/buffer-media-model';
import { screeningSettingsOf } from '@/screening-data/screening-settings';
import { useRankingViewStore } from '@/stores/ranking-view-store';

describe('buffer form model', () => {
  it('names each bad field and its accepted range (pH scale 0–14)', () => {
    const r = bufferFromDraft({ ...EMPTY_BUFFER, pH: '15', concentrationM: 'lots' }, []);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.label).toBe('Give the medium a name');
    expect(r.errors.pH).toBe('pH must be from 0 to 14');
    expect(r.errors.ionId).toMatch(/Choose the counter-ion/);
    expect(r.errors.concentrationM).toBe('Concentration must be a number');
  });

  it('makes a medium with the counter-ion as its common ion; ionic strength defaults to its concentration', () => {
    const r = bufferFromDraft(
      {
        label: 'Acetate buffer',
        pH: '4,5',
        ionId: 'acetate',
        concentrationM: '0.05',
        ionicStrengthM: '',
      },
      [],
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.medium).toMatchObject({
      label: 'Acetate buffer',
      pH: 4.5,
      ions: { acetate: 0.05 },
      ionicStrengthM: 0.05,
    });
    const dup = bufferFromDraft(
      {
        label: 'acetate BUFFER',
        pH: '5',
        ionId: 'acetate',
        concentrationM: '0.1',
        ionicStrengthM: '',
      },
      [r.medium],
    );
    expect(dup.ok).toBe(false);
  });
});

describe('Your dissolution media (Ranking area)', () => {
  let project: ProjectRecord;
  beforeEach(async () => {
    await resetDbForTests();
    useRankingViewStore.setState({
      sortKey: 'rank',
      sortDir: 'asc',
      chartIds: null,
      focusCandidateId: null,
    });
    project = await projectsRepo.create('Buffer test', {
      ...DEMO_COMPOUND,
      name: 'Buffer test',
      smiles: '',
    });
    for (const ion of ['chloride', 'mesylate']) await candidatesRepo.add(project.id, ion);
  });

  it('refuses a bad medium at its fields, stores a good one, and screens every candidate in it', async () => {
    const user = userEvent.setup();
    const view = render(<RankingArea project={project} />);
    const form = await screen.findByRole(
      'form',
      { name: 'Add a dissolution medium' },
      { timeout: 15000 },
    );
    await user.click(within(form).getByRole('button', { name: 'Add medium' }));
    expect(within(form).getByText('Give the medium a name')).toBeInTheDocument();
    expect((await projectsRepo.get(project.id))!.settings.extra.screening).toBeUndefined();

    await user.type(within(form).getByLabelText('Medium name'), 'Mesylate buffer');
    await user.type(within(form).getByLabelText('pH'), '3');
    await user.selectOptions(within(form).getByLabelText('Counter-ion in it'), 'mesylate');
    await user.type(within(form).getByLabelText(/Its concentration/), '0.2');
    await user.click(within(form).getByRole('button', { name: 'Add medium' }));
    await waitFor(async () =>
      expect(screeningSettingsOf((await projectsRepo.get(project.id))!).media).toHaveLength(1),
    );

    view.rerender(<RankingArea project={(await projectsRepo.get(project.id))!} />);
    const table = await screen.findByRole(
      'table',
      { name: 'Solubility in your media' },
      { timeout: 15000 },
    );
    const bodyRows = within(table).getAllByRole('row').slice(1);
    expect(bodyRows).toHaveLength(2);
    for (const row of bodyRows)
      expect(within(row).getAllByRole('cell')[0]!.textContent).toMatch(/^\d/);
  });
});
