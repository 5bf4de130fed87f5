import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import Dexie from 'dexie';
import { App } from '@/app/App';
import { DB_NAME, getDb } from '@/persistence/db';
import { resetDbForTests } from '../support/db';
import { useNavigationStore } from '@/stores/navigation-store';
import { useStorageProblemStore } from '@/stores/storage-problem-store';

// Issue 13: after another connection upgraded or deleted the database, the banner said edits are not
// saved while the Compound panel still said "All changes saved".

beforeEach(async () => {
  await resetDbForTests();
  useNavigationStore.setState({ area: 'compound', projectId: null });
  useStorageProblemStore.getState().reset();
});

async function openApp() {
  render(<App />);
  await screen.findByText(/Demorazine is fictional/);
  expect(await screen.findByText('All changes saved')).toBeInTheDocument();
}

describe('the storage banner and the save state agree', () => {
  it('another connection deletes the database: banner and panel both say changes are not saved', async () => {
    await openApp();
    await Dexie.delete(DB_NAME); // another tab (or the browser's "clear site data") deletes it
    expect(await screen.findByRole('alert')).toHaveTextContent(/not saved/);
    expect(screen.queryByText('All changes saved')).not.toBeInTheDocument();
    expect(screen.getByRole('status', { name: /Save state/ })).toHaveTextContent(/Not saved/);
  });

  it('another connection upgrades the database: the same, and dismissing the banner does not bring back "saved"', async () => {
    await openApp();
    const newer = new Dexie(DB_NAME);
    newer.version(getDb().verno + 1).stores({ projects: 'id, updatedAt, archived' });
    await newer.open();
    expect(await screen.findByRole('alert')).toHaveTextContent(/not saved/);
    expect(screen.queryByText('All changes saved')).not.toBeInTheDocument();
    screen.getByRole('button', { name: 'Dismiss' }).click();
    await new Promise((r) => setTimeout(r, 50));
    expect(screen.queryByText('All changes saved')).not.toBeInTheDocument();
    newer.close();
  });
});
