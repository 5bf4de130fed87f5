import type { ProjectRecord, MeasurementRecord } from '@/persistence/records';
import { useProjectScreening } from '@/screening-data/use-screening';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import type { SaltThermoResult } from '@/chem';
import { VantHoffPlot } from '@/components/charts/VantHoffPlot';
import { backedOutLattice, benchReadingOf, predictionFor, vantHoffOf } from '../bench-predictions';
import { BenchArea } from './BenchArea';
import { BenchReading } from './BenchReading';

const kj = (x: number) => x.toFixed(0).replace(/^-/, '−');

/** What the selected candidate's measurements give: ΔH_L backed out, and a van 't Hoff fit. */
function Derived({
  candidateId,
  measurements,
  data,
  status,
}: {
  candidateId: string;
  measurements: MeasurementRecord[];
  data: ProjectScreening | undefined;
  status: string;
}) {
  return (
    <section className="panel" aria-labelledby="derived-title">
      <h2 id="derived-title">From these measurements</h2>
      {status === 'loading' && !data ? (
        <p className="loading">Screening (for the predictions)…</p>
      ) : null}
      <h3>Lattice enthalpy from the measured ΔH_sol</h3>
      <LatticeBackOut lattice={backedOutLattice(candidateId, measurements, data)} />
      <h3>van ’t Hoff</h3>
      <VantHoffSection
        vh={vantHoffOf(candidateId, measurements)}
        thermo={data?.energetics[candidateId]?.thermo}
      />
    </section>
  );
}

/** ΔH_L from the latest calorimetric ΔH_sol through the cycle, beside the model's estimate. */
function LatticeBackOut({ lattice }: { lattice: ReturnType<typeof backedOutLattice> }) {
  if (lattice === null)
    return (
      <p className="muted">
        Record an enthalpy of solution (calorimetry) to back out the lattice enthalpy through the
        cycle.
      </p>
    );
  if ('error' in lattice) return <p className="field-error">{lattice.error}</p>;
  return (
    <p>
      ΔH_L = ΔH_sol − Σν·ΔH_hyd = {kj(lattice.measuredKJ)} − (
      {kj(lattice.measuredKJ - lattice.lattice.value)}) ={' '}
      <strong>
        {kj(lattice.lattice.value)} ± {lattice.lattice.uncertainty.toFixed(0)} kJ/mol
      </strong>{' '}
      (dissociation, &gt; 0), against the model’s {kj(lattice.estimate.value)} ±{' '}
      {lattice.estimate.uncertainty.toFixed(0)} kJ/mol. The hydration enthalpies are estimates, so
      this is only as good as they are; valid for ΔH_sol at infinite dilution.
    </p>
  );
}

/** Measured solubilities against temperature, the fit's apparent ΔH_sol and the cycle's beside it. */
function VantHoffSection({
  vh,
  thermo: t,
}: {
  vh: ReturnType<typeof vantHoffOf>;
  thermo: SaltThermoResult | null | undefined;
}) {
  if (vh === null)
    return (
      <p className="muted">
        Record solubilities at three or more temperatures (two or more distinct) in one medium for a
        van ’t Hoff fit.
      </p>
    );
  return (
    <>
      <VantHoffPlot
        title={`Solubility against temperature in ${vh.medium || 'the medium'}`}
        data={{
          points: vh.points,
          unit: 'mg/mL',
          fit: vh.fit
            ? {
                lnSSlopeOnInverseTK: vh.fit.lnSSlopeOnInverseTK,
                interceptLnS: vh.fit.interceptLnS,
                solutionEnthalpyKJ: vh.fit.solutionEnthalpyKJ.value,
                standardErrorKJ: vh.fit.standardErrorKJ,
                rSquared: vh.fit.rSquared,
              }
            : null,
        }}
      />
      {vh.fit ? (
        <p>
          Apparent ΔH_sol from the fit: {vh.fit.solutionEnthalpyKJ.value.toFixed(1)} ±{' '}
          {vh.fit.standardErrorKJ.toFixed(1)} kJ/mol (standard error)
          {t
            ? `; the cycle estimates ${kj(t.solutionEnthalpyKJ.value)} ± ${t.solutionEnthalpyKJ.uncertainty.toFixed(0)} kJ/mol at infinite dilution`
            : ''}
          . An apparent enthalpy from solubilities includes speciation and activity changes with
          temperature.
        </p>
      ) : (
        <p className="muted">No fit yet: {vh.reason}</p>
      )}
    </>
  );
}

/** The Bench data area wired to the project's screening (predictions beside measurements). */
export function BenchWorkspace({ project }: { project: ProjectRecord }) {
  const screening = useProjectScreening(project);
  const data = screening.result;
  return (
    <BenchArea
      project={project}
      extras={{
        ionNames: data?.ionNames,
        predictionFor: (m) => {
          if (!data)
            return (
              <span className="muted">
                {screening.status === 'error' ? `no screen: ${screening.error}` : 'computing…'}
              </span>
            );
          const p = predictionFor(m, data);
          return (
            <span title={p.basis}>
              {p.text}{' '}
              {p.kind === 'estimate' ? (
                <span className="origin origin-estimated">est.</span>
              ) : p.kind === 'from-measured' ? (
                <span className="origin origin-measured">from meas.</span>
              ) : null}
            </span>
          );
        },
        readingFor: (m) => {
          const view = benchReadingOf(m, screening.measurements ?? [], data);
          return view ? (
            <BenchReading view={view} projectId={project.id} measurementId={m.id} />
          ) : null;
        },
        derived: (candidateId) => (
          <Derived
            candidateId={candidateId}
            measurements={screening.measurements ?? []}
            data={data}
            status={screening.status}
          />
        ),
      }}
    />
  );
}
