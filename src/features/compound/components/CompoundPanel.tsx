import { S0_LOG10_SIGMA_BY_ORIGIN as S0_SIGMA } from '@/chem';
import type { ProjectRecord } from '@/persistence/records';
import { useStorageProblemStore } from '@/stores/storage-problem-store';
import { useCompoundAutosave } from '../hooks/use-compound-autosave';
import { useStructureCheck } from '../hooks/use-structure-check';
import { StructureCard } from './StructureCard';
import { Field, SaveBadge } from './CompoundFields';
import type { CompoundDraft, FieldErrors } from '../compound-form-model';
import '../compound.css';

/**
 * The compound definition, saved as the user types (hooks/use-compound-autosave.ts: an invalid draft
 * is never stored, and a valid edit is written shortly after the last keystroke and at once when the
 * page is hidden, reloaded or closed).
 */
export function CompoundPanel({ project }: { project: ProjectRecord }) {
  const structure = useStructureCheck(project.compound.smiles);
  // A lost database connection outranks this panel's own state (the banner says why).
  const connectionLost = useStorageProblemStore((s) => s.connectionLost !== null);
  const { draft, errors, saveState, change, applyComputedLogP } = useCompoundAutosave(
    project,
    structure,
  );

  return (
    <section aria-labelledby="compound-title" className="panel">
      <header className="panel-head">
        <h2 id="compound-title">Compound</h2>
        <SaveBadge state={connectionLost ? 'lost' : saveState} />
      </header>
      {project.isDemo ? (
        <p className="demo-banner" role="note">
          Demo project: <strong>Demorazine is fictional</strong> and every number in it is invented
          for demonstration. Create a project for your own compound under Projects.
        </p>
      ) : null}
      <form
        className="form-grid"
        onSubmit={(e) => e.preventDefault()}
        aria-label="Compound definition"
      >
        <IdentityFields draft={draft} errors={errors} onChange={change} />
        <SolubilityFields draft={draft} errors={errors} onChange={change} />
        <DoseAndSolidFields draft={draft} errors={errors} onChange={change} />
      </form>
      <StructureCard
        compound={project.compound}
        structure={structure.good}
        status={structure.status}
        onUseLogP={applyComputedLogP}
      />
    </section>
  );
}

type FieldsProps = {
  draft: CompoundDraft;
  errors: FieldErrors;
  onChange: (id: keyof CompoundDraft, value: string) => void;
};

/** What the compound is: name, acid or base, structure, formula, pKa values, ion charge. */
function IdentityFields({ draft, errors, onChange: change }: FieldsProps) {
  const common = { draft, errors, onChange: change };
  return (
    <>
      <Field id="name" label="Name" {...common} />
      <div className="field">
        <label htmlFor="compound-kind">Ionisable as</label>
        <select
          id="compound-kind"
          value={draft.kind}
          onChange={(e) => change('kind', e.target.value)}
        >
          <option value="base">Base (forms a cation)</option>
          <option value="acid">Acid (forms an anion)</option>
        </select>
      </div>
      <Field
        id="smiles"
        label="Structure (SMILES)"
        wide
        hint="Neutral free form, OpenSMILES"
        {...common}
      />
      <Field
        id="formula"
        label="Molecular formula"
        hint="Neutral free form, e.g. C18H20ClN3O"
        {...common}
      />
      <Field
        id="pKas"
        label={draft.kind === 'base' ? 'pKa of the conjugate acid(s)' : 'pKa(s)'}
        hint="25 °C, water; several values separated by commas"
        {...common}
      />
      <div className="field">
        <label htmlFor="compound-pKaOrigin">pKa origin</label>
        <select
          id="compound-pKaOrigin"
          value={draft.pKaOrigin}
          onChange={(e) => change('pKaOrigin', e.target.value)}
        >
          <option value="not-stated">Not stated (screened as predicted)</option>
          <option value="measured">Measured</option>
          <option value="literature">Literature</option>
          <option value="predicted">Predicted</option>
        </select>
      </div>
      <Field
        id="ionCharge"
        label="Charge of the salt-forming ion"
        hint="e.g. +1, or +2 for a dibasic drug"
        {...common}
      />
    </>
  );
}

/** What its solubility estimate rests on: S₀, melting point, log P, each with its origin. */
function SolubilityFields({ draft, errors, onChange: change }: FieldsProps) {
  const common = { draft, errors, onChange: change };
  return (
    <>
      <Field
        id="intrinsicSolubilityMgPerMl"
        label="Intrinsic solubility S₀"
        unit="mg/mL"
        inputMode="decimal"
        hint="Empty: estimated from melting point and log P (General Solubility Equation)"
        {...common}
      />
      <div className="field">
        <label htmlFor="compound-intrinsicSolubilityOrigin">
          S₀ origin <span className="unit">(1σ, decades)</span>
        </label>
        <select
          id="compound-intrinsicSolubilityOrigin"
          value={draft.intrinsicSolubilityOrigin}
          onChange={(e) => change('intrinsicSolubilityOrigin', e.target.value)}
        >
          <option value="">Not stated (screened as predicted, ±{S0_SIGMA['not-stated']})</option>
          <option value="measured">Measured (±{S0_SIGMA.measured})</option>
          <option value="literature">Literature (±{S0_SIGMA.literature})</option>
          <option value="predicted">Predicted (±{S0_SIGMA.predicted})</option>
        </select>
      </div>
      <Field id="meltingPointC" label="Melting point" unit="°C" inputMode="decimal" {...common} />
      <Field id="logP" label="log P" unit="octanol/water" inputMode="decimal" {...common} />
      <div className="field">
        <label htmlFor="compound-logPOrigin">log P origin</label>
        <select
          id="compound-logPOrigin"
          value={draft.logPOrigin}
          onChange={(e) => change('logPOrigin', e.target.value)}
        >
          <option value="">Not given</option>
          <option value="measured">Measured</option>
          <option value="literature">Literature</option>
          <option value="computed">Computed (openchemlib)</option>
        </select>
      </div>
    </>
  );
}

/** The dose, the free form's density or unit cell, and notes. */
function DoseAndSolidFields({ draft, errors, onChange: change }: FieldsProps) {
  const common = { draft, errors, onChange: change };
  return (
    <>
      <Field
        id="doseMg"
        label="Highest single dose"
        unit="mg, as free form"
        inputMode="decimal"
        {...common}
      />
      <Field
        id="densityGPerCm3"
        label="Density of the free form"
        unit="g/cm³, measured"
        inputMode="decimal"
        {...common}
      />
      <Field
        id="cellVolumeA3"
        label="Unit-cell volume"
        unit="Å³, free-form crystal"
        inputMode="decimal"
        {...common}
      />
      <Field
        id="formulaUnitsPerCell"
        label="Molecules per cell (Z)"
        inputMode="decimal"
        {...common}
      />
      <Field id="notes" label="Notes" wide {...common} />
    </>
  );
}
