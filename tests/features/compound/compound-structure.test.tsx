import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useLiveQuery } from 'dexie-react-hooks';
import { CompoundPanel } from '@/features/compound/components/CompoundPanel';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import type { Compound } from '@/chem';

/**
 * Procaine free base as typed by a user: structure CCN(CC)CCOC(=O)c1ccc(N)cc1, C13H20N2O2,
 * M = 236.31 g/mol (Merck Index / pharmacopoeial monographs, from memory). Only the structure-derived
 * values are checked; the pKa and dose are inputs.
 */
const procaine: Compound = {
  name: 'Procaine base',
  smiles: 'CCN(CC)CCOC(=O)c1ccc(N)cc1',
  formula: '',
  kind: 'base',
  pKas: [{ value: 9.0, origin: 'literature' }],
  ionCharge: 1,
  intrinsicSolubilityMgPerMl: null,
  meltingPointC: null,
  logP: null,
  logPOrigin: null,
  doseMg: null,
  densityGPerCm3: null,
  notes: '',
};

function LivePanel({ id }: { id: string }) {
  const project = useLiveQuery(() => projectsRepo.get(id), [id]);
  return project ? <CompoundPanel project={project} /> : null;
}

beforeEach(async () => {
  await resetDbForTests();
});

describe('Compound area: structure', () => {
  it('draws the structure and shows formula, molar mass and the drug ion', async () => {
    const project = await projectsRepo.create('Structure test', procaine);
    render(<LivePanel id={project.id} />);
    expect(
      await screen.findByRole('img', { name: 'Structure of Procaine base' }, { timeout: 10000 }),
    ).toBeInTheDocument();
    expect(screen.getByText(/C13H20N2O2, 236\.31 g\/mol/)).toBeInTheDocument();
    // Protonated base: one more H, +1 (236.31 + 1.008 g/mol).
    expect(screen.getByText(/C13H21N2O2⁺, 237\.32 g\/mol/)).toBeInTheDocument();
    expect(screen.getByText('1 aromatic, 0 non-aromatic')).toBeInTheDocument();
    expect(screen.getByText(/nm³/)).toBeInTheDocument();
    expect(screen.getByText(/log P, computed/)).toBeInTheDocument();
  });

  it('a bad SMILES gets a field message; the old structure and the stored compound stay', async () => {
    const user = userEvent.setup();
    const project = await projectsRepo.create('Bad SMILES test', procaine);
    render(<LivePanel id={project.id} />);
    await screen.findByRole('img', { name: 'Structure of Procaine base' }, { timeout: 10000 });
    const field = screen.getByLabelText('Structure (SMILES)');
    await user.clear(field);
    await user.type(field, 'CCN(CC)CCOC(=O)c1ccc(N)cc');
    expect(
      await screen.findByText(/Cannot read this SMILES/, {}, { timeout: 5000 }),
    ).toBeInTheDocument();
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('Not saved: fix the marked field')).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Structure of Procaine base' })).toBeInTheDocument();
    expect(screen.getByText(/C13H20N2O2, 236\.31 g\/mol/)).toBeInTheDocument();
    expect((await projectsRepo.get(project.id))!.compound.smiles).toBe(procaine.smiles);
  });

  it('a new valid SMILES replaces the picture and the formula follows it', async () => {
    const user = userEvent.setup();
    const project = await projectsRepo.create('New structure test', procaine);
    render(<LivePanel id={project.id} />);
    await screen.findByRole('img', { name: 'Structure of Procaine base' }, { timeout: 10000 });
    const field = screen.getByLabelText('Structure (SMILES)');
    // Lidocaine base: C14H22N2O, 234.34 g/mol (pharmacopoeial monograph; from memory).
    await user.clear(field);
    await user.type(field, 'CCN(CC)CC(=O)Nc1c(C)cccc1C');
    expect(
      await screen.findByText(/C14H22N2O, 234\.34 g\/mol/, {}, { timeout: 5000 }),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('Molecular formula')).toHaveValue('C14H22N2O');
    expect((await projectsRepo.get(project.id))!.compound.formula).toBe('C14H22N2O');
  });

  it('a formula with an unknown element is refused at the field', async () => {
    const user = userEvent.setup();
    const project = await projectsRepo.create('Formula test', {
      ...procaine,
      smiles: '',
      formula: 'C13H20N2O2',
    });
    render(<LivePanel id={project.id} />);
    expect(await screen.findByText('No structure: formula only.')).toBeInTheDocument();
    expect(screen.getByText(/C13H20N2O2, 236\.31 g\/mol/)).toBeInTheDocument();
    const field = screen.getByLabelText('Molecular formula');
    await user.clear(field);
    await user.type(field, 'C13H20Zq2O2');
    expect(await screen.findByText(/unknown element 'Zq'/)).toBeInTheDocument();
    expect((await projectsRepo.get(project.id))!.compound.formula).toBe('C13H20N2O2');
  });
});
