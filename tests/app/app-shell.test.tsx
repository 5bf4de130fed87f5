import { describe, expect, it, beforeEach } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { App } from '@/app/App';
import { resetDbForTests } from '../support/db';
import { useNavigationStore } from '@/stores/navigation-store';

beforeEach(async () => {
  await resetDbForTests();
  useNavigationStore.setState({ area: 'compound', projectId: null });
});

describe('workbench shell', () => {
  it('opens the fictional demo project on the compound form, every area named, no engine check', async () => {
    render(<App />);
    expect(await screen.findByText(/Demorazine is fictional/)).toBeInTheDocument();
    const nav = screen.getByRole('navigation', { name: 'Workbench areas' });
    for (const label of [
      'Compound',
      'Counter-ions',
      'Ranking',
      'Bench data',
      'Model check',
      'Projects',
    ]) {
      expect(within(nav).getByRole('link', { name: label })).toBeInTheDocument();
    }
    // The Compound area opens with what a formulator acts on: the compound, not the NaCl/KBr engine check.
    expect(screen.getByLabelText('Name')).toBeInTheDocument();
    expect(screen.queryByText(/Engine check/)).not.toBeInTheDocument();
    expect(screen.queryByRole('rowheader', { name: 'NaCl' })).not.toBeInTheDocument();
  });

  it('keeps a compound edit after the app is closed and opened again', async () => {
    const user = userEvent.setup();
    const first = render(<App />);
    const name = await screen.findByLabelText('Name');
    await user.clear(name);
    await user.type(name, 'Batch 7 base');
    expect(await screen.findByText('All changes saved', {}, { timeout: 3000 })).toBeInTheDocument();
    first.unmount();
    useNavigationStore.setState({ area: 'compound', projectId: null });
    render(<App />);
    expect(await screen.findByDisplayValue('Batch 7 base')).toBeInTheDocument();
  });

  it('marks an invalid pKa and does not store it', async () => {
    const user = userEvent.setup();
    render(<App />);
    const pka = await screen.findByLabelText(/pKa of the conjugate acid/);
    await user.clear(pka);
    await user.type(pka, 'abc');
    expect(await screen.findByText(/pKa values must be numbers/)).toBeInTheDocument();
    expect(screen.getByText(/Not saved/)).toBeInTheDocument();
  });

  it('shows the cautions from every screen', async () => {
    const user = userEvent.setup();
    render(<App />);
    await user.click(screen.getByRole('button', { name: 'Cautions' }));
    expect(
      screen.getByText(/do not establish a salt form/, { selector: 'li' }),
    ).toBeInTheDocument();
  });
});
