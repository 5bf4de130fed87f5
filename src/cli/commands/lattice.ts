import { defineCommand } from '../define-command';
import {
  ChemInputError,
  estimateSaltThermo,
  findThermoIon,
  listThermoIonIds,
  stoichiometryFromCharges,
  type Estimate,
} from '@/chem';
import { usageError } from '../args/cli-error';
import { helpRequested } from '../args/help';
import { parseFlags, refuseTogether } from '../args/parse-flags';
import { LATTICE_CAUTION } from '../output/cautions';
import { writeLine, type CliCommand } from '../io';
import { COMMAND_USAGE } from '../command-usage';
import { LATTICE_METHODS, SIZE_RANGES, STRUCTURE_TYPES } from './lattice-options';

const fmt = (e: Estimate, digits = 0) =>
  `${e.value.toFixed(digits)} ± ${e.uncertainty.toFixed(digits)} kJ/mol [${e.method}]`;

const { summary: SUMMARY, usage: USAGE } = COMMAND_USAGE.lattice;

/** The flags of `saltsmith lattice`. */
export const LATTICE_FLAGS = {
  help: { type: 'switch' },
  json: { type: 'switch' },
  cation: { type: 'string', maxLength: 80 },
  anion: { type: 'string', maxLength: 80 },
  method: { type: 'enum', values: LATTICE_METHODS },
  structure: { type: 'enum', values: STRUCTURE_TYPES },
  volume: { type: 'number', ...SIZE_RANGES.formulaUnitVolumeNm3, unit: 'nm³ per formula unit' },
  density: { type: 'number', ...SIZE_RANGES.densityGPerCm3, unit: 'g/cm³' },
} as const;

/** Which size inputs each method reads; giving one it does not read is a contradiction. */
const READS: Record<(typeof LATTICE_METHODS)[number], { volume: boolean; structure: boolean }> = {
  auto: { volume: true, structure: true },
  kapustinskii: { volume: false, structure: false },
  vbt: { volume: true, structure: false },
  'born-mayer': { volume: true, structure: true },
  'born-lande': { volume: true, structure: true },
};

/**
 * `saltsmith lattice --cation Na+ --anion Cl- [--method …] [--structure rock-salt] [--volume nm³]
 * [--density g/cm³] [--json]`: one salt's lattice, hydration and solution enthalpies, for a person at a
 * terminal. Ions by bundled id (`sodium`) or symbol (`Na+`, `SO4 2-`); stoichiometry from the charges.
 */
export const latticeCommand: CliCommand = defineCommand('lattice', {
  summary: SUMMARY,
  usage: USAGE,
  run: async (args, io) => {
    const flags = parseFlags(args, LATTICE_FLAGS);
    if (helpRequested(flags, io, USAGE)) return 0;
    if (flags.cation === undefined)
      throw usageError('--cation', 'is required', 'a bundled ion id or symbol, e.g. Na+');
    if (flags.anion === undefined)
      throw usageError('--anion', 'is required', 'a bundled ion id or symbol, e.g. Cl-');
    refuseTogether(flags, 'volume', 'density', 'give one measured size');
    const method = flags.method ?? 'auto';
    for (const f of ['volume', 'density', 'structure'] as const) {
      const reads = f === 'structure' ? READS[method].structure : READS[method].volume;
      if (flags[f] !== undefined && !reads)
        throw usageError(`--${f}`, `is not used by --method ${method}`);
    }
    const cat = findThermoIon(flags.cation);
    const an = findThermoIon(flags.anion);
    if (!cat || !an) {
      throw usageError(
        !cat ? '--cation' : '--anion',
        `unknown ion "${!cat ? flags.cation : flags.anion}"`,
        `an id or symbol, e.g. --cation Na+ --anion Cl-. Ids: ${listThermoIonIds().join(', ')}`,
      );
    }
    if (cat.charge <= 0)
      throw new ChemInputError('cation', `${cat.label} is not a cation`, 'a positive ion');
    if (an.charge >= 0)
      throw new ChemInputError('anion', `${an.label} is not an anion`, 'a negative ion');
    const st = stoichiometryFromCharges(cat.charge, an.charge);
    let molarMass: number | undefined;
    if (flags.density !== undefined) {
      if (cat.molarMassGPerMol === undefined || an.molarMassGPerMol === undefined) {
        throw new ChemInputError(
          '--density',
          'the molar mass of this salt is not known',
          'ions with a known formula',
        );
      }
      molarMass = st.cations * cat.molarMassGPerMol + st.anions * an.molarMassGPerMol;
    }
    const r = estimateSaltThermo({
      cation: cat,
      anion: an,
      cationsPerFormula: st.cations,
      anionsPerFormula: st.anions,
      method,
      ...(flags.structure !== undefined ? { structureType: flags.structure } : {}),
      ...(flags.volume !== undefined ? { formulaUnitVolumeNm3: flags.volume } : {}),
      ...(flags.density !== undefined
        ? { densityGPerCm3: flags.density, molarMassGPerMol: molarMass }
        : {}),
    });
    if (flags.json) {
      writeLine(
        io.stdout,
        JSON.stringify({
          cation: cat.id,
          anion: an.id,
          cationsPerFormula: st.cations,
          anionsPerFormula: st.anions,
          ...r,
        }),
      );
      return 0;
    }
    const salt = `${cat.formula ?? cat.label}${st.cations > 1 ? st.cations : ''}${an.formula ?? an.label}${st.anions > 1 ? st.anions : ''}`;
    const lines = [
      `${salt}  (${st.cations} ${cat.label} : ${st.anions} ${an.label})`,
      `  ΔH_L (dissociation, > 0)  ${fmt(r.latticeEnthalpyKJ)}`,
      ...(r.latticeCalibration.applied
        ? [`  ΔH_L before calibration   ${fmt(r.rawLatticeEnthalpyKJ)}`]
        : []),
      `  ΔH_hyd ${cat.label.padEnd(18)} ${fmt(r.cationHydrationKJ)}`,
      `  ΔH_hyd ${an.label.padEnd(18)} ${fmt(r.anionHydrationKJ)}`,
      `  ΔH_sol (infinite dilution) ${fmt(r.solutionEnthalpyKJ)}`,
      `  method: ${r.methodReason}`,
      `  ${r.signConvention}`,
      `  ${LATTICE_CAUTION}`,
    ];
    writeLine(io.stdout, lines.join('\n'));
    return 0;
  },
});
