import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import type { ProjectRecord } from '@/persistence/records';
import { RankingArea } from '@/features/ranking/components/RankingArea';
import { SolutionEnthalpyCell } from '@/features/ranking/components/SolutionEnthalpyCell';
import { useRankingViewStore } from '@/stores/ranking-view-store';

describe('Ranking: what separates the shortlist, and the free form read against it', () => {
  let project: ProjectRecord;
  beforeEach(async () => {
    await resetDbForTests();
    useRankingViewStore.setState({
      sortKey: 'rank',
      sortDir: 'asc',
      chartIds: null,
      focusCandidateId: null,
    });
    project = await projectsRepo.create('Separation test', {
      ...DEMO_COMPOUND,
      name: 'Testamine',
      smiles: '',
    });
    for (const ion of ['chloride', 'tosylate', 'mesylate'])
      await candidatesRepo.add(project.id, ion);
  });

  it('shows one separation line above the table, naming what separates and the salts’ solubilities', async () => {
    render(<RankingArea project={project} />);
    const line = await screen.findByRole(
      'region',
      { name: 'What separates this shortlist' },
      { timeout: 20000 },
    );
    expect(line.textContent).toMatch(/What separates the candidates:/);
    expect(line.textContent).toMatch(/The order rests on|No criterion separates/);
    expect(line.textContent).toMatch(
      /solubilities in water (are not separable before measurement|differ beyond)/,
    );
    // Above the table: the line comes first in document order.
    const table = screen.getByRole('table', { name: /Ranked candidates/ });
    expect(line.compareDocumentPosition(table) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
  });

  it('lists the free form as a row with the same columns, not ranked, with S₀ and its dose numbers', async () => {
    render(<RankingArea project={project} />);
    const table = await screen.findByRole(
      'table',
      { name: /Ranked candidates/ },
      { timeout: 20000 },
    );
    const row = within(table).getByRole('row', { name: /Testamine free base \(no salt\)/ });
    const heads = within(table).getAllByRole('columnheader');
    const cells = within(row).getAllByRole('cell');
    // Same number of columns as the header: one row header + cells.
    expect(cells.length + 1).toBe(heads.length);
    expect(row.textContent).toMatch(/read against; not ranked/);
    expect(row.textContent).toMatch(/S₀, intrinsic solubility of the free form/);
    expect(row.textContent).toMatch(/100 %/);
    // Its rank cell carries no rank.
    expect(cells[0]!.textContent).toBe('—');
  });

  it('says ΔH_sol is per drug ion in its heading, with the unit', async () => {
    render(<RankingArea project={project} />);
    const table = await screen.findByRole(
      'table',
      { name: /Ranked candidates/ },
      { timeout: 20000 },
    );
    expect(
      within(table).getByRole('columnheader', { name: /ΔH_sol \(kJ\/mol per drug ion\)/ }),
    ).toBeTruthy();
  });
});

describe('ΔH_sol cell', () => {
  const wrap = (el: React.ReactNode) =>
    render(
      <table>
        <tbody>
          <tr>{el}</tr>
        </tbody>
      </table>,
    );

  it('shows a not-informative value as words with the reason, never as a number', () => {
    wrap(
      <SolutionEnthalpyCell
        h={{
          value: -160.5,
          sigma: 54,
          origin: 'estimated',
          basis: 'b',
          notInformative: 'outside ±70 kJ/mol',
        }}
      />,
    );
    const cell = screen.getByRole('cell');
    expect(cell.textContent).toMatch(/^not informative/);
    expect(cell.textContent).not.toMatch(/160/);
    expect(cell.getAttribute('title')).toBe('outside ±70 kJ/mol');
  });

  it('shows an informative value at the precision of its 1σ: −31.4 ± 12 → "−31 ± 12"', () => {
    // By hand: σ 12 has leading digit 1 → two significant figures → units place; −31.4 → −31.
    wrap(
      <SolutionEnthalpyCell
        h={{ value: -31.4, sigma: 12, origin: 'estimated', basis: 'b', notInformative: null }}
      />,
    );
    expect(screen.getByRole('cell').textContent).toMatch(/^−31 ± 12/);
  });
});
