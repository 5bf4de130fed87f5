import { useState } from 'react';
import { stoichiometryKey, type LibraryIon } from '@/chem';
import { candidatesRepo } from '@/persistence/candidates-repo';
import type { CandidateRecord, ProjectRecord } from '@/persistence/records';

/**
 * How a salt form's stoichiometry reads in the app: "1:1", else "2:1 (drug:counter-ion)" so the
 * order of the two numbers is never a guess.
 */
export function stoichiometryWords(s: { drugPerSalt: number; counterIonPerSalt: number }): string {
  const key = stoichiometryKey(s);
  return key === '1:1' ? key : `${key} (drug:counter-ion)`;
}

/** The shortlist cell: the salt form on the shortlist with a remove action, or the form to add one. */
export function ShortlistCell({
  ion,
  project,
  candidate,
}: {
  ion: LibraryIon;
  project: ProjectRecord;
  candidate: CandidateRecord | null;
}) {
  const [error, setError] = useState<string | null>(null);
  const act = async (work: () => Promise<unknown>, failure: string) => {
    setError(null);
    try {
      await work();
    } catch (err) {
      setError(err instanceof Error ? err.message : failure);
    }
  };
  return (
    <td className="ion-shortlist">
      {candidate ? (
        <OnShortlist
          ion={ion}
          candidate={candidate}
          onRemove={() =>
            act(() => candidatesRepo.remove(candidate.id), 'Could not remove from the shortlist')
          }
        />
      ) : (
        <AddToShortlist
          ion={ion}
          onAdd={(form) =>
            act(
              () => candidatesRepo.add(project.id, ion.id, form),
              'Could not add to the shortlist',
            )
          }
        />
      )}
      {error ? (
        <span className="field-error" role="alert">
          {error}
        </span>
      ) : null}
    </td>
  );
}

function OnShortlist({
  ion,
  candidate,
  onRemove,
}: {
  ion: LibraryIon;
  candidate: CandidateRecord;
  onRemove: () => Promise<void>;
}) {
  const [asking, setAsking] = useState(false);
  const form = ion.stoichiometries.find((s) => stoichiometryKey(s) === stoichiometryKey(candidate));
  const words = stoichiometryWords(candidate);
  const name = `${ion.name} (${words})`;
  return (
    <span className="button-row ion-on-list-row">
      <span className="ion-on-list">On shortlist</span>
      <span className="ion-on-list-form">
        {form ? `${form.label.replace(/\s*\(\d+:\d+\)$/, '')}, ${words}` : words}
      </span>
      {asking ? (
        // Removing a candidate also removes its bench records (candidatesRepo.remove): ask once more.
        <span role="group" aria-label={`Confirm removing ${name}`}>
          Remove it and any bench records of it?{' '}
          <button type="button" className="danger small" onClick={() => void onRemove()}>
            Remove
          </button>{' '}
          <button type="button" className="small" onClick={() => setAsking(false)}>
            Keep
          </button>
        </span>
      ) : (
        <button
          type="button"
          className="small"
          aria-label={`Remove ${name} from the shortlist…`}
          onClick={() => setAsking(true)}
        >
          Remove…
        </button>
      )}
    </span>
  );
}

function AddToShortlist({
  ion,
  onAdd,
}: {
  ion: LibraryIon;
  onAdd: (form: { drugPerSalt: number; counterIonPerSalt: number }) => Promise<void>;
}) {
  const [stoichIndex, setStoichIndex] = useState(0);
  const [busy, setBusy] = useState(false);
  const chosen = ion.stoichiometries[stoichIndex] ?? ion.stoichiometries[0]!;
  return (
    <span className="button-row">
      {ion.stoichiometries.length > 1 ? (
        <select
          aria-label={`Salt form of ${ion.name}`}
          value={stoichIndex}
          onChange={(e) => setStoichIndex(Number(e.target.value))}
        >
          {ion.stoichiometries.map((s, i) => (
            <option key={s.label} value={i}>
              {s.label}
            </option>
          ))}
        </select>
      ) : null}
      <button
        type="button"
        onClick={() => {
          setBusy(true);
          void onAdd({
            drugPerSalt: chosen.drugPerSalt,
            counterIonPerSalt: chosen.counterIonPerSalt,
          }).finally(() => setBusy(false));
        }}
        disabled={busy}
        aria-label={`Add ${ion.name} (${chosen.label}) to the shortlist`}
      >
        {/* Visible text kept inside the accessible name (WCAG 2.5.3, label in name). */}
        Add
      </button>
    </span>
  );
}
