import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import Papa from 'papaparse';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { measurementsRepo } from '@/persistence/measurements-repo';
import { screenPlansRepo } from '@/persistence/screen-plans-repo';
import { ScreenPlanArea } from '@/features/screen-plan/components/ScreenPlanArea';
import { ScreenOutcomesPanel } from '@/components/ScreenOutcomesPanel';
import { pickListCsv } from '@/features/screen-plan/screen-plan-model';
import { parseEquivalents } from '@/features/screen-plan/components/PlanForm';
import { layOutPlan } from '@/screening-data/use-screen-outcomes';
import { DEMO_SCREEN_PLAN } from '@/persistence/demo-project';

beforeEach(async () => {
  await resetDbForTests();
});

async function demo() {
  const id = await projectsRepo.resetDemo();
  return (await projectsRepo.get(id))!;
}

describe('salt screen area', () => {
  it('shows the demo plan on its plate, records an outcome and sends its melting point to the bench', async () => {
    const project = await demo();
    const user = userEvent.setup();
    render(<ScreenPlanArea project={project} />);
    // 4 counter-ions × 4 solvents × 1 equivalents level × 1 method = 16 wells on the 24-well plate
    expect(
      await screen.findByRole('heading', { name: /16 wells on a 24-well plate/ }),
    ).toBeTruthy();
    expect(screen.getByText(/corrosive/)).toBeTruthy();
    // the Class 2 solvent note is absent: the demo's solvents are all Class 3 (ICH Q3C Table 3)
    const well = screen.getByRole('button', { name: /^A5: Mesylate in Ethanol$/ });
    await user.click(well);
    const form = screen.getByRole('region', { name: /Outcome of well A5/ });
    await user.selectOptions(within(form).getByLabelText('What came out'), 'new-crystalline-form');
    await user.type(within(form).getByLabelText(/Melting point/), '212');
    await user.click(within(form).getByRole('button', { name: 'Record outcome' }));
    await waitFor(async () => {
      const rec = await screenPlansRepo.forProject(project.id);
      expect(rec?.outcomes.A5).toMatchObject({
        outcome: 'new-crystalline-form',
        meltingPointC: 212,
        counterIonId: 'mesylate',
        solventId: 'ethanol',
      });
    });
    await user.click(
      within(form).getByRole('button', { name: 'Send melting point to bench data' }),
    );
    await waitFor(async () => {
      const ms = await measurementsRepo.listForProject(project.id);
      expect(ms).toHaveLength(1);
      expect(ms[0]).toMatchObject({ kind: 'melting-point', value: 212, unit: '°C' });
    });
  });

  it('says which field is wrong when the plan does not fit the plate, and does not store it', async () => {
    const project = await demo();
    const user = userEvent.setup();
    render(<ScreenPlanArea project={project} />);
    await screen.findByRole('heading', { name: /16 wells/ }, { timeout: 5000 });
    await user.click(screen.getByLabelText('cooling'));
    expect((await screen.findByRole('alert')).textContent).toMatch(
      /^plan\.plate: the plan needs 32 wells/,
    );
    await new Promise((r) => setTimeout(r, 400)); // longer than the save delay (250 ms)
    expect((await screenPlansRepo.forProject(project.id))!.plan.methods).toEqual(['slurry']);
    await user.selectOptions(screen.getByLabelText('Plate'), '48');
    expect(
      await screen.findByRole('heading', { name: /32 wells on a 48-well plate/ }),
    ).toBeTruthy();
    await waitFor(async () =>
      expect((await screenPlansRepo.forProject(project.id))?.plan.plate).toBe(48),
    );
  });
});

describe('outcome summary beside the ranking', () => {
  it('appears once an outcome is recorded and flags an ion whose wells gave no crystalline salt', async () => {
    const project = await demo();
    const rec = (await screenPlansRepo.forProject(project.id))!;
    const { container } = render(<ScreenOutcomesPanel project={project} />);
    await new Promise((r) => setTimeout(r, 50));
    expect(container.textContent).toBe('');
    // the demo's maleate wells, found from the layout
    const laid = layOutPlan(project, DEMO_SCREEN_PLAN, [], []);
    const maleate = laid.plan!.wells.filter((w) => w.counterIonId === 'maleate');
    for (const w of maleate) {
      await screenPlansRepo.recordOutcome(rec.id, w.well, {
        outcome: 'oil-or-gum',
        meltingPointC: null,
        note: '',
        counterIonId: 'maleate',
        solventId: w.solventId,
      });
    }
    // The summary follows the stored outcomes live: wait until it has seen all four.
    await waitFor(
      () => {
        const row = screen.getByRole('row', { name: /Maleate/ });
        expect(row.textContent).toMatch(/4 of 4/);
        expect(row.textContent).toMatch(/no crystalline salt yet/);
      },
      { timeout: 10000 },
    );
  });
});

describe('pick list CSV and the equivalents field', () => {
  it('writes one row per well, the cautions, and guards formula-like text', async () => {
    const project = await demo();
    const laid = layOutPlan(project, DEMO_SCREEN_PLAN, [], []);
    const csv = pickListCsv(laid.plan!);
    const [table] = csv.split('\n# ');
    const rows = Papa.parse<Record<string, string>>(table!, { header: true }).data;
    expect(rows).toHaveLength(16);
    expect(rows[0]).toMatchObject({
      well: 'A1',
      counter_ion: 'chloride',
      counter_ion_dosing: 'stock',
    });
    expect(csv).toMatch(/# Strong acids and bases/);
  });
  it('parses levels and refuses nonsense', () => {
    expect(parseEquivalents('')).toBeUndefined();
    expect(parseEquivalents('0.5, 1.05')).toEqual([0.5, 1.05]);
    expect(parseEquivalents('0')).toBeNull();
    expect(parseEquivalents('1 2 3 4 5')).toBeNull();
  });
});
