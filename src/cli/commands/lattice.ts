import { ChemInputError, estimateSaltThermo, findThermoIon, listThermoIonIds, stoichiometryFromCharges, type Estimate } from '@/chem';
import { parseFlags, writeLine, type CliCommand } from '../io';

const METHODS = ['auto', 'kapustinskii', 'born-mayer', 'born-lande', 'vbt'] as const;

const fmt = (e: Estimate, digits = 0) => `${e.value.toFixed(digits)} ± ${e.uncertainty.toFixed(digits)} kJ/mol [${e.method}]`;

/**
 * `saltsmith lattice --cation Na+ --anion Cl- [--method …] [--structure rock-salt] [--volume nm³]
 * [--density g/cm³] [--json]`: one salt's lattice, hydration and solution enthalpies, for a person at a
 * terminal. Ions by bundled id (`sodium`) or symbol (`Na+`, `SO4 2-`); stoichiometry from the charges.
 */
export const latticeCommand: CliCommand = {
  summary: 'lattice, hydration and solution enthalpies of one salt',
  usage: 'saltsmith lattice --cation Na+ --anion Cl- [--method auto|kapustinskii|born-mayer|born-lande|vbt] [--structure rock-salt] [--volume nm3 | --density g/cm3] [--json]',
  run: async (args, io) => {
    const { flags } = parseFlags(args, ['json']);
    const cat = typeof flags.cation === 'string' ? findThermoIon(flags.cation) : undefined;
    const an = typeof flags.anion === 'string' ? findThermoIon(flags.anion) : undefined;
    if (!cat || !an) {
      writeLine(io.stderr, `unknown ion: give --cation and --anion as an id or symbol, e.g. --cation Na+ --anion Cl-. Ids: ${listThermoIonIds().join(', ')}`);
      return 2;
    }
    const method = typeof flags.method === 'string' ? flags.method : 'auto';
    if (!(METHODS as readonly string[]).includes(method)) {
      writeLine(io.stderr, `--method must be one of ${METHODS.join(', ')}`);
      return 2;
    }
    const num = (name: string): number | undefined => {
      const v = flags[name];
      if (v === undefined) return undefined;
      const n = Number(v);
      if (v === true || !Number.isFinite(n)) throw new ChemInputError(name, `"${String(v)}" is not a number`, 'a finite number');
      return n;
    };
    try {
      if (cat.charge <= 0) throw new ChemInputError('cation', `${cat.label} is not a cation`, 'a positive ion');
      if (an.charge >= 0) throw new ChemInputError('anion', `${an.label} is not an anion`, 'a negative ion');
      const st = stoichiometryFromCharges(cat.charge, an.charge);
      const volume = num('volume');
      const density = num('density');
      const r = estimateSaltThermo({
        cation: cat,
        anion: an,
        cationsPerFormula: st.cations,
        anionsPerFormula: st.anions,
        method: method as (typeof METHODS)[number],
        ...(typeof flags.structure === 'string' ? { structureType: flags.structure } : {}),
        ...(volume !== undefined ? { formulaUnitVolumeNm3: volume } : {}),
        ...(density !== undefined ? { densityGPerCm3: density } : {}),
      });
      if (flags.json) {
        writeLine(io.stdout, JSON.stringify({ cation: cat.id, anion: an.id, cationsPerFormula: st.cations, anionsPerFormula: st.anions, ...r }));
      } else {
        const salt = `${cat.formula ?? cat.label}${st.cations > 1 ? st.cations : ''}${an.formula ?? an.label}${st.anions > 1 ? st.anions : ''}`;
        writeLine(io.stdout, `${salt}  (${st.cations} ${cat.label} : ${st.anions} ${an.label})`);
        writeLine(io.stdout, `  ΔH_L (dissociation, > 0)  ${fmt(r.latticeEnthalpyKJ)}`);
        writeLine(io.stdout, `  ΔH_hyd ${cat.label.padEnd(18)} ${fmt(r.cationHydrationKJ)}`);
        writeLine(io.stdout, `  ΔH_hyd ${an.label.padEnd(18)} ${fmt(r.anionHydrationKJ)}`);
        writeLine(io.stdout, `  ΔH_sol (infinite dilution) ${fmt(r.solutionEnthalpyKJ)}`);
        writeLine(io.stdout, `  method: ${r.methodReason}`);
        writeLine(io.stdout, `  ${r.signConvention}`);
        writeLine(io.stdout, '  Screening estimate only: it does not establish a salt form; experiments decide.');
      }
      return 0;
    } catch (err) {
      writeLine(io.stderr, err instanceof ChemInputError ? err.message : String(err));
      return err instanceof ChemInputError ? 1 : 2;
    }
  },
};
