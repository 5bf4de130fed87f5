import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, waitFor } from '@testing-library/react';
import { App } from '@/app/App';
import { CAUTION_LINES } from '@/components/Cautions';
import { resetDbForTests } from '../support/db';
import { useNavigationStore, type AreaId } from '@/stores/navigation-store';

beforeEach(async () => {
  await resetDbForTests();
});

/** Every rendering of the cautions: the one-line note or a list of them in full. */
function cautionBlocks(): Element[] {
  const first = CAUTION_LINES[0]!;
  return Array.from(document.body.querySelectorAll('*')).filter(
    (el) =>
      (el.textContent ?? '').includes(first) &&
      // the dialog behind the Cautions button is not on screen until asked for
      !el.closest('dialog:not([open])') &&
      // the innermost element only (a section holding a note is one rendering, not two)
      !Array.from(el.children).some((c) => (c.textContent ?? '').includes(first)),
  );
}

// Something each area shows only once it has finished loading its content.
const LOADED: Record<Exclude<AreaId, 'projects'>, () => Promise<unknown>> = {
  compound: () => screen.findByLabelText('Name'),
  'counter-ions': () => screen.findByRole('table', { name: 'Counter-ion library' }),
  ranking: () => screen.findByText(/candidates ranked/, {}, { timeout: 20000 }),
  energetics: () => screen.findByText(/Sign convention\./, {}, { timeout: 20000 }),
  'salt-screen': () => screen.findByText(/wells on a 24-well plate/, {}, { timeout: 20000 }),
  bench: () => screen.findAllByRole('button', { name: /hydrochloride/ }, { timeout: 20000 }),
  'model-check': () =>
    screen.findByRole('table', { name: /Validation of each model/ }, { timeout: 20000 }),
};

describe('the cautions, once per screen (issue 19)', () => {
  for (const [area, loaded] of Object.entries(LOADED)) {
    it(`${area}: one rendering of the cautions besides the Cautions button`, async () => {
      useNavigationStore.setState({ area: area as AreaId, projectId: null });
      render(<App />);
      await loaded();
      // let late sections (charts, measure-next) settle before counting
      await new Promise((r) => setTimeout(r, 300));
      await waitFor(() => expect(cautionBlocks()).toHaveLength(1));
      if (area === 'ranking') {
        // in full beside the ranking, so the footer's one-line note is not repeated
        const list = cautionBlocks()[0]!.closest('aside')!;
        for (const line of CAUTION_LINES) expect(list.textContent).toContain(line);
      }
    }, 40000);
  }
});
