import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { OfflineStatus } from '@/features/offline/components/OfflineStatus';
import { StorageErrorBanner } from '@/features/offline/components/StorageErrorBanner';
import { reportStorageError, useStorageProblemStore } from '@/stores/storage-problem-store';
import { classifyStorageError } from '@/persistence/storage-status';
import { resetDbForTests } from '../../support/db';
import { SW_UPDATE_EVENT } from '@/features/offline/update-event';

function stubStorage(storage: Partial<StorageManager> | undefined) {
  Object.defineProperty(navigator, 'storage', { value: storage, configurable: true });
}

afterEach(async () => {
  stubStorage(undefined);
  useStorageProblemStore.setState({ problem: null, count: 0 });
  await resetDbForTests();
});

describe('network and storage status', () => {
  it('asks the browser to keep the data and shows that it agreed', async () => {
    const persist = vi.fn().mockResolvedValue(true);
    stubStorage({
      persist,
      persisted: vi.fn().mockResolvedValue(false),
      estimate: vi.fn().mockResolvedValue({ usage: 2 * 1024 * 1024, quota: 100 * 1024 * 1024 }),
    });
    render(<OfflineStatus />);
    expect(await screen.findByText('Data kept')).toBeInTheDocument();
    expect(persist).toHaveBeenCalledTimes(1);
    expect(screen.getByTestId('persistence-status')).toHaveTextContent('Using 2.0 MB of 100.0 MB');
  });

  it('says so plainly when the browser does not promise to keep the data', async () => {
    stubStorage({
      persist: vi.fn().mockResolvedValue(false),
      persisted: vi.fn().mockResolvedValue(false),
    });
    render(<OfflineStatus />);
    expect(await screen.findByText('Data not guaranteed')).toBeInTheDocument();
    expect(screen.getByTestId('persistence-status')).toHaveTextContent(/may clear it/);
  });

  it('reports an unsupported Storage API rather than pretending', async () => {
    stubStorage(undefined);
    render(<OfflineStatus />);
    expect(await screen.findByText('Keeping unknown')).toBeInTheDocument();
  });

  it('offers a reload when a newer version has taken over the page', () => {
    stubStorage(undefined);
    render(<OfflineStatus />);
    expect(screen.queryByRole('button', { name: 'New version — reload' })).toBeNull();
    act(() => {
      window.dispatchEvent(new Event(SW_UPDATE_EVENT));
    });
    expect(screen.getByRole('button', { name: 'New version — reload' })).toBeInTheDocument();
  });

  it('follows the browser going offline and online', async () => {
    stubStorage(undefined);
    const onLine = vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(true);
    render(<OfflineStatus />);
    expect(screen.getByText('Online')).toBeInTheDocument();
    onLine.mockReturnValue(false);
    act(() => {
      window.dispatchEvent(new Event('offline'));
    });
    expect(screen.getByText(/Offline — working from this browser/)).toBeInTheDocument();
    onLine.mockReturnValue(true);
    act(() => {
      window.dispatchEvent(new Event('online'));
    });
    expect(screen.getByText('Online')).toBeInTheDocument();
    onLine.mockRestore();
  });
});

describe('storage errors are shown, not swallowed', () => {
  // Error names from the W3C Indexed Database API 3.0 (QuotaExceededError, VersionError,
  // InvalidStateError) and Dexie 4's wrappers (DatabaseClosedError, MissingAPIError).
  it.each([
    [new DOMException('The quota has been exceeded.', 'QuotaExceededError'), 'quota'],
    [
      Object.assign(new Error('Transaction aborted'), {
        name: 'AbortError',
        inner: new DOMException('x', 'QuotaExceededError'),
      }),
      'quota',
    ],
    [Object.assign(new Error('upgrade blocked'), { name: 'VersionError' }), 'blocked'],
    [
      Object.assign(new Error('Database has been closed'), { name: 'DatabaseClosedError' }),
      'closed',
    ],
    [Object.assign(new Error('IndexedDB API missing'), { name: 'MissingAPIError' }), 'unavailable'],
  ])('classifies %s as %s', (err, kind) => {
    expect(classifyStorageError(err)?.kind).toBe(kind);
  });

  it('leaves ordinary errors to their caller', () => {
    expect(classifyStorageError(new TypeError('x is undefined'))).toBeNull();
    expect(reportStorageError(new Error('A project needs a name'))).toBe(false);
    expect(useStorageProblemStore.getState().problem).toBeNull();
  });

  it('shows a quota failure in a banner that says the change was not saved, until dismissed', async () => {
    render(<StorageErrorBanner />);
    expect(screen.queryByRole('alert')).toBeNull();
    act(() => {
      expect(
        reportStorageError(new DOMException('The quota has been exceeded.', 'QuotaExceededError')),
      ).toBe(true);
    });
    const banner = screen.getByRole('alert');
    expect(banner).toHaveTextContent(/storage quota reached/);
    expect(banner).toHaveTextContent(/NOT saved/);
    expect(banner).toHaveTextContent(/Export your project/);
    act(() => {
      reportStorageError(new DOMException('again', 'QuotaExceededError'));
    });
    expect(screen.getByRole('alert')).toHaveTextContent('(2 times)');
    await userEvent.click(screen.getByRole('button', { name: 'Dismiss' }));
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('catches a storage failure nobody handled (unhandled promise rejection)', () => {
    render(<StorageErrorBanner />);
    const reason = Object.assign(new Error('Database has been closed'), {
      name: 'DatabaseClosedError',
    });
    const event = new Event('unhandledrejection', { cancelable: true }) as PromiseRejectionEvent;
    Object.defineProperty(event, 'reason', { value: reason });
    act(() => {
      window.dispatchEvent(event);
    });
    expect(screen.getByRole('alert')).toHaveTextContent(/database was closed/);
    expect(event.defaultPrevented).toBe(true);
  });
});
