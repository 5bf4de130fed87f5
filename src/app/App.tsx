import { lazy, useEffect, useState } from 'react';
import { AREAS, areaFromHash, useNavigationStore, type AreaId } from '@/stores/navigation-store';
import { CautionNote, CautionsDialog } from '@/components/Cautions';
import { CompoundPanel } from '@/features/compound/components/CompoundPanel';
import { useCurrentProject } from '@/features/projects/hooks/use-current-project';
import { ProjectsArea } from '@/features/projects/components/ProjectsArea';
import { ProjectFilesPanel } from '@/features/project-files/components/ProjectFilesPanel';
import { AreaBoundary } from '@/app/AreaBoundary';
import { CounterIonsPanel } from '@/features/counter-ions/components/CounterIonsPanel';
import { OfflineStatus } from '@/features/offline/components/OfflineStatus';
import { StorageErrorBanner } from '@/features/offline/components/StorageErrorBanner';
import { OpenSheetButton } from '@/features/sheet/components/OpenSheetButton';
import { SheetOverlay } from '@/features/sheet/components/SheetOverlay';
import type { ProjectRecord } from '@/persistence/records';
import { guardUnsavedEdits } from '@/persistence/unsaved-edits';

// Areas with charts and heavy computation load on demand, so the first screen does not wait for them.
const RankingArea = lazy(() =>
  import('@/features/ranking/components/RankingArea').then((m) => ({ default: m.RankingArea })),
);
const EnergeticsArea = lazy(() =>
  import('@/features/energetics/components/EnergeticsArea').then((m) => ({
    default: m.EnergeticsArea,
  })),
);
const BenchWorkspace = lazy(() =>
  import('@/features/bench/components/BenchWorkspace').then((m) => ({ default: m.BenchWorkspace })),
);
const ScreenPlanArea = lazy(() =>
  import('@/features/screen-plan/components/ScreenPlanArea').then((m) => ({
    default: m.ScreenPlanArea,
  })),
);
const ModelCheckArea = lazy(() =>
  import('@/features/model-check/components/ModelCheckArea').then((m) => ({
    default: m.ModelCheckArea,
  })),
);

function AreaContent({ area, project }: { area: AreaId; project: ProjectRecord }) {
  switch (area) {
    case 'compound':
      return <CompoundPanel project={project} />;
    case 'bench':
      return (
        <AreaBoundary>
          <BenchWorkspace project={project} />
        </AreaBoundary>
      );
    case 'salt-screen':
      return (
        <AreaBoundary>
          <ScreenPlanArea project={project} />
        </AreaBoundary>
      );
    case 'model-check':
      return (
        <AreaBoundary>
          <ModelCheckArea />
        </AreaBoundary>
      );
    case 'ranking':
      return (
        <AreaBoundary>
          <RankingArea project={project} />
        </AreaBoundary>
      );
    case 'energetics':
      return (
        <AreaBoundary>
          <EnergeticsArea project={project} />
        </AreaBoundary>
      );
    case 'counter-ions':
      return <CounterIonsPanel project={project} />;
    default:
      return (
        <section className="panel">
          <h2>{AREAS.find((a) => a.id === area)?.label}</h2>
          <p>This area is being built.</p>
        </section>
      );
  }
}

/** The area follows the address's hash (back, forward, a pasted link). */
function useHashNavigation(goTo: (area: AreaId) => void) {
  useEffect(() => {
    const onHash = () => goTo(areaFromHash(window.location.hash));
    window.addEventListener('hashchange', onHash);
    return () => window.removeEventListener('hashchange', onHash);
  }, [goTo]);
}

/** The brand, the open project's name, the offline state, the sheet and the cautions. */
function TopBar({
  project,
  onCautions,
}: {
  project: ProjectRecord | undefined;
  onCautions: () => void;
}) {
  return (
    <header className="topbar">
      <div className="brand">
        <span className="brand-mark" aria-hidden="true" />
        <span className="brand-name">Saltsmith</span>
        <span className="brand-tag">salt-selection workbench</span>
      </div>
      <div className="topbar-project" aria-live="polite">
        {project ? (
          <>
            <span className="muted">Project:</span> <strong>{project.name}</strong>
          </>
        ) : null}
      </div>
      <OfflineStatus />
      {project ? <OpenSheetButton className="sheet-open-button" /> : null}
      <button type="button" className="caution-button" onClick={onCautions}>
        Cautions
      </button>
    </header>
  );
}

/** One link per area; the current one is marked for assistive technology. */
function AreaNav({ area, goTo }: { area: AreaId; goTo: (area: AreaId) => void }) {
  return (
    <nav className="areas" aria-label="Workbench areas">
      <ul>
        {AREAS.map((a) => (
          <li key={a.id}>
            <a
              href={`#/${a.id}`}
              aria-current={a.id === area ? 'page' : undefined}
              onClick={(e) => {
                e.preventDefault();
                goTo(a.id);
              }}
            >
              {a.label}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}

/** The Projects board (also when no project is open), or the open project's area. */
function MainContent({
  area,
  project,
  loading,
}: {
  area: AreaId;
  project: ProjectRecord | undefined;
  loading: boolean;
}) {
  if (area === 'projects' || (!loading && !project))
    return (
      <ProjectsArea
        currentProjectId={project?.id ?? null}
        footer={({ projects, currentProjectId, open }) => (
          <ProjectFilesPanel
            projects={projects}
            currentProjectId={currentProjectId}
            onImported={(outcome) => open(outcome.projectId)}
          />
        )}
      />
    );
  if (loading || !project)
    return (
      <p className="loading" role="status">
        Opening your project…
      </p>
    );
  return <AreaContent area={area} project={project} />;
}

/** The workbench shell: header, area navigation, cautions, and the open project's area. */
export function App() {
  const area = useNavigationStore((s) => s.area);
  const goTo = useNavigationStore((s) => s.goTo);
  const { project, loading } = useCurrentProject();
  const [cautionsOpen, setCautionsOpen] = useState(false);

  // Edits still on their way to IndexedDB are copied aside when the page is hidden or goes away.
  useEffect(() => guardUnsavedEdits(), []);
  useHashNavigation(goTo);

  return (
    <div className="shell">
      <a className="skip-link" href="#main">
        Skip to content
      </a>
      <StorageErrorBanner />
      <TopBar project={project} onCautions={() => setCautionsOpen(true)} />
      <AreaNav area={area} goTo={goTo} />
      <main id="main" className="content" tabIndex={-1}>
        <MainContent area={area} project={project} loading={loading} />
      </main>
      <footer className="footer">
        {/* Once per screen: the Ranking area carries the cautions in full beside the ranking. */}
        {area === 'ranking' && project ? null : <CautionNote />}
        <span className="muted">Saltsmith {__APP_VERSION__} · data stays in this browser</span>
      </footer>
      <CautionsDialog open={cautionsOpen} onClose={() => setCautionsOpen(false)} />
      <SheetOverlay project={project} />
    </div>
  );
}
