import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { ImportProjectButton } from '@/features/project-files/components/ImportProjectButton';
import { ExportProjectButton } from '@/features/project-files/components/ExportProjectButton';
import { ProjectFilesPanel } from '@/features/project-files/components/ProjectFilesPanel';
import { getDb } from '@/persistence/db';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { exportProjectText } from '@/persistence/import-project';

const fixture = (name: string) =>
  readFileSync(resolve(process.cwd(), 'fixtures/files', name), 'utf8');
const fileOf = (text: string, name = 'project.saltsmith.json') =>
  new File([text], name, { type: 'application/json' });

async function snapshot() {
  const db = getDb();
  return {
    projects: await db.projects.toArray(),
    candidates: await db.candidates.toArray(),
    measurements: await db.measurements.toArray(),
    customIons: await db.customIons.toArray(),
  };
}

beforeEach(async () => {
  await resetDbForTests();
});
afterEach(async () => {
  vi.restoreAllMocks();
  await resetDbForTests();
});

describe('import a project file', () => {
  it('refuses a truncated file, says why, and leaves the database alone', async () => {
    const p = await projectsRepo.create('Existing', DEMO_COMPOUND);
    await candidatesRepo.add(p.id, 'chloride');
    const before = await snapshot();
    render(<ImportProjectButton replaceable={{ id: p.id, name: p.name }} />);
    await userEvent.upload(
      screen.getByLabelText('Import a project file'),
      fileOf(fixture('project-truncated.saltsmith.json'), 'cut.json'),
    );
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('“cut.json” was not imported.');
    expect(alert).toHaveTextContent(/cut off/);
    expect(alert).toHaveTextContent('Your projects are unchanged.');
    expect(screen.queryByRole('button', { name: 'Import as a new project' })).toBeNull();
    expect(await snapshot()).toStrictEqual(before);
  });

  it('refuses an export with "doseMg" given twice and one whose SMILES has two components, naming the field', async () => {
    const p = await projectsRepo.create('Source', DEMO_COMPOUND);
    const text = await exportProjectText(p.id);
    const { unmount } = render(<ImportProjectButton />);
    await userEvent.upload(
      screen.getByLabelText('Import a project file'),
      fileOf(text.replace('"doseMg":', '"doseMg":1,"doseMg":')),
    );
    expect(await screen.findByRole('alert')).toHaveTextContent(
      /same field twice at project\.compound\.doseMg/,
    );
    unmount();
    render(<ImportProjectButton />);
    await userEvent.upload(
      screen.getByLabelText('Import a project file'),
      fileOf(text.replace(/"smiles":"[^"]*"/, '"smiles":"CCN.Cl"')),
    );
    expect(await screen.findByRole('alert', {}, { timeout: 15_000 })).toHaveTextContent(
      /project\.compound\.smiles/,
    );
  }, 30_000);

  it('says how large a project can be', () => {
    render(<ProjectFilesPanel projects={[]} currentProjectId={null} />);
    expect(screen.getByTestId('project-limits')).toHaveTextContent(
      'One project holds at most 500 shortlisted counter-ions, 20,000 measurements and 1,000 in-house ions, so that its file (at most 32 MB) can always be imported back.',
    );
  });

  it('lists every problem of an invalid file', async () => {
    render(<ImportProjectButton />);
    await userEvent.upload(
      screen.getByLabelText('Import a project file'),
      fileOf(fixture('project-invalid.saltsmith.json')),
    );
    expect(await screen.findByRole('alert')).toHaveTextContent(/project\.compound\.pKas\.0\.value/);
  });

  it('shows what the file holds, then imports it as a new project', async () => {
    const onImported = vi.fn();
    render(<ImportProjectButton onImported={onImported} />);
    await userEvent.upload(
      screen.getByLabelText('Import a project file'),
      fileOf(fixture('project-v1.saltsmith.json')),
    );
    const review = await screen.findByRole('region', { name: 'File to import' });
    expect(review).toHaveTextContent('Demorazine screen (version-1 file)');
    expect(review).toHaveTextContent('3 shortlisted, 2 measurements, 0 custom ions');
    await userEvent.click(screen.getByRole('button', { name: 'Import as a new project' }));
    await waitFor(() => expect(onImported).toHaveBeenCalledTimes(1));
    const id = onImported.mock.calls[0]?.[0].projectId as string;
    expect((await projectsRepo.get(id))?.name).toBe('Demorazine screen (version-1 file)');
    expect(await candidatesRepo.listForProject(id)).toHaveLength(3);
  });

  it('replaces a project only after an explicit confirmation', async () => {
    const p = await projectsRepo.create('Keep me?', DEMO_COMPOUND);
    await candidatesRepo.add(p.id, 'tosylate');
    render(<ImportProjectButton replaceable={{ id: p.id, name: p.name }} />);
    await userEvent.upload(
      screen.getByLabelText('Import a project file'),
      fileOf(fixture('project-v1.saltsmith.json')),
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Replace “Keep me?”…' }));
    expect(screen.getByRole('alertdialog', { name: 'Confirm replacement' })).toHaveTextContent(
      'cannot be undone',
    );
    await userEvent.click(screen.getByRole('button', { name: 'No, keep it' }));
    expect((await candidatesRepo.listForProject(p.id)).map((c) => c.ionId)).toEqual(['tosylate']);

    await userEvent.click(screen.getByRole('button', { name: 'Replace “Keep me?”…' }));
    await userEvent.click(screen.getByRole('button', { name: 'Yes, replace “Keep me?”' }));
    expect(
      await screen.findByText(/Replaced “Demorazine screen \(version-1 file\)”/),
    ).toBeInTheDocument();
    expect((await candidatesRepo.listForProject(p.id)).map((c) => c.ionId)).toEqual([
      'chloride',
      'sulfate',
      'mesylate',
    ]);
  });
});

describe('export a project file', () => {
  it('offers the project as a .saltsmith.json download that holds the project', async () => {
    const p = await projectsRepo.create('To export', DEMO_COMPOUND);
    await candidatesRepo.add(p.id, 'mesylate');
    let blob: Blob | null = null;
    const createObjectURL = vi.fn((b: Blob) => {
      blob = b;
      return 'blob:test';
    });
    Object.assign(URL, { createObjectURL, revokeObjectURL: vi.fn() });
    const click = vi
      .spyOn(HTMLAnchorElement.prototype, 'click')
      .mockImplementation(() => undefined);
    render(<ExportProjectButton projectId={p.id} projectName={p.name} />);
    await userEvent.click(screen.getByRole('button', { name: 'Export to file' }));
    expect(await screen.findByRole('status')).toHaveTextContent(
      /Saved as To-export-\d{4}-\d{2}-\d{2}\.saltsmith\.json/,
    );
    expect(click).toHaveBeenCalledTimes(1);
    const text = await (blob as unknown as Blob).text();
    const expected = JSON.parse(await exportProjectText(p.id)) as { createdAt: string };
    const got = JSON.parse(text) as { createdAt: string; format: string };
    expect(got.format).toBe('saltsmith-project');
    expect({ ...got, createdAt: '' }).toStrictEqual({ ...expected, createdAt: '' });
  });
});
