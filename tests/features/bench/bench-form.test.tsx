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
import {
  emptyDraft,
  measurementFromDraft,
  crystallinityOf,
} from '@/features/bench/bench-form-model';

const ids = { projectId: 'p', candidateId: 'c' };

describe('measurement form model', () => {
  it('requires a positive solubility, a medium and a pH in 0–14', () => {
    const r = measurementFromDraft(
      { ...emptyDraft('solubility'), value: '0', medium: ' ', ph: '15' },
      ids,
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.value).toBe('Solubility must be greater than zero');
    expect(r.errors.medium).toMatch(/Name the medium/);
    expect(r.errors.ph).toBe('pH must be at most 14');
  });

  it('rejects text where a number belongs and a temperature above 100 °C', () => {
    const r = measurementFromDraft(
      { ...emptyDraft('solution-enthalpy'), value: 'warm', temperatureC: '120' },
      ids,
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.value).toBe('ΔH_sol must be a number');
    expect(r.errors.temperatureC).toBe('Temperature must be at most 100 °C');
  });

  it('stores temperatures in kelvin (T/K = t/°C + 273.15, SI Brochure 2019) and accepts a decimal comma', () => {
    const r = measurementFromDraft(
      { ...emptyDraft('solubility'), value: '1,25', ph: '1.2', temperatureC: '37' },
      ids,
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.measurement.value).toBe(1.25);
    expect(r.measurement.unit).toBe('mg/mL');
    expect(r.measurement.temperatureK).toBeCloseTo(310.15, 10);
  });

  it('keeps the crystallinity class readable from the stored text', () => {
    const r = measurementFromDraft(
      { ...emptyDraft('crystallinity'), crystallinity: 'amorphous', text: 'XRPD halo' },
      ids,
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.measurement.value).toBeNull();
    expect(crystallinityOf(r.measurement.text)).toBe('amorphous');
  });

  it('asks for the text of a note', () => {
    const r = measurementFromDraft(emptyDraft('note'), ids);
    expect(r.ok).toBe(false);
  });
});

describe('Bench data area', () => {
  let project: ProjectRecord;
  beforeEach(async () => {
    await resetDbForTests();
    project = await projectsRepo.create('Bench test', { ...DEMO_COMPOUND, name: 'Bench test' });
    await candidatesRepo.add(project.id, 'chloride');
    await candidatesRepo.add(project.id, 'mesylate');
  });

  it('shows field messages for a bad entry and stores nothing, then stores a good one', async () => {
    const user = userEvent.setup();
    render(<BenchArea project={project} extras={{ predictionFor: () => 'predicted' }} />);
    const form = await screen.findByRole('form', { name: /New measurement for hydrochloride/ });
    await user.type(within(form).getByLabelText(/^Solubility/), '-3');
    await user.type(within(form).getByLabelText('pH at equilibrium'), 'acid');
    await user.click(within(form).getByRole('button', { name: 'Save measurement' }));
    expect(within(form).getByText('Solubility must be at least 0 mg/mL')).toBeInTheDocument();
    expect(within(form).getByText('pH must be a number')).toBeInTheDocument();
    expect(await measurementsRepo.listForProject(project.id)).toHaveLength(0);

    const value = within(form).getByLabelText(/^Solubility/);
    await user.clear(value);
    await user.type(value, '2.5');
    const ph = within(form).getByLabelText('pH at equilibrium');
    await user.clear(ph);
    await user.type(ph, '1.2');
    await user.click(within(form).getByRole('button', { name: 'Save measurement' }));
    expect(await screen.findByText(/Saved: solubility/)).toBeInTheDocument();
    const table = await screen.findByRole('table', { name: /Measurements for hydrochloride/ });
    expect(within(table).getByText('2.50')).toBeInTheDocument();
    expect(within(table).getByText('predicted')).toBeInTheDocument();
    const stored = await measurementsRepo.listForProject(project.id);
    expect(stored).toHaveLength(1);
    expect(stored[0]).toMatchObject({ kind: 'solubility', value: 2.5, ph: 1.2, medium: 'water' });
  });

  it('switches candidate and kind: a mass gain at 80 % RH for the mesylate', async () => {
    const user = userEvent.setup();
    render(<BenchArea project={project} extras={{ predictionFor: () => null }} />);
    await user.click(await screen.findByRole('button', { name: /mesylate/ }));
    const form = await screen.findByRole('form', { name: /New measurement for mesylate/ });
    await user.selectOptions(within(form).getByLabelText('What was measured'), 'mass-gain-80rh');
    await user.type(within(form).getByLabelText(/Mass gain after 24 h/), '3.1');
    await user.click(within(form).getByRole('button', { name: 'Save measurement' }));
    expect(await screen.findByText(/Saved: mass gain/)).toBeInTheDocument();
    const stored = await measurementsRepo.listForProject(project.id);
    expect(stored[0]).toMatchObject({ kind: 'mass-gain-80rh', value: 3.1, unit: '%' });
  });
});

describe('candidate salt form', () => {
  it('validates the water of crystallisation (0–20, whole or half molecules)', async () => {
    const { hydrateFromText } = await import('@/features/bench/components/CandidateForm');
    expect(hydrateFromText('')).toEqual({ ok: true, value: 0 });
    expect(hydrateFromText('0,5')).toEqual({ ok: true, value: 0.5 });
    expect(hydrateFromText('1.3')).toMatchObject({
      ok: false,
      error: expect.stringMatching(/half molecules/),
    });
    expect(hydrateFromText('25')).toMatchObject({
      ok: false,
      error: expect.stringMatching(/from 0 to 20/),
    });
    expect(hydrateFromText('two')).toMatchObject({
      ok: false,
      error: expect.stringMatching(/must be a number/),
    });
  });

  it('stores a hydrate and removes a candidate with its measurements after a confirmation', async () => {
    await resetDbForTests();
    const p = await projectsRepo.create('Hydrate test', { ...DEMO_COMPOUND, name: 'Hydrate test' });
    const c = await candidatesRepo.add(p.id, 'chloride');
    await candidatesRepo.add(p.id, 'tosylate');
    await measurementsRepo.add({
      projectId: p.id,
      candidateId: c.id,
      kind: 'note',
      value: null,
      unit: '',
      ph: null,
      temperatureK: null,
      medium: '',
      text: 'needles',
    });
    const user = userEvent.setup();
    render(<BenchArea project={p} extras={{ predictionFor: () => null }} />);
    const water = await screen.findByLabelText(/Water of crystallisation/);
    await user.clear(water);
    await user.type(water, '1');
    await waitFor(async () =>
      expect((await candidatesRepo.listForProject(p.id))[0]?.hydrateWater).toBe(1),
    );
    await user.click(screen.getByRole('button', { name: 'Remove from shortlist…' }));
    expect(screen.getByRole('group', { name: /Confirm removing hydrochloride/ })).toHaveTextContent(
      /and its 1 measurement\?/,
    );
    await user.click(screen.getByRole('button', { name: 'Remove' }));
    await waitFor(async () =>
      expect((await candidatesRepo.listForProject(p.id)).map((x) => x.ionId)).toEqual(['tosylate']),
    );
    expect(await measurementsRepo.listForProject(p.id)).toHaveLength(0);
  });
});

describe('deleting a measurement', () => {
  it('offers an undo that puts the record back unchanged', async () => {
    await resetDbForTests();
    const p = await projectsRepo.create('Undo test', { ...DEMO_COMPOUND, name: 'Undo test' });
    const c = await candidatesRepo.add(p.id, 'chloride');
    const m = await measurementsRepo.add({
      projectId: p.id,
      candidateId: c.id,
      kind: 'melting-point',
      value: 212,
      unit: '°C',
      ph: null,
      temperatureK: null,
      medium: '',
      text: 'DSC onset',
    });
    const user = userEvent.setup();
    render(<BenchArea project={p} extras={{ predictionFor: () => null }} />);
    await user.click(await screen.findByRole('button', { name: /Delete melting point 212/ }));
    await waitFor(async () => expect(await measurementsRepo.listForProject(p.id)).toHaveLength(0));
    await user.click(await screen.findByRole('button', { name: 'Undo delete' }));
    await waitFor(async () => expect(await measurementsRepo.listForProject(p.id)).toEqual([m]));
  });
});
