import { useState, type ReactNode } from 'react';
import type { CandidateRecord, MeasurementRecord, ProjectRecord } from '@/persistence/records';
import { candidateLabel } from '@/screening-data/candidate-label';
import { useBenchData } from '../hooks/use-bench-data';
import { CandidateForm } from './CandidateForm';
import { MeasurementForm } from './MeasurementForm';
import { MeasurementTable } from './MeasurementTable';
import '../bench.css';

type Candidate = CandidateRecord;

export interface BenchExtras {
  /** The workbench's estimate for what a measurement measured, in words with unit and uncertainty. */
  predictionFor: (m: MeasurementRecord) => ReactNode;
  /** Panels derived from the selected candidate's measurements (lattice back-out, van 't Hoff). */
  derived?: (candidateId: string, measurements: MeasurementRecord[]) => ReactNode;
  /** How a measured solubility was read (limiting solid, implied S₀), under its conditions. */
  readingFor?: (m: MeasurementRecord) => ReactNode;
  /** Display names of the counter-ions by candidate id. */
  ionNames?: Record<string, string>;
}

/** Bench data: what the lab measured, per candidate, beside the prediction. */
export function BenchArea({ project, extras }: { project: ProjectRecord; extras: BenchExtras }) {
  const data = useBenchData(project.id);
  const [selected, setSelected] = useState<string | null>(null);

  if (!data) {
    return (
      <section className="panel">
        <h2>Bench data</h2>
        <p className="loading" role="status">
          Reading measurements…
        </p>
      </section>
    );
  }
  const { candidates, measurements } = data;
  if (candidates.length === 0) {
    return (
      <section className="panel" aria-labelledby="bench-title">
        <h2 id="bench-title">Bench data</h2>
        <p>
          The shortlist is empty. Add counter-ions under Counter-ions, then record what the lab
          measured here.
        </p>
      </section>
    );
  }
  const current = candidates.find((c) => c.id === selected) ?? candidates[0]!;
  const label = (c: Candidate) => candidateLabel(c, extras.ionNames?.[c.id]);
  const mine = measurements.filter((m) => m.candidateId === current.id);

  return (
    <div className="bench-area">
      <section className="panel" aria-labelledby="bench-title">
        <header className="panel-head">
          <h2 id="bench-title">Bench data</h2>
          <span className="muted">{measurements.length} measurements in this project</span>
        </header>
        <p className="muted">
          Measured values override the estimates everywhere in the ranking and say so. Temperatures
          are entered in °C.
        </p>
        <div className="bench-layout">
          <CandidatePicker
            candidates={candidates}
            measurements={measurements}
            currentId={current.id}
            label={label}
            onPick={setSelected}
          />
          <div className="bench-main">
            <h3>{label(current)}</h3>
            <CandidateForm
              candidate={current}
              label={label(current)}
              measurementCount={mine.length}
            />
            <MeasurementForm
              projectId={project.id}
              candidateId={current.id}
              candidateLabel={label(current)}
            />
            <h4>Recorded for {label(current)}</h4>
            <MeasurementTable
              measurements={mine}
              caption={`Measurements for ${label(current)}`}
              predictionFor={extras.predictionFor}
              {...(extras.readingFor ? { readingFor: extras.readingFor } : {})}
            />
          </div>
        </div>
      </section>
      {extras.derived ? extras.derived(current.id, mine) : null}
    </div>
  );
}

/** The shortlisted candidates, each with its number of measurements; the one shown is pressed. */
function CandidatePicker({
  candidates,
  measurements,
  currentId,
  label,
  onPick,
}: {
  candidates: readonly Candidate[];
  measurements: readonly MeasurementRecord[];
  currentId: string;
  label: (c: Candidate) => string;
  onPick: (id: string) => void;
}) {
  return (
    <nav aria-label="Shortlisted candidates" className="bench-candidates">
      <ul>
        {candidates.map((c) => {
          const n = measurements.filter((m) => m.candidateId === c.id).length;
          return (
            <li key={c.id}>
              <button type="button" aria-pressed={c.id === currentId} onClick={() => onPick(c.id)}>
                <span>{label(c)}</span>
                <span className="count" aria-label={`${n} measurements`}>
                  {n}
                </span>
              </button>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
