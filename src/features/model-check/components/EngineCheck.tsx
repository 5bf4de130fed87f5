import {
  estimateSaltThermo,
  getThermoIon,
  LATTICE_REFERENCE_SALTS,
  referenceLatticeEnthalpyKJ,
  type ThermoIon,
} from '@/chem';

const CATIONS = ['sodium', 'potassium'];
const ANIONS = ['chloride', 'bromide'];

const ion = (id: string): ThermoIon => {
  const i = getThermoIon(id);
  if (!i) throw new Error(`bundled ion ${id} missing`);
  return i;
};

/**
 * The engine check, folded at the end of Model check: Kapustinskii lattice enthalpies of four simple
 * salts beside their Born–Haber values, with the radii used and their source, so anyone can see the
 * thermochemistry engine at work on salts whose values they know. Not something a formulator acts on,
 * so it no longer opens the Compound area.
 */
export function EngineCheck() {
  const rows = CATIONS.flatMap((c) =>
    ANIONS.map((a) => {
      const cat = ion(c);
      const an = ion(a);
      const r = estimateSaltThermo({
        cation: cat,
        anion: an,
        cationsPerFormula: 1,
        anionsPerFormula: 1,
        method: 'kapustinskii',
      });
      const refSalt = LATTICE_REFERENCE_SALTS.find((s) => s.cation === c && s.anion === a);
      const ref = refSalt ? referenceLatticeEnthalpyKJ(refSalt) : undefined;
      return {
        salt: `${cat.formula ?? cat.label}${an.formula ?? an.label}`,
        cat,
        an,
        e: r.latticeEnthalpyKJ,
        ref,
      };
    }),
  );
  const radiusSource = ion('sodium').radiusA?.sources[0] ?? '';
  return (
    <details className="panel engine-check">
      <summary>
        <h2 id="engine-check-title">
          Engine check: Kapustinskii lattice enthalpies of NaCl, NaBr, KCl, KBr
        </h2>
      </summary>
      <p className="convention">
        Sign convention: lattice <em>dissociation</em> enthalpy ΔH<sub>L</sub> &gt; 0 for MX(s) →
        M⁺(g) + X⁻(g); the formation (textbook) value is the same number with a minus sign.
      </p>
      <table className="data-table" aria-labelledby="engine-check-title">
        <thead>
          <tr>
            <th scope="col">Salt</th>
            <th scope="col">r₊ (Å)</th>
            <th scope="col">r₋ (Å)</th>
            <th scope="col">
              ΔH<sub>L</sub> (kJ/mol)
            </th>
            <th scope="col">Born–Haber (kJ/mol)</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ salt, cat, an, e, ref }) => (
            <tr key={salt}>
              <th scope="row">{salt}</th>
              <td>{cat.radiusA?.value.toFixed(2)}</td>
              <td>{an.radiusA?.value.toFixed(2)}</td>
              <td>
                {e.value.toFixed(0)} ± {e.uncertainty.toFixed(0)}
              </td>
              <td>{ref ? ref.value.toFixed(0) : '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="source">
        Radii: {radiusSource}. Method: Kapustinskii 1956 (CRC Handbook form, K = 1214 kJ·Å/mol);
        uncertainty is the method’s RMS error on the bundled reference salts. Born–Haber: from ΔfH°
        (Wagman et al. 1982, NBS tables) and ionisation energies / electron affinities (CRC
        Handbook) — entered from memory.
      </p>
    </details>
  );
}
