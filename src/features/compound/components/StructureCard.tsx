import { useMemo } from 'react';
import { methodLabel } from '@/components/method-label';
import {
  drugIon,
  formatIonFormula,
  freeFormVolumeNm3,
  organicIonFromFormula,
  type Compound,
} from '@/chem';
import type { GoodStructure, StructureStatus } from '../hooks/use-structure-check';

const fmtU = (v: number, u: number, digits: number) =>
  `${v.toFixed(digits)} ± ${u.toFixed(digits)}`;

type Parsed = GoodStructure['parsed'];
type Derived = ReturnType<typeof deriveDrugIon>;
type DrugIon = NonNullable<Derived['ion']>;

/**
 * The compound's structure picture, formula and molar mass, and the salt-forming drug ion derived from
 * it: formula, mass, ring counts, additive volume and thermochemical radius (thermochemistry engine).
 */
export function StructureCard({
  compound,
  structure,
  status,
  onUseLogP,
}: {
  compound: Compound;
  structure: GoodStructure | null;
  status: StructureStatus;
  onUseLogP: (value: number) => void;
}) {
  const parsed =
    structure && structure.smiles === compound.smiles.trim() ? structure.parsed : undefined;
  const derived = useMemo(() => deriveDrugIon(compound, parsed), [compound, parsed]);
  const ion = derived.ion;

  return (
    <section className="structure-card" aria-labelledby="structure-title">
      <h3 id="structure-title">Structure and drug ion</h3>
      <div className="structure-grid">
        <StructurePicture compound={compound} parsed={parsed} status={status} />
        {ion ? (
          <dl className="structure-data">
            <DrugIonFacts compound={compound} ion={ion} />
            <VolumeFacts derived={derived} />
            {parsed?.logP ? <ComputedLogP logP={parsed.logP} onUseLogP={onUseLogP} /> : null}
          </dl>
        ) : (
          <p className="field-error">{derived.error}</p>
        )}
      </div>
      {[...(parsed?.notes ?? []), ...(ion?.notes ?? [])].map((n) => (
        <p key={n} className="structure-note" role="note">
          {n}
        </p>
      ))}
      <p className="source">
        Molar masses: IUPAC 2021 standard atomic weights.
        {derived.thermo?.volumeNm3
          ? ` Volume: ${derived.thermo.volumeNm3.sources.join('; ')}.`
          : ''}
        {derived.thermo?.radiusA ? ` Radius: ${derived.thermo.radiusA.sources.join('; ')}.` : ''}
      </p>
    </section>
  );
}

/**
 * The drug ion of the compound, its volume and radius from the thermochemistry engine (or why not),
 * and the free form's volume from a measured density or cell (null without one); or why no drug ion.
 */
function deriveDrugIon(compound: Compound, parsed: Parsed | undefined) {
  try {
    const ion = drugIon(compound, parsed);
    let thermo: ReturnType<typeof organicIonFromFormula> | null = null;
    let thermoError: string | null = null;
    try {
      thermo = organicIonFromFormula(ion.formula, ion.charge, ion.rings);
    } catch (err) {
      thermoError = err instanceof Error ? err.message : String(err);
    }
    let measuredVolume: ReturnType<typeof freeFormVolumeNm3> = null;
    try {
      measuredVolume = freeFormVolumeNm3({
        molarMassGPerMol: ion.freeFormMolarMassGPerMol,
        ...compound,
      });
    } catch {
      measuredVolume = null;
    }
    return { ion, thermo, thermoError, measuredVolume, error: null as string | null };
  } catch (err) {
    return {
      ion: null,
      thermo: null,
      thermoError: null,
      measuredVolume: null,
      error: err instanceof Error ? err.message : String(err),
    };
  }
}

/** The structure drawn by openchemlib, or why there is no picture. */
function StructurePicture({
  compound,
  parsed,
  status,
}: {
  compound: Compound;
  parsed: Parsed | undefined;
  status: StructureStatus;
}) {
  const svgUrl = parsed
    ? `data:image/svg+xml;charset=utf-8,${encodeURIComponent(parsed.svg)}`
    : null;
  return (
    <figure className="structure-figure">
      {svgUrl ? (
        <img src={svgUrl} alt={`Structure of ${compound.name}`} width={320} height={220} />
      ) : compound.smiles.trim() && (status === 'loading' || status === 'idle') ? (
        <p className="structure-placeholder" role="status">
          Drawing the structure (loading the chemistry library)…
        </p>
      ) : (
        <p className="structure-placeholder">
          {!compound.smiles.trim()
            ? 'No structure: formula only.'
            : status === 'unavailable'
              ? 'No picture: the chemistry library could not be loaded. Formula-based values below still hold.'
              : 'No picture: the stored SMILES cannot be read.'}
        </p>
      )}
      {parsed ? (
        <figcaption className="muted">Drawn by openchemlib from the stored SMILES.</figcaption>
      ) : null}
    </figure>
  );
}

/** Free form and drug ion: formula, molar mass, protons gained or lost, rings. */
function DrugIonFacts({ compound, ion }: { compound: Compound; ion: DrugIon }) {
  return (
    <>
      <dt>Free form</dt>
      <dd>
        {ion.freeFormFormula}, {ion.freeFormMolarMassGPerMol.toFixed(2)} g/mol
      </dd>
      <dt>Salt-forming drug ion</dt>
      <dd>
        {formatIonFormula(ion.formula, ion.charge)}, {ion.molarMassGPerMol.toFixed(2)} g/mol (
        {compound.kind === 'base'
          ? `free base + ${ion.charge} H⁺`
          : `free acid − ${-ion.charge} H⁺`}
        )
      </dd>
      <dt>Rings</dt>
      <dd>
        {ion.ringsKnown
          ? `${ion.rings.aromatic} aromatic, ${ion.rings.nonAromatic} non-aromatic`
          : 'unknown (formula only): the volume below assumes none — enter a SMILES for a better estimate'}
      </dd>
    </>
  );
}

/** Volumes and radius: the free form's measured one, the ion's estimated one, or why not. */
function VolumeFacts({ derived }: { derived: Derived }) {
  const { measuredVolume, thermo, thermoError } = derived;
  return (
    <>
      {measuredVolume ? (
        <>
          <dt>Free-form volume per molecule</dt>
          <dd>
            {fmtU(measuredVolume.value, measuredVolume.uncertainty, 3)} nm³{' '}
            <span className="muted">
              (from the{' '}
              {measuredVolume.method === 'cell'
                ? 'crystal cell, V/Z'
                : 'measured density, M/(ρ·N_A)'}
              )
            </span>
          </dd>
        </>
      ) : null}
      {thermo?.volumeNm3 ? (
        <>
          <dt>Ion volume (crystal)</dt>
          <dd>
            {fmtU(thermo.volumeNm3.value, thermo.volumeNm3.uncertainty, 3)} nm³{' '}
            <span className="muted">({methodLabel(thermo.volumeNm3.method)})</span>
          </dd>
        </>
      ) : null}
      {thermo?.radiusA ? (
        <>
          <dt>Thermochemical radius</dt>
          <dd>{fmtU(thermo.radiusA.value, thermo.radiusA.uncertainty, 2)} Å</dd>
        </>
      ) : null}
      {thermoError ? (
        <>
          <dt>Ion volume</dt>
          <dd className="field-error">{thermoError}</dd>
        </>
      ) : null}
    </>
  );
}

/** openchemlib's log P increment estimate, with a button to use it as the compound's log P. */
function ComputedLogP({
  logP,
  onUseLogP,
}: {
  logP: NonNullable<Parsed['logP']>;
  onUseLogP: (value: number) => void;
}) {
  return (
    <>
      <dt>log P, computed</dt>
      <dd>
        {fmtU(logP.value, logP.uncertainty, 1)}{' '}
        <span className="muted">(openchemlib increments; an estimate)</span>{' '}
        <button type="button" onClick={() => onUseLogP(Math.round(logP.value * 100) / 100)}>
          Use as log P
        </button>
      </dd>
    </>
  );
}
