import { useEffect, useState } from 'react';
import { WELL_OUTCOMES, WELL_OUTCOME_LABELS, type PlannedWell, type WellOutcomeKind } from '@/chem';
import { FieldMessage } from '@/components/FieldMessage';
import type { CandidateRecord, StoredWellOutcome } from '@/persistence/records';
import { measurementsRepo } from '@/persistence/measurements-repo';
import { screenPlansRepo } from '@/persistence/screen-plans-repo';

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
  const [outcome, setOutcome] = useState<WellOutcomeKind>(stored?.outcome ?? 'crystalline-solid');
  const [mp, setMp] = useState(stored?.meltingPointC?.toString() ?? '');
  const [note, setNote] = useState(stored?.note ?? '');
  const [message, setMessage] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    setOutcome(stored?.outcome ?? 'crystalline-solid');
    setMp(stored?.meltingPointC?.toString() ?? '');
    setNote(stored?.note ?? '');
  }, [well.well, stored]);
  // The confirmation belongs to the well: the stored record arriving after a save must not clear it.
  useEffect(() => {
    setMessage(null);
    setError(null);
  }, [well.well]);

  const mpValue = mp.trim() === '' ? null : Number(mp);
  const mpBad = mpValue !== null && (!Number.isFinite(mpValue) || mpValue < -50 || mpValue > 500);

  const save = async () => {
    if (mpBad) return;
    try {
      await screenPlansRepo.recordOutcome(planId, well.well, {
        outcome,
        meltingPointC: mpValue,
        note,
        counterIonId: well.counterIonId,
        solventId: well.solventId,
      });
      setMessage(`Recorded for ${well.well}.`);
      setError(null);
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    }
  };

  const toBench = async () => {
    if (!candidate || mpValue === null || mpBad) return;
    await measurementsRepo.add({
      projectId,
      candidateId: candidate.id,
      kind: 'melting-point',
      value: mpValue,
      unit: '°C',
      ph: null,
      temperatureK: null,
      medium: '',
      text: `Salt screen well ${well.well} (${well.solventName}, ${well.method})${note ? `: ${note}` : ''}`,
    });
    setMessage(`Melting point ${mpValue} °C added to the bench data of ${ionName}.`);
  };

  const crystalline = outcome === 'crystalline-solid' || outcome === 'new-crystalline-form';
  return (
    <section className="panel outcome-form" aria-labelledby="outcome-title">
      <h3 id="outcome-title">
        Outcome of well {well.well}: {ionName} in {well.solventName}
      </h3>
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
