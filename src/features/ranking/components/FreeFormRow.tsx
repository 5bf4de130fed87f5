import { memo } from 'react';
import { sig } from '@/components/charts/chart-format';
import type { FreeFormShown } from '../ranking-rows';
import { DoseCell, Origin } from './RankingCells';

/**
 * The free form as a row (in its own body) of the ranking table, with the same columns, not ranked: each salt is read
 * against it ("do I need a salt at all?"). Its "salt in water" cell is the free form's own intrinsic
 * solubility S₀; its active fraction is 100 % and its mass per dose the dose itself.
 */
export const FreeFormRow = memo(function FreeFormRowView({ f }: { f: FreeFormShown }) {
  return (
    <tbody className="free-form-body">
      <tr className="free-form-row">
        <td className="rank-cell">
          <span className="fixed-box rank-box" title="not ranked: read each salt against it">
            —
          </span>
        </td>
        <th scope="row" className="cand-cell">
          {f.label}
          <span className="muted small-note">read against; not ranked</span>
        </th>
        <td className="muted">—</td>
        <td className="muted">—</td>
        <td title={f.intrinsic.basis}>
          {sig(f.intrinsic.value, 2)} <span className="unit">mg/mL</span> <Origin n={f.intrinsic} />
          {f.intrinsic.range ? (
            <span className="range">
              ±1σ {sig(f.intrinsic.range[0], 2)}–{sig(f.intrinsic.range[1], 2)}
            </span>
          ) : null}
          <span className="muted small-note">S₀, intrinsic solubility of the free form</span>
        </td>
        <td className="muted">—</td>
        <DoseCell d={f.worstDose} />
        <DoseCell d={f.gastricDose} />
        <td className="muted">—</td>
        <td>
          100 %
          {f.doseMg !== null ? (
            <span className="muted small-note">{sig(f.doseMg)} mg per dose</span>
          ) : null}
        </td>
        <td className="reasons-cell">
          {f.flags.map((t) => (
            <span key={t} className="flag flag-likely-poorly-soluble">
              {t}
            </span>
          ))}
        </td>
      </tr>
    </tbody>
  );
});
