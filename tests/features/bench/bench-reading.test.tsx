import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { measurementsRepo } from '@/persistence/measurements-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import type { ProjectRecord } from '@/persistence/records';
import { BenchArea } from '@/features/bench/components/BenchArea';
import { BenchWorkspace } from '@/features/bench/components/BenchWorkspace';
import { emptyDraft, measurementFromDraft } from '@/features/bench/bench-form-model';

// The bench records the solid left at equilibrium and shows how each solubility was read. The
// compound is the fictional demo one (formula only, so no structure parser is needed), its pKa 7.8 and
// S₀ 0.015 mg/mL stated as measured. The pH 7.6 value is the hand-computed case of
// tests/chem/screening/bench-solubility.test.ts: read as the salt's it would put pH_max at 7.2, below
// the pH it was measured at; read as the free form's it implies S₀ = 0.0853049/(1 + 10^(7.8 − 7.6)) =
// 0.0330013 mg/mL.
describe('bench form: the solid left at equilibrium', () => {
  it('is stored with a solubility when stated, and left out when not checked', () => {
    const ids = { projectId: 'p', candidateId: 'c' };
    const stated = measurementFromDraft(
      { ...emptyDraft('solubility'), value: '2', ph: '7.6', solidForm: 'free-form' },
      ids,
    );
    expect(stated.ok && stated.measurement.solidForm).toBe('free-form');
    const unstated = measurementFromDraft(
      { ...emptyDraft('solubility'), value: '2', ph: '7.6' },
      ids,
    );
    expect(unstated.ok && 'solidForm' in unstated.measurement).toBe(false);
    const other = measurementFromDraft(
      { ...emptyDraft('melting-point'), value: '200', solidForm: 'salt' },
      ids,
    );
    expect(other.ok && 'solidForm' in other.measurement).toBe(false);
  });
});

describe('Bench data: how a solubility was read', () => {
  let project: ProjectRecord;
  beforeEach(async () => {
    await resetDbForTests();
    project = await projectsRepo.create('Reading test', {
      ...DEMO_COMPOUND,
      name: 'Reading test',
      smiles: '',
    });
    await candidatesRepo.add(project.id, 'besylate');
  });

  it('the form stores pH, °C and the solid stated', async () => {
    const user = userEvent.setup();
    render(<BenchArea project={project} extras={{ predictionFor: () => '' }} />);
    const form = await screen.findByRole('form', { name: /New measurement for besylate/ });
    await user.type(within(form).getByLabelText(/^Solubility/), '0.12');
    await user.type(within(form).getByLabelText('pH at equilibrium'), '7.6');
    const t = within(form).getByLabelText(/^Temperature/);
    await user.clear(t);
    await user.type(t, '25');
    await user.selectOptions(within(form).getByLabelText('Solid left at equilibrium'), 'salt');
    await user.click(within(form).getByRole('button', { name: 'Save measurement' }));
    await screen.findByText(/Saved: solubility/);
    const [m] = await measurementsRepo.listForProject(project.id);
    expect(m).toMatchObject({ ph: 7.6, solidForm: 'salt' });
    expect(m!.temperatureK).toBeCloseTo(298.15, 10); // 25 + 273.15 (SI Brochure 2019)
    const table = await screen.findByRole('table', { name: /Measurements for besylate/ });
    expect(within(table).getByText(/solid left: salt/)).toBeInTheDocument();
  });

  it('a pH 7.6 value reads "limits: free form" with its implied S₀, and "Use as S₀" takes it to the compound', async () => {
    const [cand] = await candidatesRepo.listForProject(project.id);
    await measurementsRepo.add({
      projectId: project.id,
      candidateId: cand!.id,
      kind: 'solubility',
      value: 0.0853049,
      unit: 'mg/mL free form',
      ph: 7.6,
      temperatureK: 310.15,
      medium: 'water',
      text: '',
    });
    const user = userEvent.setup();
    render(<BenchWorkspace project={project} />);
    const table = await screen.findByRole('table', { name: /Measurements for besylate/ });
    await within(table).findByText('limits: free form', undefined, { timeout: 15000 });
    expect(within(table).getByText(/S₀ ≈ 0\.033 mg\/mL/)).toBeInTheDocument();
    await user.click(within(table).getByRole('button', { name: 'Use as S₀' }));
    await waitFor(async () => {
      const stored = (await projectsRepo.get(project.id))!.compound;
      expect(stored.intrinsicSolubilityMgPerMl).toBe(0.033);
      expect(stored.intrinsicSolubilityOrigin).toBe('measured');
    });
    const [m] = await measurementsRepo.listForProject(project.id);
    expect(m!.solidForm).toBe('free-form');
  });
});
