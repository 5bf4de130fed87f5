// Fictional compounds for the batch tests (invented numbers, a workload only; never chemistry to
// check): formula-only bases and acids with varied pKa values, intrinsic solubility or melting point
// and logP, dose and, for some, their own counter-ion list. Deterministic: the same list every run.
export const BATCH_HEADER =
  'id,name,smiles,formula,kind,pkas,charge,s0_mg_per_ml,mp_c,logp,dose_mg,ions';

/** `n` CSV lines (without the header) of fictional compounds. */
export function generatedCompoundLines(n) {
  const lines = [];
  for (let i = 0; i < n; i++) {
    const acid = i % 4 === 3;
    const c = 12 + (i % 13);
    const h = 2 * c - 5 + (i % 6);
    const nN = acid ? i % 2 : 1 + (i % 3);
    const o = 1 + (i % 4);
    const pkas = acid
      ? (2.8 + (i % 23) / 10).toFixed(1)
      : i % 7 === 0
        ? `${(3 + (i % 5) / 10).toFixed(1)};${(7 + (i % 19) / 10).toFixed(1)}`
        : (5.5 + (i % 37) / 10).toFixed(1);
    const charge = !acid && i % 7 === 0 && i % 2 === 0 ? '2' : '';
    const s0 = i % 3 === 0 ? '' : (0.0007 * (1 + (i % 60))).toFixed(4);
    const mp = s0 ? '' : String(110 + (i % 120));
    const logp = s0 ? '' : (0.5 + (i % 40) / 10).toFixed(1);
    const dose = i % 9 === 0 ? '' : String(5 + (i % 50) * 10);
    const ions = acid
      ? i % 2 === 0
        ? 'sodium;potassium;calcium;meglumine'
        : ''
      : i % 5 === 0
        ? 'chloride;mesylate;sulfate;tosylate;maleate'
        : '';
    lines.push(
      `GEN-${i},Generated compound ${i} (fictional),,C${c}H${h}N${nN}O${o},${acid ? 'acid' : 'base'},${pkas},${charge},${s0},${mp},${logp},${dose},${ions}`,
    );
  }
  return lines;
}
