import { useEffect, useId, useState } from 'react';
import { candidatesRepo } from '@/persistence/candidates-repo';
import type { CandidateRecord } from '@/persistence/records';

/** Water molecules per formula unit accepted for a hydrate (the stored record allows 0–20). */
const MAX_WATER = 20;

/** Validate the hydrate field: a number of water molecules per formula unit, 0–20, halves allowed. */
export function hydrateFromText(
  text: string,
): { ok: true; value: number } | { ok: false; error: string } {
  const t = text.trim().replace(',', '.');
  if (t === '') return { ok: true, value: 0 };
  const x = Number(t);
  if (!Number.isFinite(x)) return { ok: false, error: 'Water per formula unit must be a number' };
  if (x < 0 || x > MAX_WATER)
    return { ok: false, error: `Water per formula unit must be from 0 to ${MAX_WATER}` };
  if (Math.abs(x * 2 - Math.round(x * 2)) > 1e-9)
    return { ok: false, error: 'Use whole or half molecules (e.g. 0.5 for a hemihydrate)' };
  return { ok: true, value: x };
}

/**
 * The salt form of one candidate as the lab made it: water of crystallisation (it changes the active
 * fraction and the mass per dose), and removal from the shortlist with its measurements, after a
 * confirmation.
 */
export function CandidateForm({
  candidate,
  label,
  measurementCount,
}: {
  candidate: CandidateRecord;
  label: string;
  measurementCount: number;
}) {
  const uid = useId();
  const [text, setText] = useState(String(candidate.hydrateWater));
  const [error, setError] = useState<string | null>(null);
  const [confirm, setConfirm] = useState(false);
  useEffect(() => {
    setText(String(candidate.hydrateWater));
    setError(null);
    setConfirm(false);
  }, [candidate.id, candidate.hydrateWater]);

  const change = (value: string) => {
    setText(value);
    const r = hydrateFromText(value);
    if (!r.ok) {
      setError(r.error);
      return;
    }
    setError(null);
    if (r.value !== candidate.hydrateWater)
      void candidatesRepo.update(candidate.id, { hydrateWater: r.value });
  };

  return (
    <div className="candidate-form">
      <HydrateField uid={uid} text={text} error={error} onChange={change} />
      <div className="button-row">
        {confirm ? (
          <ConfirmRemove
            candidateId={candidate.id}
            label={label}
            measurementCount={measurementCount}
            onKeep={() => setConfirm(false)}
          />
        ) : (
          <button type="button" className="danger" onClick={() => setConfirm(true)}>
            Remove from shortlist…
          </button>
        )}
      </div>
    </div>
  );
}

/** Water of crystallisation per formula unit, with its message or hint. */
function HydrateField({
  uid,
  text,
  error,
  onChange,
}: {
  uid: string;
  text: string;
  error: string | null;
  onChange: (value: string) => void;
}) {
  return (
    <div className="field">
      <label htmlFor={`${uid}-water`}>
        Water of crystallisation <span className="unit">(H₂O per formula unit)</span>
      </label>
      <input
        id={`${uid}-water`}
        inputMode="decimal"
        value={text}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${uid}-water-error` : `${uid}-water-hint`}
        onChange={(e) => onChange(e.target.value)}
      />
      {error ? (
        <p className="field-error" id={`${uid}-water-error`}>
          {error}
        </p>
      ) : (
        <p className="field-hint" id={`${uid}-water-hint`}>
          0 for an anhydrate; counts in the salt’s mass per dose
        </p>
      )}
    </div>
  );
}

/** The confirmation before the candidate and its measurements leave the shortlist. */
function ConfirmRemove({
  candidateId,
  label,
  measurementCount,
  onKeep,
}: {
  candidateId: string;
  label: string;
  measurementCount: number;
  onKeep: () => void;
}) {
  return (
    <span role="group" aria-label={`Confirm removing ${label}`}>
      Remove {label}
      {measurementCount
        ? ` and its ${measurementCount} measurement${measurementCount === 1 ? '' : 's'}`
        : ''}
      ?{' '}
      <button
        type="button"
        className="danger"
        onClick={() => void candidatesRepo.remove(candidateId)}
      >
        Remove
      </button>{' '}
      <button type="button" onClick={onKeep}>
        Keep
      </button>
    </span>
  );
}
