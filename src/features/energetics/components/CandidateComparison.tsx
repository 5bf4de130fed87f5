import { solutionEnthalpiesRelativeToMedianKJ, type SaltThermoResult } from '@/chem';
import { WhiskerBars } from '@/components/charts/WhiskerBars';
import type { CandidateEnergetics, ProjectScreening } from '@/screening-data/compute-screening';
import { drugsPerFormula, kj, labelOf } from './energetics-labels';

type Thermo = CandidateEnergetics & { thermo: SaltThermoResult };

/** All candidates side by side: ΔH_sol per drug ion, the same relative to the median, and ΔH_L. */
export function CandidateComparison({
  data,
  withThermo,
  withoutThermo,
  measuredDH,
}: {
  data: ProjectScreening;
  withThermo: Thermo[];
  withoutThermo: CandidateEnergetics[];
  measuredDH: Map<string, number>;
}) {
  return (
    <section className="panel" aria-labelledby="compare-title">
      <h2 id="compare-title">All candidates side by side</h2>
      <p className="muted">
        ΔH<sub>sol</sub> is compared per drug ion (per formula unit ÷ drug ions in it), so that a
        2:1 salt stands beside 1:1 salts on the same footing.
      </p>
      <SolutionBars data={data} items={withThermo} measuredDH={measuredDH} />
      <RelativeBars data={data} items={withThermo} />
      <LatticeBars data={data} items={withThermo} />
      {withoutThermo.length ? (
        <p className="muted">
          Not estimated:{' '}
          {withoutThermo.map((e) => `${labelOf(data, e.candidateId)} (${e.reason})`).join('; ')}.
        </p>
      ) : null}
    </section>
  );
}

/** Estimated ΔH_sol per drug ion with ±1σ, and the calorimetric value where one is recorded. */
function SolutionBars({
  data,
  items,
  measuredDH,
}: {
  data: ProjectScreening;
  items: Thermo[];
  measuredDH: Map<string, number>;
}) {
  return (
    <WhiskerBars
      title="Estimated enthalpy of solution per drug ion"
      caption={`Bars: estimated ΔH_sol per drug ion (kJ/mol) with ±1σ whiskers; diamonds: ΔH_sol measured by calorimetry where recorded. ${items
        .map((e) => {
          const m = drugsPerFormula(data, e.candidateId);
          return `${labelOf(data, e.candidateId)} ${kj(e.thermo.solutionEnthalpyKJ.value / m)} ± ${(e.thermo.solutionEnthalpyKJ.uncertainty / m).toFixed(0)}`;
        })
        .join('; ')}.`}
      unit="ΔH_sol per drug ion, kJ/mol (negative: dissolving releases heat)"
      format={(x) => kj(x)}
      rows={items.map((e) => {
        const n = drugsPerFormula(data, e.candidateId);
        const m = measuredDH.get(e.candidateId);
        return {
          id: e.candidateId,
          label: labelOf(data, e.candidateId),
          value: e.thermo.solutionEnthalpyKJ.value / n,
          uncertainty: e.thermo.solutionEnthalpyKJ.uncertainty / n,
          ...(m !== undefined
            ? { marker: { value: m / n, label: `measured ${kj(m / n)} kJ/mol per drug ion` } }
            : {}),
        };
      })}
      width={760}
    />
  );
}

/** Estimated lattice enthalpy per formula unit with ±1σ and the method chosen. */
function LatticeBars({ data, items }: { data: ProjectScreening; items: Thermo[] }) {
  return (
    <WhiskerBars
      title="Estimated lattice enthalpy per formula unit"
      caption={`Lattice dissociation enthalpy ΔH_L (> 0) with ±1σ whiskers: ${items
        .map(
          (e) =>
            `${labelOf(data, e.candidateId)} ${kj(e.thermo.latticeEnthalpyKJ.value)} ± ${e.thermo.latticeEnthalpyKJ.uncertainty.toFixed(0)} (${e.thermo.methodChosen})`,
        )
        .join('; ')}.`}
      unit="ΔH_L, kJ/mol"
      format={(x) => kj(x)}
      rows={items.map((e) => ({
        id: e.candidateId,
        label: labelOf(data, e.candidateId),
        value: e.thermo.latticeEnthalpyKJ.value,
        uncertainty: e.thermo.latticeEnthalpyKJ.uncertainty,
        note: e.thermo.methodChosen,
      }))}
      width={760}
    />
  );
}

/** ΔH_sol per drug ion relative to the median candidate, with the drug ion's common error taken out. */
function RelativeBars({ data, items }: { data: ProjectScreening; items: Thermo[] }) {
  const drugIsCation = data.drugIon.charge > 0;
  const rel = solutionEnthalpiesRelativeToMedianKJ(
    items.map((e) => {
      const m = drugsPerFormula(data, e.candidateId);
      return {
        id: e.candidateId,
        perDrugKJ: e.thermo.solutionEnthalpyKJ.value / m,
        perDrugSigmaKJ: e.thermo.solutionEnthalpyKJ.uncertainty / m,
        drugHydrationSigmaKJ: (drugIsCation
          ? e.thermo.cationHydrationKJ
          : e.thermo.anionHydrationKJ
        ).uncertainty,
      };
    }),
  );
  return (
    <WhiskerBars
      title="Enthalpy of solution per drug ion relative to the median candidate"
      caption={`Relative ΔH_sol per drug ion (kJ/mol, median candidate = 0) with ±1σ whiskers from which the drug ion’s own hydration error is removed, as it is common to every candidate (assumption: that term fully shared, the others independent). ${rel
        .map((r) => `${labelOf(data, r.id)} ${kj(r.valueKJ)} ± ${r.sigmaKJ.toFixed(0)}`)
        .join('; ')}.`}
      unit="ΔH_sol − median, kJ/mol per drug ion"
      format={(x) => kj(x)}
      rows={rel.map((r) => ({
        id: r.id,
        label: labelOf(data, r.id),
        value: r.valueKJ,
        uncertainty: r.sigmaKJ,
      }))}
      width={760}
    />
  );
}
