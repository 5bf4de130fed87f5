import { describe, expect, it } from 'vitest';
import {
  derivedAnionVolumes,
  findThermoIon,
  getThermoIon,
  formulaMolarMassGPerMol,
  listThermoIonIds,
  referenceVolumeNm3,
} from '@/chem';
import { LATTICE_REFERENCE_SALTS } from '@/chem/data/thermo-reference';
import { THERMO_IONS } from '@/chem/data/thermo-ions';
import { BONDI_RADIUS_A, ZHAO_ATOM_VOLUME_A3 } from '@/chem/data/thermo-elements';

describe('bundled ion data', () => {
  it('covers the ions issue 3 lists, each value with a source', () => {
    const need = [
      'lithium',
      'sodium',
      'potassium',
      'rubidium',
      'caesium',
      'magnesium',
      'calcium',
      'strontium',
      'barium',
      'zinc',
      'aluminium',
      'fluoride',
      'chloride',
      'bromide',
      'iodide',
      'oxide',
      'ammonium',
      'nitrate',
      'sulfate',
      'hydrogen-sulfate',
      'carbonate',
      'perchlorate',
      'phosphate',
      'dihydrogen-phosphate',
      'hydroxide',
      'acetate',
      'tetramethylammonium',
      'tetraethylammonium',
    ];
    for (const id of need) expect(listThermoIonIds()).toContain(id);
    for (const r of THERMO_IONS) {
      for (const v of [
        r.shannonRadiusA,
        r.goldschmidtRadiusA,
        r.thermochemicalRadiusA,
        r.volumeNm3,
        r.hydrationEnthalpyKJ,
      ]) {
        if (v) expect(v.source).toMatch(/\d{4}|Handbook/);
        if (v?.fromMemory) expect(v.source).toContain('from memory');
      }
    }
  });

  it('Shannon radii add up to the measured nearest-neighbour distance of rock-salt alkali halides within 3 %', () => {
    // r₀ = a/2, cell edges from R. W. G. Wyckoff, Crystal Structures vol. 1 (1963) (from memory):
    // NaCl 5.640, KCl 6.293, KBr 6.600, NaF 4.634, RbCl 6.581 Å.
    const cases: [string, string, number][] = [
      ['sodium', 'chloride', 5.64],
      ['potassium', 'chloride', 6.293],
      ['potassium', 'bromide', 6.6],
      ['sodium', 'fluoride', 4.634],
      ['rubidium', 'chloride', 6.581],
    ];
    for (const [c, a, edge] of cases) {
      const sum = getThermoIon(c)!.crystalRadiusA!.value + getThermoIon(a)!.crystalRadiusA!.value;
      expect(Math.abs(sum / (edge / 2) - 1)).toBeLessThan(0.03);
    }
  });

  it('Zhao atom volumes are the sphere volumes of Bondi radii (within 0.5 %)', () => {
    // Bondi 1964, J. Phys. Chem. 68, 441: radii; Zhao, Abraham & Zissimos 2003 Table 1: (4/3)πr³.
    for (const [el, r] of Object.entries(BONDI_RADIUS_A)) {
      expect(Math.abs(ZHAO_ATOM_VOLUME_A3[el]! / ((4 / 3) * Math.PI * r ** 3) - 1)).toBeLessThan(
        0.005,
      );
    }
  });

  it('formula masses agree with the CRC Handbook molar masses', () => {
    // CRC Handbook, "Physical Constants of Inorganic Compounds": NaCl 58.44, CaSO4 136.14, KH2PO4 136.09 g/mol.
    expect(formulaMolarMassGPerMol('NaCl')).toBeCloseTo(58.44, 1);
    expect(formulaMolarMassGPerMol('CaSO4')).toBeCloseTo(136.14, 1);
    expect(formulaMolarMassGPerMol('KH2PO4')).toBeCloseTo(136.09, 1);
  });

  it('finds ions by id and by symbol, and returns undefined for unknown names', () => {
    expect(findThermoIon('Na+')?.id).toBe('sodium');
    expect(findThermoIon('SO4 2-')?.id).toBe('sulfate');
    expect(findThermoIon('Ca2+')?.charge).toBe(2);
    expect(findThermoIon('sulfate')?.charge).toBe(-2);
    expect(getThermoIon('unobtainium')).toBeUndefined();
    expect(findThermoIon('Xx+')).toBeUndefined();
  });

  it('Jenkins ion volumes add up to the volumes of salts measured by density (within 15 % on average)', () => {
    // Ion volumes: Jenkins, Roobottom, Passmore & Glasser 1999 (Inorg. Chem. 38, 3609); densities: CRC Handbook.
    const salts = LATTICE_REFERENCE_SALTS.filter((s) => {
      const c = THERMO_IONS.find((i) => i.id === s.cation)!;
      const a = THERMO_IONS.find((i) => i.id === s.anion)!;
      return c.volumeNm3 && a.volumeNm3 && s.volume.kind === 'density' && s.group === 'polyatomic';
    });
    expect(salts.length).toBeGreaterThanOrEqual(8);
    const errs = salts.map((s) => {
      const c = THERMO_IONS.find((i) => i.id === s.cation)!.volumeNm3!.value;
      const a = THERMO_IONS.find((i) => i.id === s.anion)!.volumeNm3!.value;
      return Math.abs((s.p * c + s.q * a) / referenceVolumeNm3(s) - 1);
    });
    expect(errs.reduce((x, y) => x + y, 0) / errs.length).toBeLessThan(0.15);
  });

  it('volumes derived here for anions without a Jenkins value sit between the published volumes of neighbours', () => {
    const d = derivedAnionVolumes();
    // acetate is larger than nitrate and smaller than 1.2 × sulfate (Jenkins volumes)
    expect(d.get('acetate')!.value).toBeGreaterThan(getThermoIon('nitrate')!.volumeNm3!.value);
    expect(d.get('acetate')!.value).toBeLessThan(getThermoIon('sulfate')!.volumeNm3!.value * 1.2);
    // hydroxide lies between F⁻ (0.025) and Cl⁻ (0.047 nm³), ±30 %
    expect(d.get('hydroxide')!.value).toBeGreaterThan(0.025 * 0.7);
    expect(d.get('hydroxide')!.value).toBeLessThan(0.047 * 1.3);
  });

  it('every bundled ion with a published hydration enthalpy has it negative', () => {
    for (const id of listThermoIonIds()) {
      const h = getThermoIon(id)!.hydrationEnthalpyKJ;
      if (h) expect(h.value).toBeLessThan(0);
    }
  });
});
