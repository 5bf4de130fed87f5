import { WELL_OUTCOMES, WELL_OUTCOME_LABELS, type PlannedWell, type WellOutcomeKind } from '@/chem';
import { FieldMessage } from '@/components/FieldMessage';
import type { CandidateRecord, StoredWellOutcome } from '@/persistence/records';
import { screenPlansRepo } from '@/persistence/screen-plans-repo';
import { useOutcomeDraft, useOutcomeSave, type OutcomeDraft } from '../hooks/use-outcome-draft';

/**
 * Record what came out of one well; a solid's melting point can be sent to the candidate's bench data
 * (a melting-point measurement) in one step.
 */
export function OutcomeForm({
  planId,
  projectId,
  well,
  stored,
  candidate,
  ionName,
}: {
  planId: string;
  projectId: string;
  well: PlannedWell;
  stored: StoredWellOutcome | undefined;
  candidate: CandidateRecord | undefined;
  ionName: string;
}) {
  const draft = useOutcomeDraft(well, stored);
  const { message, error, save, toBench } = useOutcomeSave({
    planId,
    projectId,
    well,
    candidate,
    ionName,
    draft,
  });
  const { outcome, mpValue, mpBad } = draft;
  const crystalline = outcome === 'crystalline-solid' || outcome === 'new-crystalline-form';
  return (
    <section className="panel outcome-form" aria-labelledby="outcome-title">
      <h3 id="outcome-title">
        Outcome of well {well.well}: {ionName} in {well.solventName}
      </h3>
      <OutcomeFields draft={draft} />
      <FieldMessage id="outcome-mp" error={mpBad ? 'A number from −50 to 500 °C.' : null} />
      <div className="outcome-actions">
        <button type="button" onClick={() => void save()} disabled={mpBad}>
          Record outcome
        </button>
        {crystalline && mpValue !== null && candidate ? (
          <button type="button" onClick={() => void toBench()} disabled={mpBad}>
            Send melting point to bench data
          </button>
        ) : null}
        {stored ? (
          <button
            type="button"
            onClick={() => void screenPlansRepo.clearOutcome(planId, well.well)}
          >
            Clear
          </button>
        ) : null}
      </div>
      {message ? <p role="status">{message}</p> : null}
      {error ? <p className="field-error">{error}</p> : null}
    </section>
  );
}

/** What came out, the melting point (onset) and a note. */
function OutcomeFields({ draft }: { draft: OutcomeDraft }) {
  const { outcome, setOutcome, mp, setMp, note, setNote, mpBad } = draft;
  return (
    <div className="outcome-fields">
      <label>
        What came out
        <select value={outcome} onChange={(e) => setOutcome(e.target.value as WellOutcomeKind)}>
          {WELL_OUTCOMES.map((k) => (
            <option key={k} value={k}>
              {WELL_OUTCOME_LABELS[k]}
            </option>
          ))}
        </select>
      </label>
      <label>
        Melting point (°C, onset)
        <input
          inputMode="decimal"
          value={mp}
          onChange={(e) => setMp(e.target.value)}
          aria-invalid={mpBad}
          aria-describedby={mpBad ? 'outcome-mp-error' : undefined}
        />
      </label>
      <label className="outcome-note">
        Note
        <input value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} />
      </label>
    </div>
  );
}
