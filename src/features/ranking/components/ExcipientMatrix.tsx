import { memo, useEffect, useId, useMemo, useState } from 'react';
import {
  EXCIPIENT_MATRIX_LIMITS,
  EXCIPIENT_ROLE_NAMES,
  EXCIPIENTS,
  CONVERSION_BAND_LIMITS,
  type ExcipientRecord,
} from '@/chem';
import { projectsRepo } from '@/persistence/projects-repo';
import { SCREENING_SETTINGS_KEY } from '@/screening-data/screening-settings';
import type { ProjectRecord } from '@/persistence/records';
import type { DisplayRow } from '../ranking-rows';
import {
  chosenInTableOrder,
  matrixRows,
  matrixSummary,
  phRangeText,
  type MatrixRow,
} from '../excipient-matrix-model';

/**
 * Write the chosen excipients (one stamped field, persistence/field-stamps.ts): only this list is
 * written, never the rest of the screening block from a copy.
 */
async function saveExcipients(
  projectId: string,
  before: readonly string[],
  excipients: string[],
): Promise<void> {
  const shape = (list: readonly string[]) => ({
    extra: { [SCREENING_SETTINGS_KEY]: { excipients: list } },
  });
  await projectsRepo.changeSettings(projectId, shape(before), shape(excipients));
}

const ROLES = Object.keys(EXCIPIENT_ROLE_NAMES) as ExcipientRecord['role'][];

/**
 * The formulation's excipients and each salt judged against them: a salt × excipient grid of the
 * probability that the excipient's slurry pH lies beyond the salt's pH_max (disproportionation), in
 * words and per cent, with a one-sentence summary as its text alternative.
 */
export const ExcipientMatrix = memo(function ExcipientMatrixView({
  project,
  chosen,
  rows,
}: {
  project: ProjectRecord;
  chosen: readonly string[];
  rows: readonly DisplayRow[];
}) {
  const uid = useId();
  const [busy, setBusy] = useState(false);
  // The ticks follow the click at once; the grid follows when the screen has been recomputed.
  const [ticked, setTicked] = useState<readonly string[]>(chosen);
  useEffect(() => setTicked(chosen), [chosen]);
  const columns = useMemo(() => chosenInTableOrder(chosen), [chosen]);
  const matrix = useMemo(() => matrixRows(rows, columns), [rows, columns]);
  const toggle = async (id: string) => {
    const next = ticked.includes(id) ? ticked.filter((x) => x !== id) : [...ticked, id];
    setTicked(next);
    setBusy(true);
    try {
      await saveExcipients(project.id, ticked, next);
    } finally {
      setBusy(false);
    }
  };
  const summaryId = `${uid}-summary`;
  return (
    <section className="panel excipient-matrix" aria-labelledby={`${uid}-title`}>
      <h2 id={`${uid}-title`}>Excipients’ microenvironment</h2>
      <p className="muted">
        Choose the tablet or capsule excipients: each salt is judged against each of them — the
        probability that the excipient’s published slurry pH lies beyond the salt’s pH_max (±1σ),
        where the salt would convert to the free form. Chosen excipients replace the single
        microenvironment pH of the screening conditions. Below{' '}
        {CONVERSION_BAND_LIMITS.possibleFrom * 100} %: unlikely; from{' '}
        {CONVERSION_BAND_LIMITS.likelyFrom * 100} %: likely (our banding).
      </p>
      <p className="muted">{EXCIPIENT_MATRIX_LIMITS}</p>
      {columns.length > 0 ? (
        <>
          <p id={summaryId} className="matrix-summary">
            {matrixSummary(matrix, columns)}
          </p>
          <ConversionGrid matrix={matrix} columns={columns} summaryId={summaryId} />
        </>
      ) : (
        <p>
          No excipients chosen: the screen uses the microenvironment pH of the screening conditions
          (an assumption until you state it).
        </p>
      )}
      <ExcipientChooser
        ticked={ticked}
        busy={busy}
        count={columns.length}
        onToggle={(id) => void toggle(id)}
      />
    </section>
  );
});

function ConversionGrid({
  matrix,
  columns,
  summaryId,
}: {
  matrix: readonly MatrixRow[];
  columns: readonly ExcipientRecord[];
  summaryId: string;
}) {
  return (
    <div className="table-scroll">
      <table
        className="data-table conversion-grid"
        aria-label="Conversion risk of each salt beside each excipient"
        aria-describedby={summaryId}
      >
        <thead>
          <tr>
            <th scope="col">Salt (pH_max)</th>
            {columns.map((e) => (
              <th scope="col" key={e.id}>
                {e.name}
                <br />
                <span className="unit">pH {phRangeText(e)}</span>
              </th>
            ))}
            <th scope="col">Decides</th>
          </tr>
        </thead>
        <tbody>
          {matrix.map((r) => (
            <tr key={r.id}>
              <th scope="row">
                {r.label}{' '}
                <span className="unit">
                  ({r.phMax === null ? 'no pH_max' : r.phMax.toFixed(1)})
                </span>
              </th>
              {r.cells.map((c) => (
                <td key={c.excipientId} className={`conv conv-${c.band}`}>
                  {c.percent ?? '—'}
                  <span className="conv-word">{c.words}</span>
                </td>
              ))}
              <td>{r.worst ? `${r.worst.name} (${r.worst.percent})` : '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function ExcipientChooser({
  ticked,
  busy,
  count,
  onToggle,
}: {
  ticked: readonly string[];
  busy: boolean;
  count: number;
  onToggle: (id: string) => void;
}) {
  // Open while nothing is chosen; then the user's own open/close is kept (ticking must not fold it).
  const [open, setOpen] = useState(count === 0);
  return (
    <details
      className="excipient-chooser"
      open={open}
      onToggle={(e) => setOpen(e.currentTarget.open)}
    >
      <summary>Choose the formulation’s excipients ({count} chosen)</summary>
      <div className="excipient-roles">
        {ROLES.map((role) => (
          <fieldset key={role} disabled={busy}>
            <legend>{EXCIPIENT_ROLE_NAMES[role]}</legend>
            {EXCIPIENTS.filter((e) => e.role === role).map((e) => (
              <label key={e.id} className="inline-check" title={`${e.measuredAs}; ${e.source}`}>
                <input
                  type="checkbox"
                  checked={ticked.includes(e.id)}
                  onChange={() => onToggle(e.id)}
                />
                {e.name} <span className="unit">pH {phRangeText(e)}</span>
              </label>
            ))}
          </fieldset>
        ))}
      </div>
      <p className="muted">
        Slurry pH from the Handbook of Pharmaceutical Excipients (6th ed., 2009) and papers on
        excipient-induced disproportionation, mostly recalled rather than re-read (“from memory”,
        shown on hover); a single published value is widened to ±0.5 pH. Check them against your
        lots.
      </p>
    </details>
  );
}
