import { beforeEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import type { ProjectRecord } from '@/persistence/records';
import { RankingArea } from '@/features/ranking/components/RankingArea';
import type * as Panel from '@/features/ranking/components/MeasureNextPanel';
import { useRankingViewStore } from '@/stores/ranking-view-store';

// Issue 20: a slider step re-renders the table, not the panels below it ("Measure next", robustness,
// media, chart), which follow the weights once the movement ends. The "Measure next" panel is
// wrapped to note the tablet-mass weight of each render it gets from the area.
const panelWeights = vi.hoisted(() => [] as number[]);
vi.mock('@/features/ranking/components/MeasureNextPanel', async (importOriginal) => {
  const real = await importOriginal<typeof Panel>();
  return {
    ...real,
    MeasureNextPanel: (props: Parameters<typeof real.MeasureNextPanel>[0]) => {
      panelWeights.push(props.weights.massCost);
      return <real.MeasureNextPanel {...props} />;
    },
  };
});

describe('Ranking area: a weight step re-renders the table alone', () => {
  let project: ProjectRecord;
  beforeEach(async () => {
    await resetDbForTests();
    useRankingViewStore.setState({ sortKey: 'rank', sortDir: 'asc', focusCandidateId: null });
    project = await projectsRepo.create('Step test', {
      ...DEMO_COMPOUND,
      name: 'Step test',
      smiles: '',
    });
    for (const ion of ['chloride', 'tosylate', 'mesylate'])
      await candidatesRepo.add(project.id, ion);
    panelWeights.length = 0;
  });

  it('the panels below keep the settled weights during a movement and take the new ones when it ends', async () => {
    render(<RankingArea project={project} />);
    await screen.findByRole('table', { name: /Ranked candidates/ }, { timeout: 15000 });
    await waitFor(() => expect(panelWeights.length).toBeGreaterThan(0));
    const settled = panelWeights.at(-1)!;
    const slider = screen.getByLabelText('Tablet mass');
    const next = settled === 3 ? 2 : 3;
    const rendersBefore = panelWeights.length;

    // Steps of a drag: `input` only. The slider shows each value; the panel never gets one of them
    // (it may be drawn again for its own reasons, e.g. the robustness run finishing, with the old one).
    for (const v of [next - 0.2, next - 0.1, next])
      fireEvent.input(slider, { target: { value: String(v) } });
    expect(slider).toHaveValue(String(next));
    await new Promise((r) => setTimeout(r, 100));
    expect(panelWeights.slice(rendersBefore).every((w) => w === settled)).toBe(true);

    // The pointer is released (`change`): the panels follow with the new weight.
    fireEvent.change(slider, { target: { value: String(next) } });
    await waitFor(() => expect(panelWeights.at(-1)).toBe(next), { timeout: 3000 });
  });
});
