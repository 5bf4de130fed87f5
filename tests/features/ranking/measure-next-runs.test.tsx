import { beforeEach, describe, expect, it, vi } from 'vitest';
import { render, screen } from '@testing-library/react';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import type { ProjectRecord } from '@/persistence/records';
import { RankingArea } from '@/features/ranking/components/RankingArea';
import type * as Protocol from '@/screening-data/measure-next-protocol';
import { useRankingViewStore } from '@/stores/ranking-view-store';

// Issue 20: "Measure next" appears after one run when the Ranking area opens. The weights taken over
// from the stored project on opening were a new object with the same values, which restarted the run
// (and the robustness one) a moment after the table: the list then waited for a second whole run.
const runs = vi.hoisted(() => ({ n: 0 }));
vi.mock('@/screening-data/measure-next-protocol', async (importOriginal) => {
  const real = await importOriginal<typeof Protocol>();
  return {
    ...real,
    runMeasureNext: (...args: Parameters<typeof real.runMeasureNext>) => {
      runs.n++;
      return real.runMeasureNext(...args);
    },
  };
});

describe('Ranking area: Measure next runs once on opening', () => {
  let project: ProjectRecord;
  beforeEach(async () => {
    await resetDbForTests();
    useRankingViewStore.setState({ sortKey: 'rank', sortDir: 'asc', focusCandidateId: null });
    project = await projectsRepo.create('Runs test', {
      ...DEMO_COMPOUND,
      name: 'Runs test',
      smiles: '',
    });
    for (const ion of ['chloride', 'tosylate', 'mesylate'])
      await candidatesRepo.add(project.id, ion);
    runs.n = 0;
  });

  it('one run, not restarted when the stored weights are taken over unchanged', async () => {
    render(<RankingArea project={project} />);
    await screen.findByRole('table', { name: /Ranked candidates/ }, { timeout: 15000 });
    const panel = await screen.findByRole('region', { name: 'Measure next' });
    await vi.waitFor(() => expect(panel).toHaveTextContent(/computed in \d+ ms/), {
      timeout: 15000,
    });
    // Past the settle delays of the weights (0.4 s) and of the list (0.12 s).
    await new Promise((r) => setTimeout(r, 1000));
    expect(runs.n).toBe(1);
  });
});
