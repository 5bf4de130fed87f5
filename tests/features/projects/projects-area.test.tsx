import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { App } from '@/app/App';
import { resetDbForTests } from '../../support/db';
import { useNavigationStore } from '@/stores/navigation-store';
import { newProjectFromDraft, EMPTY_NEW_PROJECT } from '@/features/projects/new-project-model';

beforeEach(async () => {
  await resetDbForTests();
  useNavigationStore.setState({ area: 'projects', projectId: null });
});

describe('new-project form validation', () => {
  it('asks for a name, a structure and a pKa', () => {
    const r = newProjectFromDraft(EMPTY_NEW_PROJECT);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.name).toMatch(/name/);
    expect(r.errors.smiles).toMatch(/SMILES string or a molecular formula/);
    expect(r.errors.pKa).toMatch(/pKa/);
  });
  it('rejects a pKa outside −10…20, a malformed formula and a base with a negative charge', () => {
    const r = newProjectFromDraft({
      ...EMPTY_NEW_PROJECT,
      name: 'x',
      formula: 'c6h6',
      pKa: '25',
      ionCharge: '-1',
    });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.pKa).toBe('pKa must be at most 20');
    expect(r.errors.formula).toMatch(/element symbols/);
    expect(r.errors.ionCharge).toMatch(/cation/);
  });
  it('accepts a SMILES alone and leaves unmeasured properties empty', () => {
    const r = newProjectFromDraft({
      ...EMPTY_NEW_PROJECT,
      name: 'Amine 1',
      smiles: 'CCN(CC)CC',
      pKa: '10,7',
    });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.compound.pKas[0]?.value).toBe(10.7);
    expect(r.compound.intrinsicSolubilityMgPerMl).toBeNull();
    expect(r.compound.doseMg).toBeNull();
  });
});

describe('Projects area', () => {
  it('shows field messages in the form and stores nothing invalid', async () => {
    const user = userEvent.setup();
    render(<App />);
    await screen.findByRole('heading', { name: /Demorazine/ }, { timeout: 8000 });
    await user.click(screen.getByRole('button', { name: 'Create project' }));
    expect(screen.getByText('Give the project a name')).toBeInTheDocument();
    expect(screen.getByText(/Give a SMILES string or a molecular formula/)).toBeInTheDocument();
    expect(screen.getAllByRole('article')).toHaveLength(1);
  });

  it('creates, renames, duplicates, archives and deletes with undo', async () => {
    const user = userEvent.setup();
    render(<App />);
    await screen.findByRole('heading', { name: /Demorazine/ }, { timeout: 8000 });
    await user.type(screen.getByLabelText('Project name'), 'Amine 1');
    await user.type(screen.getByLabelText('Structure (SMILES)'), 'CCN(CC)CC');
    await user.type(screen.getByLabelText('pKa of the conjugate acid'), '10.7');
    await user.click(screen.getByRole('button', { name: 'Create project' }));
    // creating opens the new project in the Compound area
    await screen.findByRole('heading', { name: 'Compound' });
    expect(screen.getByLabelText('Name')).toHaveValue('Amine 1');

    await user.click(screen.getByRole('link', { name: 'Projects' }));
    await user.click(await screen.findByRole('button', { name: 'Rename Amine 1' }));
    const input = screen.getByLabelText('New name');
    await user.clear(input);
    await user.type(input, 'Amine one');
    await user.click(screen.getByRole('button', { name: 'Save name' }));
    expect(await screen.findByRole('heading', { name: 'Amine one' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Duplicate Amine one' }));
    expect(await screen.findByRole('heading', { name: 'Amine one (copy)' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Archive Amine one (copy)' }));
    expect(await screen.findByText(/Project archived/)).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.queryByRole('heading', { name: 'Amine one (copy)' })).not.toBeInTheDocument(),
    );
    await user.click(screen.getByLabelText(/Show archived/));
    const archived = await screen.findByRole('article', { name: 'Amine one (copy)' });
    expect(within(archived).getByText('archived')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Delete Amine one' }));
    expect(await screen.findByText(/Deleted/)).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.queryByRole('heading', { name: 'Amine one' })).not.toBeInTheDocument(),
    );
    await user.click(screen.getByRole('button', { name: 'Undo delete' }));
    expect(await screen.findByRole('heading', { name: 'Amine one' })).toBeInTheDocument();
  });
});
