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
 * A first computed result: Kapustinskii lattice enthalpies of simple salts from the thermochemistry engine,
 * with the radii it used and their cited source, so a newcomer can see the engine at work on salts whose
 * values they know.
 */
export function ReferenceLatticeTable() {
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
    <section className="panel" aria-labelledby="ref-lattice-title">
      <h2 id="ref-lattice-title">Engine check: Kapustinskii lattice enthalpies</h2>
      <p className="convention">
        Sign convention: lattice <em>dissociation</em> enthalpy ΔH<sub>L</sub> &gt; 0 for MX(s) →
        M⁺(g) + X⁻(g); the formation (textbook) value is the same number with a minus sign.
      </p>
      <table className="data-table">
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
    </section>
  );
}
