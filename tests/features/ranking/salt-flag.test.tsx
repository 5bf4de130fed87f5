import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { RankingArea } from '@/features/ranking/components/RankingArea';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import { useRankingViewStore } from '@/stores/ranking-view-store';

// Issue 10: "likely poorly soluble" is about the salt itself — its own solubility in water against the
// dose in 250 mL (ICH M9 volume). The dose is placed between the two salts' estimated solubilities,
// taken from the screen itself, so the test needs no invented expected value: the less soluble salt
// must carry the flag and the other must not. The compound is the fictional demo one (formula only).
describe('Ranking: the likely-poorly-soluble flag is about the salt’s own solubility', () => {
  beforeEach(async () => {
    await resetDbForTests();
    useRankingViewStore.setState({
      sortKey: 'rank',
      sortDir: 'asc',
      chartIds: null,
      focusCandidateId: null,
    });
  });

  it('flags the salt that cannot carry the dose in 250 mL and not the one that can', async () => {
    const compound = { ...DEMO_COMPOUND, name: 'Flag test', smiles: '' };
    const project = await projectsRepo.create('Flag test', compound);
    await candidatesRepo.add(project.id, 'chloride');
    await candidatesRepo.add(project.id, 'napsylate');
    const candidates = await candidatesRepo.listForProject(project.id);
    const probe = await computeProjectScreening({
      project,
      candidates,
      measurements: [],
      customIons: [],
    });
    const ffOf = (ion: string) =>
      probe.screen.rows.find((r) => r.counterIonId === ion)!.saltWaterSolubility!.mgPerMlAsFreeForm;
    const [hcl, nap] = [ffOf('chloride'), ffOf('napsylate')];
    expect(nap).toBeLessThan(hcl); // the aromatic sulfonate is estimated less soluble
    const doseMg = 250 * Math.sqrt(hcl * nap);
    await projectsRepo.updateCompound(project.id, {
      ...compound,
      doseMg: Number(doseMg.toPrecision(6)),
    });

    render(<RankingArea project={(await projectsRepo.get(project.id))!} />);
    const table = await screen.findByRole(
      'table',
      { name: /Ranked candidates/ },
      { timeout: 15000 },
    );
    const rowOf = (name: RegExp) =>
      within(table)
        .getAllByRole('row')
        .find((r) => name.test(r.textContent ?? ''))!;
    expect(rowOf(/napsylate/i).textContent).toMatch(/likely poorly soluble salt/);
    expect(rowOf(/chloride/i).textContent).not.toMatch(/likely poorly soluble salt/);
    expect(within(table).getByRole('columnheader', { name: /Salt in water/ })).toBeInTheDocument();
  });
});
