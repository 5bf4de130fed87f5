import { useState, type ReactNode } from 'react';
import { measurementsRepo } from '@/persistence/measurements-repo';
import type { MeasurementRecord } from '@/persistence/records';
import { CELSIUS_ZERO_K, MEASUREMENT_KINDS } from '../bench-form-model';

const SOLID_WORDS = { salt: 'salt', 'free-form': 'free form', unknown: 'unclear' } as const;

const fmt = (x: number) =>
  Math.abs(x) >= 100 ? x.toFixed(0) : Math.abs(x) >= 1 ? x.toPrecision(3) : x.toPrecision(2);

function conditions(m: MeasurementRecord): string {
  const parts: string[] = [];
  if (m.medium) parts.push(m.medium);
  if (m.ph !== null) parts.push(`pH ${m.ph}`);
  if (m.temperatureK !== null) parts.push(`${(m.temperatureK - CELSIUS_ZERO_K).toFixed(1)} °C`);
  if (m.solidForm) parts.push(`solid left: ${SOLID_WORDS[m.solidForm]}`);
  return parts.join(', ') || '—';
}

/** One candidate's measurements, each with the workbench's prediction beside it. */
export function MeasurementTable({
  measurements,
  caption,
  predictionFor,
  readingFor,
}: {
  measurements: MeasurementRecord[];
  caption: string;
  predictionFor: (m: MeasurementRecord) => ReactNode;
  /** How the workbench read a solubility (which solid limited it), shown under its conditions. */
  readingFor?: (m: MeasurementRecord) => ReactNode;
}) {
  const [removed, setRemoved] = useState<MeasurementRecord | null>(null);
  const undoBar = <UndoBar removed={removed} onUndone={() => setRemoved(null)} />;
  if (measurements.length === 0) {
    return (
      <>
        {undoBar}
        <p className="muted">Nothing measured yet for this candidate.</p>
      </>
    );
  }
  return (
    <div className="table-scroll">
      {undoBar}
      <table className="data-table bench-table">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr>
            <th scope="col">Measured</th>
            <th scope="col">Value</th>
            <th scope="col">Conditions</th>
            <th scope="col">Prediction (estimate)</th>
            <th scope="col">Notes</th>
            <th scope="col">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {measurements.map((m) => (
            <MeasurementRow
              key={m.id}
              m={m}
              predictionFor={predictionFor}
              readingFor={readingFor}
              onDelete={() => {
                setRemoved(m);
                void measurementsRepo.remove(m.id);
              }}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** What was just deleted, with a way to bring it back. */
function UndoBar({
  removed,
  onUndone,
}: {
  removed: MeasurementRecord | null;
  onUndone: () => void;
}) {
  return (
    <div role="status" aria-live="polite" className="bench-undo">
      {removed ? (
        <>
          Deleted {MEASUREMENT_KINDS[removed.kind].label.toLowerCase()}
          {removed.value !== null ? ` ${fmt(removed.value)} ${removed.unit}` : ''}.{' '}
          <button
            type="button"
            className="primary small"
            onClick={() => {
              void measurementsRepo.restore(removed);
              onUndone();
            }}
          >
            Undo delete
          </button>
        </>
      ) : null}
    </div>
  );
}

/** One measurement: what, value (marked measured), conditions and reading, prediction, notes, delete. */
function MeasurementRow({
  m,
  predictionFor,
  readingFor,
  onDelete,
}: {
  m: MeasurementRecord;
  predictionFor: (m: MeasurementRecord) => ReactNode;
  readingFor: ((m: MeasurementRecord) => ReactNode) | undefined;
  onDelete: () => void;
}) {
  const spec = MEASUREMENT_KINDS[m.kind];
  return (
    <tr>
      <th scope="row">{spec.label}</th>
      <td>
        {m.value === null ? (
          '—'
        ) : (
          <>
            {fmt(m.value)} <span className="unit">{m.unit}</span>
          </>
        )}
        <span className="mark-measured" title="measured">
          {' '}
          measured
        </span>
      </td>
      <td>
        {conditions(m)}
        {readingFor ? readingFor(m) : null}
      </td>
      <td className="prediction">{predictionFor(m)}</td>
      <td className="notes-cell">{m.text || '—'}</td>
      <td>
        <button
          type="button"
          className="danger small"
          aria-label={`Delete ${spec.label.toLowerCase()} ${m.value ?? ''} ${m.unit}`.trim()}
          onClick={onDelete}
        >
          Delete
        </button>
      </td>
    </tr>
  );
}
