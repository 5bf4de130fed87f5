import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import Papa from 'papaparse';
import { parseScreeningSettings } from '@/chem';
import { CAUTION_LINES } from '@/components/Cautions';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { projectSettingsSchema, type ProjectRecord } from '@/persistence/records';
import { RankingArea } from '@/features/ranking/components/RankingArea';
import { conditionsDraftOf, conditionsFromDraft } from '@/features/ranking/settings-form-model';
import { log10MolarFromMgPerMl, profileToCsv } from '@/features/ranking/ph-profile-csv';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import {
  microenvironmentPhStatedOf,
  screeningSettingsOf,
} from '@/screening-data/screening-settings';
import { useRankingViewStore } from '@/stores/ranking-view-store';

describe('microenvironment pH: stated or assumed', () => {
  it('keeps stored explicit values: a value other than the old default 7 counts as stated', () => {
    // Records written before the flag existed carry only the number.
    expect(
      microenvironmentPhStatedOf(projectSettingsSchema.parse({ microenvironmentPh: 5.5 })),
    ).toBe(true);
    expect(microenvironmentPhStatedOf(projectSettingsSchema.parse({}))).toBe(false);
    // Once written, the flag decides (a stated 7 stays stated).
    expect(
      microenvironmentPhStatedOf(
        projectSettingsSchema.parse({ microenvironmentPh: 7, microenvironmentPhStated: true }),
      ),
    ).toBe(true);
  });

  it('an empty field means "not stated": 7 is assumed, a number is stated', () => {
    const project = projectSettingsSchema.parse({ microenvironmentPh: 6 });
    const settings = parseScreeningSettings({});
    const draft = conditionsDraftOf(project, settings);
    expect(draft.microenvironmentPh).toBe('6');
    const cleared = conditionsFromDraft({ ...draft, microenvironmentPh: ' ' }, project, settings);
    expect(cleared.ok).toBe(true);
    if (!cleared.ok) return;
    expect(cleared.projectSettings).toMatchObject({
      microenvironmentPh: 7,
      microenvironmentPhStated: false,
    });
    expect(cleared.screening.microenvironmentPhStated).toBe(false);
    const stated = conditionsFromDraft({ ...draft, microenvironmentPh: '7' }, project, settings);
    expect(stated.ok && stated.projectSettings.microenvironmentPhStated).toBe(true);
    // A new project's field starts empty: nothing is stated yet.
    expect(conditionsDraftOf(projectSettingsSchema.parse({}), settings).microenvironmentPh).toBe(
      '',
    );
  });
});

describe('Ranking: excipients, biorelevant presets and the profile CSV', () => {
  let project: ProjectRecord;
  beforeEach(async () => {
    await resetDbForTests();
    useRankingViewStore.setState({
      sortKey: 'rank',
      sortDir: 'asc',
      chartIds: null,
      focusCandidateId: null,
    });
    project = await projectsRepo.create('Excipient test', {
      ...DEMO_COMPOUND,
      name: 'Excipient test',
      smiles: '',
    });
    for (const ion of ['chloride', 'mesylate']) await candidatesRepo.add(project.id, ion);
  });

  it('stores the chosen excipients and shows each salt against them, with a summary in words', async () => {
    const user = userEvent.setup();
    const view = render(<RankingArea project={project} />);
    const panel = (
      await screen.findByRole(
        'heading',
        { name: 'Excipients’ microenvironment' },
        { timeout: 15000 },
      )
    ).closest('section')!;
    expect(within(panel).getByText(/No excipients chosen/)).toBeInTheDocument();
    await user.click(within(panel).getByRole('checkbox', { name: /Magnesium stearate/ }));
    await waitFor(async () => {
      const stored = (await projectsRepo.get(project.id))!;
      expect(screeningSettingsOf(stored).excipients).toEqual(['magnesium-stearate']);
    });
    view.rerender(<RankingArea project={(await projectsRepo.get(project.id))!} />);
    const grid = await within(panel).findByRole(
      'table',
      { name: /Conversion risk of each salt/ },
      { timeout: 15000 },
    );
    expect(
      within(grid).getByRole('columnheader', { name: /Magnesium stearate/ }),
    ).toHaveTextContent('pH 8.0–10.0');
    // The demo base's salts have pH_max well below 8, so magnesium stearate is likely to convert them.
    await waitFor(() => {
      const rows = within(grid).getAllByRole('row').slice(1);
      expect(rows).toHaveLength(2);
      for (const r of rows) expect(r).toHaveTextContent('conversion likely');
    });
    expect(
      within(panel).getByText(/Conversion likely: .*with Magnesium stearate/),
    ).toBeInTheDocument();
    expect(within(panel).getByText(/share of the blend.*not modelled/)).toBeInTheDocument();
  });

  it('adds FaSSIF in one click, with its composition and bile-salt solubilisation said as not modelled', async () => {
    const user = userEvent.setup();
    const view = render(<RankingArea project={project} />);
    const add = await screen.findByRole(
      'button',
      { name: 'Add FaSSIF (pH 6.5)' },
      { timeout: 15000 },
    );
    expect(
      screen.getAllByText(/Not modelled: solubilisation by the bile salt/).length,
    ).toBeGreaterThan(0);
    expect(
      screen.getByText(/phosphate 28.65 mM.*sodium taurocholate 3 mM, lecithin 0.75 mM/),
    ).toBeInTheDocument();
    await user.click(add);
    await waitFor(async () => {
      const stored = (await projectsRepo.get(project.id))!;
      expect(screeningSettingsOf(stored).media.map((m) => m.label)).toEqual(['FaSSIF']);
    });
    view.rerender(<RankingArea project={(await projectsRepo.get(project.id))!} />);
    const table = await screen.findByRole(
      'table',
      { name: 'Solubility in your media' },
      { timeout: 15000 },
    );
    await waitFor(
      () => expect(screen.getByRole('button', { name: 'Add FaSSIF (pH 6.5)' })).toBeDisabled(),
      { timeout: 15000 },
    );
    expect(within(table).getByRole('columnheader', { name: /FaSSIF/ })).toHaveTextContent('pH 6.5');
  });

  it('writes the pH profile as CSV: the grid, mg/mL and log10 mol/L per series, then the cautions', async () => {
    const stored = (await projectsRepo.get(project.id))!;
    const data = await computeProjectScreening({
      project: stored,
      candidates: await candidatesRepo.listForProject(project.id),
      measurements: [],
      customIons: [],
    });
    const salts = data.screen.rows.filter((r) => !r.error);
    const csv = profileToCsv({
      data,
      salts,
      labels: {},
      generatedAt: '2026-12-03T07:00:00.000Z',
      appVersion: 'test',
    });
    const parsed = Papa.parse<unknown[]>(csv, { dynamicTyping: true, skipEmptyLines: false }).data;
    const head = parsed[0] as string[];
    expect(head[0]).toBe('pH');
    expect(head[1]).toMatch(/Free base: solubility \(mg\/mL\)/);
    expect(head).toHaveLength(3 + 3 * salts.length);
    const first = parsed[1] as number[];
    const ff = data.screen.freeForm.profile[0]!;
    expect(first[0]).toBe(Number(ff.pH.toPrecision(6)));
    // log10 mol/L = log10((mg/mL = g/L) / M_free), by hand from the same point.
    expect(first[2]).toBeCloseTo(
      Math.log10(ff.solubilityMgPerMl / data.drugIon.freeFormMolarMassGPerMol),
      4,
    );
    expect(log10MolarFromMgPerMl(300, 300)).toBe(0); // 300 mg/mL of a 300 g/mol drug = 1 mol/L
    expect(parsed.length).toBeGreaterThan(
      data.screen.freeForm.profile.length + CAUTION_LINES.length,
    );
    expect(csv).toContain(`Caution: ${CAUTION_LINES[0]}`);
  });
});
