import { CartesianGrid, ComposedChart, Line, Scatter, XAxis, YAxis, Tooltip } from 'recharts';
import { sig } from './chart-format';
import './charts.css';

export interface VantHoffData {
  points: { temperatureK: number; solubility: number }[];
  /** ln S = intercept + slope·(1/T), slope in K. */
  fit: {
    lnSSlopeOnInverseTK: number;
    interceptLnS: number;
    solutionEnthalpyKJ: number;
    standardErrorKJ: number;
    rSquared: number;
  } | null;
  unit: string;
}

/**
 * van 't Hoff plot: ln S against 1000/T with the least-squares line and the apparent ΔH_sol it gives.
 * Recharts; the caption is its text alternative.
 */
export function VantHoffPlot({
  data,
  title,
  width = 520,
  height = 300,
}: {
  data: VantHoffData;
  title: string;
  width?: number;
  height?: number;
}) {
  const pts = data.points.map((p) => ({ x: 1000 / p.temperatureK, lnS: Math.log(p.solubility) }));
  const xs = pts.map((p) => p.x);
  const xMin = Math.min(...xs);
  const xMax = Math.max(...xs);
  const pad = (xMax - xMin) * 0.1 || 0.05;
  const line = data.fit
    ? [xMin - pad, xMax + pad].map((x) => ({
        x,
        fitLnS: data.fit!.interceptLnS + data.fit!.lnSSlopeOnInverseTK * (x / 1000),
      }))
    : [];
  const caption = data.fit
    ? `${title}: ${pts.length} solubilities; fitted apparent ΔH_sol = ${data.fit.solutionEnthalpyKJ.toFixed(1)} ± ${data.fit.standardErrorKJ.toFixed(1)} kJ/mol (standard error), R² = ${data.fit.rSquared.toFixed(3)}.`
    : `${title}: ${pts.length} solubilities — at least three at two or more temperatures are needed for a fit.`;
  return (
    <figure className="chart vant-hoff">
      <div role="img" aria-label={caption}>
        <ComposedChart
          width={width}
          height={height}
          margin={{ top: 10, right: 20, bottom: 26, left: 10 }}
        >
          <CartesianGrid stroke="#eee6d6" />
          <XAxis
            dataKey="x"
            type="number"
            domain={[xMin - pad, xMax + pad]}
            tickFormatter={(v: number) => v.toFixed(3)}
            label={{ value: '1000 / T  (1/K)', position: 'insideBottom', offset: -14 }}
          />
          <YAxis
            type="number"
            domain={['auto', 'auto']}
            tickFormatter={(v: number) => v.toFixed(2)}
            label={{ value: `ln (S / ${data.unit})`, angle: -90, position: 'insideLeft', dy: 40 }}
          />
          <Tooltip formatter={(v) => sig(Number(v))} />
          {line.length ? (
            <Line
              data={line}
              dataKey="fitLnS"
              name="fit"
              stroke="#b4621b"
              dot={false}
              isAnimationActive={false}
            />
          ) : null}
          <Scatter
            data={pts}
            dataKey="lnS"
            name="measured"
            fill="#1f6f6b"
            isAnimationActive={false}
          />
        </ComposedChart>
      </div>
      <figcaption>{caption}</figcaption>
    </figure>
  );
}
