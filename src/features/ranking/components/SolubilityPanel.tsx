import { memo, useMemo } from 'react';
import { PhSolubilityChart, type SolubilitySeries } from '@/components/charts/PhSolubilityChart';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import type { ScreenRow } from '@/chem';
import { downloadText } from '@/components/download-text';
import { profileCsvFileName, profileToCsv } from '../ph-profile-csv';

/** ICH M9 (2019): the highest dose must dissolve in 250 mL. */
const VOLUME_ML = 250;

/**
 * pH–solubility curves of the free form and the chosen salts, with the choice of salts beside it.
 * Re-renders only when the screen, the chosen salts or the top three change — not on every weight.
 */
export const SolubilityPanel = memo(function SolubilityPanelView({
  data,
  labels,
  topKey,
  doseMg,
}: {
  data: ProjectScreening;
  labels: Record<string, string>;
  /** Ids of the current top three, joined with '|'. */
  topKey: string;
  doseMg: number | null;
}) {
  const chartIds = useRankingViewStore((s) => s.chartIds);
  const toggle = useRankingViewStore((s) => s.toggleChart);
  const top = topKey ? topKey.split('|') : [];
  const chosen = chartIds ?? top;
  const rows = data.screen.rows.filter((r) => !r.error);
  const chosenKey = rows
    .filter((r) => chosen.includes(r.id))
    .map((r) => r.id)
    .join('|');
  const series = useMemo(
    () =>
      seriesOf(
        data,
        rows.filter((r) => chosenKey.split('|').includes(r.id)),
        labels,
      ),
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [data, chosenKey, labels],
  );
  return (
    <section className="panel" aria-labelledby="solubility-title">
      <h2 id="solubility-title">Solubility against pH</h2>
      <div className="solubility-layout">
        <MemoChart
          series={series}
          doseMg={doseMg}
          title={`Solubility (free-form equivalents) of ${data.screen.compoundName} and its salts`}
        />
        <fieldset className="chart-picks">
          <legend>Salts on the chart</legend>
          {rows.map((r) => (
            <label key={r.id} className="inline-check">
              <input
                type="checkbox"
                checked={chosen.includes(r.id)}
                onChange={() => toggle(r.id, top)}
              />
              {labels[r.id] ?? r.label}
            </label>
          ))}
        </fieldset>
      </div>
      <p className="profile-export">
        <button
          type="button"
          onClick={() => {
            const generatedAt = new Date().toISOString();
            const salts = rows.filter((r) => chosenKey.split('|').includes(r.id));
            downloadText(
              profileCsvFileName(data.screen.compoundName, generatedAt),
              profileToCsv({ data, salts, labels, generatedAt, appVersion: __APP_VERSION__ }),
              'text/csv;charset=utf-8',
            );
          }}
        >
          Download the profile data (CSV)
        </button>{' '}
        <span className="muted">
          pH grid, the free form and the salts on the chart, in mg/mL and log₁₀ mol/L, with the
          cautions.
        </span>
      </p>
      <FreeFormNote data={data} />
    </section>
  );
});

const MemoChart = memo(function MemoChartView({
  series,
  doseMg,
  title,
}: {
  series: SolubilitySeries[];
  doseMg: number | null;
  title: string;
}) {
  return (
    <PhSolubilityChart
      series={series}
      doseLineMgPerMl={doseMg ? doseMg / VOLUME_ML : null}
      title={title}
    />
  );
});

function seriesOf(
  data: ProjectScreening,
  chosen: ScreenRow[],
  labels: Record<string, string>,
): SolubilitySeries[] {
  return [
    {
      id: 'free-form',
      label: `free ${data.screen.drugKind}`,
      kind: 'free-form',
      points: data.screen.freeForm.profile,
      estimated: data.screen.freeForm.intrinsicOrigin !== 'measured',
    },
    ...chosen.map((r) => ({
      id: r.id,
      label: labels[r.id] ?? r.label,
      kind: 'salt' as const,
      points: r.profile,
      phMax: r.phMax,
      estimated: r.kspOrigin !== 'measured',
    })),
  ];
}

function FreeFormNote({ data }: { data: ProjectScreening }) {
  return (
    <p className="muted">
      Free form:{' '}
      {data.screen.freeForm.intrinsicOrigin === 'measured'
        ? 'measured S₀'
        : data.screen.freeForm.intrinsicOrigin === 'general-solubility-equation'
          ? 'S₀ from the General Solubility Equation (estimate)'
          : `S₀ entered, origin ${data.screen.freeForm.intrinsicOrigin.replace('-', ' ')}`}
      , log₁₀ S₀ = {data.screen.freeForm.log10IntrinsicM.value.toFixed(2)} ±{' '}
      {data.screen.freeForm.log10IntrinsicM.uncertainty.toFixed(2)} (mol/L). Salt curves without a
      measured salt solubility rest on an estimated K_sp (±1σ about one decade) — read their
      position relative to each other, not as predictions of a measured value.
    </p>
  );
}
