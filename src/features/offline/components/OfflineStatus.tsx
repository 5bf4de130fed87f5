import { useOnlineStatus } from '../hooks/use-online-status';
import { useStoragePersistence } from '../hooks/use-storage-persistence';
import { useOfflineReady } from '../hooks/use-offline-ready';
import { useUpdateReady } from '../hooks/use-update-ready';
import type { PersistenceAnswer } from '@/persistence/storage-status';
import '../offline.css';

const KEEP_TEXT: Record<PersistenceAnswer, { short: string; long: string }> = {
  kept: {
    short: 'Data kept',
    long: 'The browser agreed to keep Saltsmith’s data: it will not clear it to free space without asking you.',
  },
  'not-promised': {
    short: 'Data not guaranteed',
    long: 'The browser did not promise to keep Saltsmith’s data; under storage pressure it may clear it. Export important projects to files. Installing the app or bookmarking the page usually earns the promise.',
  },
  unsupported: {
    short: 'Keeping unknown',
    long: 'This browser cannot be asked to keep site data. Export important projects to files.',
  },
};

function formatMb(bytes: number): string {
  return bytes < 1024 * 1024
    ? `${Math.max(1, Math.round(bytes / 1024))} kB`
    : `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

/** The network and storage status shown in the top bar. */
export function OfflineStatus() {
  const online = useOnlineStatus();
  const { answer, usage } = useStoragePersistence();
  const offlineReady = useOfflineReady();
  const updateReady = useUpdateReady();
  const keep = answer ? KEEP_TEXT[answer] : null;
  const usageText = usage
    ? ` Using ${formatMb(usage.usageBytes)} of ${formatMb(usage.quotaBytes)} available.`
    : '';
  return (
    <div className="link-status" role="group" aria-label="Network and storage">
      <span
        className={`link-status-item ${online ? 'is-online' : 'is-offline'}`}
        role="status"
        title={
          (online
            ? 'Connected. Saltsmith does not need the network: everything runs and is stored in this browser.'
            : 'No network. Saltsmith keeps working from the copy stored in this browser.') +
          (offlineReady
            ? ' This browser holds a copy of the whole app: it opens and works with no network.'
            : '')
        }
      >
        <span className="link-status-dot" aria-hidden="true" />
        {online ? 'Online' : 'Offline — working from this browser'}
        {offlineReady && online ? (
          <span className="link-status-ready" data-testid="offline-ready">
            {' '}
            · ready offline
          </span>
        ) : null}
        {offlineReady && !online ? <span hidden data-testid="offline-ready" /> : null}
      </span>
      {updateReady ? (
        <button
          type="button"
          className="link-status-item link-status-update"
          onClick={() => window.location.reload()}
        >
          New version — reload
        </button>
      ) : null}
      {keep ? (
        <span
          className={`link-status-item keep-${answer}`}
          title={keep.long + usageText}
          data-testid="persistence-status"
        >
          {keep.short}
          <span className="visually-hidden">
            . {keep.long}
            {usageText}
          </span>
        </span>
      ) : null}
    </div>
  );
}
