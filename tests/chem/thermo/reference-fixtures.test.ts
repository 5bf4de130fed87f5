import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import {
  referenceLatticeEnthalpyKJ,
  referenceSolutionEnthalpyKJ,
  referenceVolumeNm3,
} from '@/chem';
import { THERMO_IONS } from '@/chem/data/thermo-ions';
import {
  formationEnthalpySource,
  ANION_VOLUME_SALTS,
  ANION_VOLUME_SOURCE,
  AQUEOUS_ION_FORMATION_KJ,
  ATOM_FORMATION_KJ,
  CYCLE_DATA_SOURCE,
  ELECTRON_AFFINITY_KJ,
  IONISATION_ENERGY_SUM_KJ,
  LATTICE_REFERENCE_SALTS,
  PACKING_CALIBRATION_SALTS,
  SOLID_FORMATION_KJ,
  SOLUTION_REFERENCE_SALTS,
} from '@/chem/data/thermo-reference';
import { SRC } from '@/chem/data/thermo-sources';
import { SOLUTION_REFERENCE_SOURCE } from '@/chem/thermo/validation/reference';

/**
 * fixtures/reference/*.csv are the published reference sets in a form people and other tools can read,
 * one source per row, with the derived columns (reference lattice enthalpies, volumes) the core
 * computes. The tables themselves have one source of truth, fixtures/reference/thermo-*.json, from which
 * src/chem/data/*.data.ts is generated (tests/chem/data/reference-data.test.ts). The CSVs are written
 * by this test when SALTSMITH_WRITE_FIXTURES=1, and otherwise compared with what the core computes.
 */
const DIR = resolve(__dirname, '../../../fixtures/reference');
const round = (x: number, d = 2) => Number(x.toFixed(d));

function tables(): Record<string, Record<string, unknown>[]> {
  return {
    'lattice-enthalpies.csv': LATTICE_REFERENCE_SALTS.map((s) => {
      const ref = referenceLatticeEnthalpyKJ(s);
      return {
        salt: s.formula,
        cation: s.cation,
        anion: s.anion,
        cations_per_formula: s.p,
        anions_per_formula: s.q,
        group: s.group,
        lattice_enthalpy_kJ_per_mol: round(ref.value, 1),
        route: s.route,
        source: ref.source,
        formula_unit_volume_nm3: round(referenceVolumeNm3(s), 5),
        volume_from:
          s.volume.kind === 'density'
            ? `density ${s.volume.densityGPerCm3} g/cm3`
            : s.volume.kind === 'cell'
              ? `${s.volume.structure} cell a = ${s.volume.edgeA} Å`
              : `cell volume ${round(s.volume.cellVolumeA3, 2)} Å3, Z = ${s.volume.z}`,
        volume_source: s.volume.source,
      };
    }),
    'hydration-enthalpies.csv': THERMO_IONS.filter((i) => i.hydrationEnthalpyKJ).map((i) => ({
      ion: i.id,
      label: i.label,
      charge: i.charge,
      hydration_enthalpy_kJ_per_mol: i.hydrationEnthalpyKJ!.value,
      source: i.hydrationEnthalpyKJ!.source,
    })),
    'solution-enthalpies.csv': SOLUTION_REFERENCE_SALTS.map((s) => ({
      salt: s.formula,
      cation: s.cation,
      anion: s.anion,
      cations_per_formula: s.p,
      anions_per_formula: s.q,
      solid_formation_enthalpy_kJ_per_mol: SOLID_FORMATION_KJ[s.formula],
      solution_enthalpy_kJ_per_mol: round(referenceSolutionEnthalpyKJ(s), 2),
      source: SOLUTION_REFERENCE_SOURCE,
    })),
    'formation-enthalpies.csv': [
      ...Object.entries(SOLID_FORMATION_KJ).map(([k, v]) => ({
        species: k,
        state: 'cr',
        enthalpy_kJ_per_mol: v,
        quantity: 'ΔfH°',
        source: formationEnthalpySource(k, 'cr'),
      })),
      ...Object.entries(AQUEOUS_ION_FORMATION_KJ).map(([k, v]) => ({
        species: k,
        state: 'aq',
        enthalpy_kJ_per_mol: v,
        quantity: 'ΔfH°',
        source: formationEnthalpySource(k, 'aq'),
      })),
      ...Object.entries(ATOM_FORMATION_KJ).map(([k, v]) => ({
        species: k,
        state: 'g',
        enthalpy_kJ_per_mol: v,
        quantity: 'ΔfH° (atomisation)',
        source: formationEnthalpySource(k, 'g'),
      })),
      ...Object.entries(IONISATION_ENERGY_SUM_KJ).map(([k, v]) => ({
        species: k,
        state: 'g',
        enthalpy_kJ_per_mol: round(v, 1),
        quantity: 'sum of ionisation energies to the usual cation',
        source: CYCLE_DATA_SOURCE,
      })),
      ...Object.entries(ELECTRON_AFFINITY_KJ).map(([k, v]) => ({
        species: k,
        state: 'g',
        enthalpy_kJ_per_mol: v,
        quantity: 'electron affinity',
        source: CYCLE_DATA_SOURCE,
      })),
    ],
    'ion-sizes.csv': THERMO_IONS.map((i) => ({
      ion: i.id,
      label: i.label,
      charge: i.charge,
      shape: i.shape,
      shannon_radius_A: i.shannonRadiusA?.value ?? '',
      goldschmidt_radius_A: i.goldschmidtRadiusA?.value ?? '',
      thermochemical_radius_A: i.thermochemicalRadiusA?.value ?? '',
      volume_nm3: i.volumeNm3?.value ?? '',
      sources: [
        ...[i.shannonRadiusA, i.goldschmidtRadiusA, i.thermochemicalRadiusA, i.volumeNm3].flatMap(
          (v) => (v ? [v.source] : []),
        ),
        ...(i.volumeNm3
          ? []
          : ANION_VOLUME_SALTS.some((a) => a.anion === i.id)
            ? [`volume ${ANION_VOLUME_SOURCE}`]
            : i.shape === 'monatomic'
              ? []
              : [`no tabulated size: estimated from the formula (${SRC.zhao2003})`]),
      ].join(' | '),
    })),
    'packing-calibration-salts.csv': PACKING_CALIBRATION_SALTS.map((s) => ({
      salt: s.name,
      organic_ion_formula: s.organicFormula,
      organic_ion_charge: s.organicCharge,
      aromatic_rings: s.rings.aromatic,
      non_aromatic_rings: s.rings.nonAromatic,
      partner_ion: s.partner,
      density_g_per_cm3: s.densityGPerCm3,
      source: s.source,
    })),
  };
}

describe('fixtures/reference CSV files', () => {
  const all = tables();
  if (process.env.SALTSMITH_WRITE_FIXTURES === '1') {
    if (!existsSync(DIR)) mkdirSync(DIR, { recursive: true });
    for (const [name, rows] of Object.entries(all))
      writeFileSync(resolve(DIR, name), Papa.unparse(rows) + '\n');
  }
  it.each(Object.keys(all))(
    '%s matches the bundled data and names a source on every row',
    (name) => {
      const text = readFileSync(resolve(DIR, name), 'utf8');
      expect(text).toBe(Papa.unparse(all[name]!) + '\n');
      const parsed = Papa.parse<Record<string, string>>(text.trim(), { header: true });
      expect(parsed.data.length).toBe(all[name]!.length);
      for (const row of parsed.data)
        expect((row.source ?? row.sources ?? '').length).toBeGreaterThan(10);
    },
  );
});
