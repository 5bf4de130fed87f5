import { kapustinskiiLatticeEnergyKJ, SKELETON_RADII_A } from '@/chem';

type IonKey = keyof typeof SKELETON_RADII_A;
const CATIONS: IonKey[] = ['Na+', 'K+'];
const ANIONS: IonKey[] = ['Cl-', 'Br-'];

/**
 * A first computed result: Kapustinskii lattice enthalpies of simple salts, with the radii and their
 * source, so a newcomer can see the engine at work on salts whose values they know.
 */
export function ReferenceLatticeTable() {
  const rows = CATIONS.flatMap((c) =>
    ANIONS.map((a) => {
      const cat = SKELETON_RADII_A[c];
      const an = SKELETON_RADII_A[a];
      const e = kapustinskiiLatticeEnergyKJ({
        cationCharge: cat.charge,
        anionCharge: an.charge,
        cationRadiusA: cat.radiusA,
        anionRadiusA: an.radiusA,
      });
      return { salt: `${c.replace('+', '')}${a.replace('-', '')}`, c, a, e };
    }),
  );
  return (
    <section className="panel" aria-labelledby="ref-lattice-title">
      <h2 id="ref-lattice-title">Engine check: Kapustinskii lattice enthalpies</h2>
      <p className="convention">
        Sign convention: lattice <em>dissociation</em> enthalpy ΔH<sub>L</sub> &gt; 0 for MX(s) → M⁺(g) + X⁻(g);
        the formation (textbook) value is the same number with a minus sign.
      </p>
      <table className="data-table">
        <thead>
          <tr>
            <th scope="col">Salt</th>
            <th scope="col">r₊ (Å)</th>
            <th scope="col">r₋ (Å)</th>
            <th scope="col">ΔH<sub>L</sub> (kJ/mol)</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ salt, c, a, e }) => (
            <tr key={salt}>
              <th scope="row">{salt}</th>
              <td>{SKELETON_RADII_A[c].radiusA.toFixed(2)}</td>
              <td>{SKELETON_RADII_A[a].radiusA.toFixed(2)}</td>
              <td>
                {e.value.toFixed(0)} ± {e.uncertainty.toFixed(0)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="source">Radii: {SKELETON_RADII_A['Na+'].source}. Method: {kapustinskiiLatticeEnergyKJ.name.replace('LatticeEnergyKJ', '')} (Kapustinskii 1956; CRC Handbook form).</p>
    </section>
  );
}
