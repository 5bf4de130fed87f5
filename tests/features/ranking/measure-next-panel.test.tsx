import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import type { MeasureNextItem, MeasureNextResult } from '@/chem';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { MeasureNextList } from '@/features/ranking/components/MeasureNextList';
import { RankingArea } from '@/features/ranking/components/RankingArea';

// What the user reads. The result objects are written by hand (their numbers are arbitrary inputs
// of the wording, 0.3/0.5 = 60 % by hand); the values themselves are tested in the core.
const item = (over: Partial<MeasureNextItem>): MeasureNextItem => ({
  id: 'a',
  measurement: 'solubility',
  value: 0.3,
  rawValue: 0.3,
  standardError: 0.02,
  share: 0.6,
  gain: 0.99,
  currentSigmaLog10: 0.9,
  retake: false,
  note: null,
  ...over,
});
const result = (over: Partial<MeasureNextResult>): MeasureNextResult => ({
  leaderId: 'a',
  doubt: 0.5,
  pFirst: { a: 0.5, b: 0.5 },
  items: [],
  leftOut: [],
  iterations: 1000,
  outcomes: 16,
  seed: 1,
  ...over,
});
const labels = { a: 'mesylate (1:1)', b: 'tosylate (1:1)' };

describe('Measure next list', () => {
  it('says how much of the doubt each measurement would settle, most useful first', () => {
    render(
      <MeasureNextList
        labels={labels}
        result={result({
          items: [
            item({}),
            item({ id: 'b', value: 0.1, share: 0.2 }),
            item({
              id: 'a',
              measurement: 'melting-point',
              value: 0,
              share: 0,
              gain: 0,
              note: 'fusion-path-not-validated',
            }),
          ],
        })}
      />,
    );
    const list = screen.getByRole('list', { name: /most useful first/ });
    const lines = within(list).getAllByRole('listitem');
    expect(lines).toHaveLength(2); // the melting point (value 0) is not listed …
    expect(lines[0]).toHaveTextContent(
      /Measuring the solubility of mesylate \(1:1\) would settle 60 % of the doubt about first place/,
    );
    expect(lines[0]).toHaveTextContent(/± 4 %/); // 0.02 / 0.5
    expect(lines[1]).toHaveTextContent(/tosylate \(1:1\) would settle 20 %/);
    // … and why is said in words.
    expect(screen.getByText(/no cross-validated fusion correction/)).toBeInTheDocument();
  });

  it('says so when first place is not in doubt', () => {
    render(
      <MeasureNextList
        labels={labels}
        result={result({ doubt: 0, items: [item({ value: 0, share: 0 })] })}
      />,
    );
    expect(screen.getByText(/First place is not in doubt/)).toBeInTheDocument();
    expect(screen.queryByRole('list')).toBeNull();
  });

  it('names measurements already taken and a retake with its still-wide σ', () => {
    render(
      <MeasureNextList
        labels={labels}
        result={result({
          items: [item({ retake: true, currentSigmaLog10: 0.52 })],
          leftOut: [{ id: 'b', measurement: 'solubility', reason: 'already-taken' }],
        })}
      />,
    );
    expect(screen.getByRole('listitem')).toHaveTextContent(/again: .*±0\.5 decades/);
    expect(screen.getByText(/Already measured/)).toHaveTextContent(/tosylate \(1:1\) solubility/);
  });
});

describe('Measure next in the Ranking area', () => {
  beforeEach(async () => {
    await resetDbForTests();
  });
  it('appears after the table, computed from the shortlist (no Worker in jsdom: same function inline)', async () => {
    const project = await projectsRepo.create('Measure next test', {
      ...DEMO_COMPOUND,
      name: 'Measure next test',
      smiles: '',
    });
    for (const ion of ['chloride', 'tosylate', 'mesylate'])
      await candidatesRepo.add(project.id, ion);
    render(<RankingArea project={project} />);
    await screen.findByRole('table', { name: /Ranked candidates/ }, { timeout: 15000 });
    const panel = screen.getByRole('region', { name: 'Measure next' });
    expect(
      await within(panel).findByText(
        /the doubt about first place is \d+ %/,
        {},
        { timeout: 15000 },
      ),
    ).toBeInTheDocument();
    // The Ranking area lists the cautions in full beside the ranking; the panel does not repeat them.
    expect(within(panel).queryByText(/do not establish a salt form/)).not.toBeInTheDocument();
  });
});
