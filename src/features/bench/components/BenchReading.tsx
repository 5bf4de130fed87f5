import { useState } from 'react';
import { projectsRepo } from '@/persistence/projects-repo';
import { measurementsRepo } from '@/persistence/measurements-repo';
import type { BenchReadingView } from '../bench-predictions';

const fmt = (x: number) => (x >= 1 ? x.toPrecision(3) : x.toPrecision(2));

/**
 * How the workbench read one measured solubility: which solid limited it, why, and — when the free
 * form did — the S₀ it implies, with one click to take it into the compound (the record is then marked
 * as limited by the free form, so the reading stays as the user accepted it).
 */
export function BenchReading({
  view,
  projectId,
  measurementId,
}: {
  view: BenchReadingView;
  projectId: string;
  measurementId: string;
}) {
  const [status, setStatus] = useState('');
  const s0 = view.impliedS0MgPerMl;
  const adoptS0 = async () => {
    if (s0 === null) return;
    const value = Number(s0.toPrecision(3));
    try {
      await projectsRepo.patchCompound(projectId, {
        intrinsicSolubilityMgPerMl: value,
        intrinsicSolubilityOrigin: 'measured',
      });
      await measurementsRepo.update(measurementId, { solidForm: 'free-form' });
      setStatus(`S₀ set to ${value} mg/mL in Compound.`);
    } catch (err) {
      setStatus(`Could not set S₀: ${String(err)}`);
    }
  };
  return (
    <div className={`bench-reading bench-reading-${view.limitedBy}`}>
      <strong>{view.label}</strong> <span className="muted">({view.why})</span>
      {s0 !== null ? (
        <div>
          {view.limitedBy === 'free-form' ? 'implies' : 'if the free form limited it:'} S₀ ≈{' '}
          {fmt(s0)} mg/mL{' '}
          {view.limitedBy !== 'salt' ? (
            <button
              type="button"
              className="small"
              onClick={() => void adoptS0()}
              title="Sets the compound's S₀ (origin measured) and marks this value as limited by the free form"
            >
              Use as S₀
            </button>
          ) : null}
        </div>
      ) : null}
      {view.temperature ? <div className="muted">{view.temperature}</div> : null}
      {view.conflict ? <div className="field-error">{view.conflict}</div> : null}
      <span role="status" aria-live="polite" className="muted">
        {status}
      </span>
    </div>
  );
}
