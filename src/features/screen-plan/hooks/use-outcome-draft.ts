import { useEffect, useState } from 'react';
import type { PlannedWell, WellOutcomeKind } from '@/chem';
import type { CandidateRecord, StoredWellOutcome } from '@/persistence/records';
import { measurementsRepo } from '@/persistence/measurements-repo';
import { screenPlansRepo } from '@/persistence/screen-plans-repo';

/** The outcome being typed for one well, reset to the stored record when the well or record changes. */
export function useOutcomeDraft(well: PlannedWell, stored: StoredWellOutcome | undefined) {
  const [outcome, setOutcome] = useState<WellOutcomeKind>(stored?.outcome ?? 'crystalline-solid');
  const [mp, setMp] = useState(stored?.meltingPointC?.toString() ?? '');
  const [note, setNote] = useState(stored?.note ?? '');
  useEffect(() => {
    setOutcome(stored?.outcome ?? 'crystalline-solid');
    setMp(stored?.meltingPointC?.toString() ?? '');
    setNote(stored?.note ?? '');
  }, [well.well, stored]);
  const mpValue = mp.trim() === '' ? null : Number(mp);
  const mpBad = mpValue !== null && (!Number.isFinite(mpValue) || mpValue < -50 || mpValue > 500);
  return { outcome, setOutcome, mp, setMp, note, setNote, mpValue, mpBad };
}

export type OutcomeDraft = ReturnType<typeof useOutcomeDraft>;

/**
 * Saving the draft: record the well's outcome, or send a solid's melting point to the candidate's
 * bench data; the confirmation (or error) belongs to the well and is cleared when the well changes.
 */
export function useOutcomeSave({
  planId,
  projectId,
  well,
  candidate,
  ionName,
  draft,
}: {
  planId: string;
  projectId: string;
  well: PlannedWell;
  candidate: CandidateRecord | undefined;
  ionName: string;
  draft: OutcomeDraft;
}) {
  const [message, setMessage] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  // The confirmation belongs to the well: the stored record arriving after a save must not clear it.
  useEffect(() => {
    setMessage(null);
    setError(null);
  }, [well.well]);
  const { outcome, note, mpValue, mpBad } = draft;

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

  return { message, error, save, toBench };
}
