import { useState } from 'react';
import { formatIonFormula, stoichiometryKey, type LibraryIon } from '@/chem';
import type { CandidateRecord, ProjectRecord } from '@/persistence/records';
import { bestVerdictFor, verdictFor } from '../counter-ion-verdict';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import { IonEditForm } from './IonEditForm';
import { ShortlistCell } from './ShortlistCell';

const fmtCharge = (c: number) => (c > 0 ? `+${c}` : `−${-c}`);

/** One library row, with its details (sources, stoichiometries, edits) below when open. */
export function CounterIonRow({
  ion,
  project,
  candidate,
  open,
  onToggle,
}: {
  ion: LibraryIon;
  project: ProjectRecord;
  /** The shortlist entry of this ion, if it is on the shortlist. */
  candidate: CandidateRecord | null;
  open: boolean;
  onToggle: () => void;
}) {
  const detailsId = `ion-details-${ion.id}`;
  return (
    <>
      <tr className={`ion-row origin-${ion.origin}`}>
        <IonNameCell ion={ion} open={open} onToggle={onToggle} detailsId={detailsId} />
        <IonFigures ion={ion} project={project} />
        <ShortlistCell ion={ion} project={project} candidate={candidate} />
      </tr>
      {open ? (
        <tr className="ion-details-row">
          <td colSpan={8} id={detailsId}>
            <IonDetails ion={ion} project={project} />
          </td>
        </tr>
      ) : null}
    </>
  );
}

function IonNameCell({
  ion,
  open,
  onToggle,
  detailsId,
}: {
  ion: LibraryIon;
  open: boolean;
  onToggle: () => void;
  detailsId: string;
}) {
  return (
    <th scope="row">
      <button
        type="button"
        className="ion-name"
        aria-expanded={open}
        aria-controls={detailsId}
        onClick={onToggle}
      >
        {ion.name}
      </button>
      {ion.referenceOnly ? (
        <span className="ion-badge ion-badge-reference">reference only</span>
      ) : null}
      {ion.origin !== 'bundled' ? (
        <span className={`ion-badge ion-badge-${ion.origin}`}>
          {ion.origin === 'in-house' ? 'in-house' : 'edited for this project'}
        </span>
      ) : null}
    </th>
  );
}

function IonFigures({ ion, project }: { ion: LibraryIon; project: ProjectRecord }) {
  const verdict = bestVerdictFor(project, ion);
  const charges = [...new Set(ion.stoichiometries.map((s) => s.ionCharge))];
  return (
    <>
      <td>{formatIonFormula(ion.formula, ion.charge)}</td>
      <td>{charges.map(fmtCharge).join(', ')}</td>
      <td>
        {ion.pKas.length ? (
          ion.pKas.map((p) => p.value.toFixed(2)).join(', ')
        ) : (
          <span className="muted">not sourced</span>
        )}
      </td>
      <td>{ion.acceptabilityClass ?? '–'}</td>
      <td>
        {verdict ? (
          <span className={`ion-verdict verdict-${verdict.band}`} title={verdict.reason}>
            {verdict.deltaPka.toFixed(1)} · {verdict.label}
          </span>
        ) : (
          <span className="muted">{ion.pKas.length ? 'does not pair' : 'no pKa'}</span>
        )}
      </td>
      <td>{ion.molarMassGPerMol.toFixed(2)}</td>
    </>
  );
}

function IonDetails({ ion, project }: { ion: LibraryIon; project: ProjectRecord }) {
  return (
    <div className="ion-details">
      <div>
        <h3>{ion.name}</h3>
        {ion.synonyms.length ? <p className="muted">Also: {ion.synonyms.join(', ')}</p> : null}
        <p>
          Made from {ion.parent.name || 'its parent'} ({ion.parent.formula},{' '}
          {ion.parent.molarMassGPerMol.toFixed(2)} g/mol)
          {ion.ionSmiles ? (
            <>
              {' '}
              · ion SMILES <code>{ion.ionSmiles}</code>
            </>
          ) : null}
        </p>
        {ion.tradeNote ? <p className="ion-note">{ion.tradeNote}</p> : null}
        <table className="data-table ion-stoich-table" aria-label={`Salt forms of ${ion.name}`}>
          <thead>
            <tr>
              <th scope="col">Salt form</th>
              <th scope="col">drug : ion</th>
              <th scope="col">Ion</th>
              <th scope="col">M ion (g/mol)</th>
              <th scope="col">ΔpKa</th>
            </tr>
          </thead>
          <tbody>
            {ion.stoichiometries.map((s) => {
              const v = verdictFor(project, ion, s);
              return (
                <tr key={s.label}>
                  <td>{s.label}</td>
                  <td>{stoichiometryKey(s)}</td>
                  <td>{formatIonFormula(s.ionFormula, s.ionCharge)}</td>
                  <td>{s.ionMolarMassGPerMol.toFixed(2)}</td>
                  <td>{v ? `${v.deltaPka.toFixed(1)} (${v.label})` : '–'}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <div>
        <h4>Sources</h4>
        <ul className="ion-sources">
          {ion.pKas.map((p, i) => (
            <li key={i}>
              pKa {p.value.toFixed(2)}: {p.source}
            </li>
          ))}
          <li>Class: {ion.classSource}</li>
          {Object.entries(ion.sources)
            .filter(([k]) => k !== 'pKas' && k !== 'acceptabilityClass')
            .map(([k, v]) => (
              <li key={k}>
                {k}: {v}
              </li>
            ))}
        </ul>
        {ion.origin !== 'in-house' ? (
          <IonEditForm ion={ion} projectId={project.id} />
        ) : (
          <DeleteInHouseIon ion={ion} />
        )}
      </div>
    </div>
  );
}

/** Remove an in-house ion from every project's library (asks once more first). */
function DeleteInHouseIon({ ion }: { ion: LibraryIon }) {
  const [asking, setAsking] = useState(false);
  if (!ion.recordId) return null;
  const recordId = ion.recordId;
  return (
    <div className="button-row">
      {asking ? (
        <>
          <span>
            Remove “{ion.name}” from the library of every project? Shortlist entries that use it
            stay but lose its data.
          </span>
          <button
            type="button"
            className="danger"
            onClick={() => void customIonsRepo.remove(recordId)}
          >
            Remove in-house ion
          </button>
          <button type="button" onClick={() => setAsking(false)}>
            Keep it
          </button>
        </>
      ) : (
        <button type="button" className="danger" onClick={() => setAsking(true)}>
          Remove…
        </button>
      )}
    </div>
  );
}
