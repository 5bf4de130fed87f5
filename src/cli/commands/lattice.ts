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

type LatticeFlags = ReturnType<typeof parseFlags<typeof LATTICE_FLAGS>>;
type Ion = NonNullable<ReturnType<typeof findThermoIon>>;

/** The flags' own rules: both ions given, one measured size, and only sizes the method reads. */
function refuseFlagMisuse(flags: LatticeFlags): {
  cation: string;
  anion: string;
  method: (typeof LATTICE_METHODS)[number];
} {
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
  return { cation: flags.cation, anion: flags.anion, method };
}

/** The two ions by id or symbol: a known cation and a known anion. */
function resolveIons(cation: string, anion: string): { cat: Ion; an: Ion } {
  const cat = findThermoIon(cation);
  const an = findThermoIon(anion);
  if (!cat || !an) {
    throw usageError(
      !cat ? '--cation' : '--anion',
      `unknown ion "${!cat ? cation : anion}"`,
      `an id or symbol, e.g. --cation Na+ --anion Cl-. Ids: ${listThermoIonIds().join(', ')}`,
    );
  }
  if (cat.charge <= 0)
    throw new ChemInputError('cation', `${cat.label} is not a cation`, 'a positive ion');
  if (an.charge >= 0)
    throw new ChemInputError('anion', `${an.label} is not an anion`, 'a negative ion');
  return { cat, an };
}

/** The salt's molar mass a density needs, from the ions' (refused when an ion's is unknown). */
function molarMassForDensity(cat: Ion, an: Ion, st: { cations: number; anions: number }): number {
  if (cat.molarMassGPerMol === undefined || an.molarMassGPerMol === undefined) {
    throw new ChemInputError(
      '--density',
      'the molar mass of this salt is not known',
      'ions with a known formula',
    );
  }
  return st.cations * cat.molarMassGPerMol + st.anions * an.molarMassGPerMol;
}

/** The result as a person reads it at a terminal. */
function latticeText(
  cat: Ion,
  an: Ion,
  st: { cations: number; anions: number },
  r: ReturnType<typeof estimateSaltThermo>,
): string {
  const salt = `${cat.formula ?? cat.label}${st.cations > 1 ? st.cations : ''}${an.formula ?? an.label}${st.anions > 1 ? st.anions : ''}`;
  return [
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
  ].join('\n');
}

/**
 * `saltsmith lattice --cation Na+ --anion Cl- [--method …] [--structure rock-salt] [--volume nm³]
 * [--density g/cm³] [--json]`: one salt's lattice, hydration and solution enthalpies, for a person at a
 * terminal. Ions by bundled id (`sodium`) or symbol (`Na+`, `SO4 2-`); stoichiometry from the charges.
 * In steps: the flags' rules, the ions, the engine (which checks the request once), the output.
 */
export const latticeCommand: CliCommand = defineCommand('lattice', {
  summary: SUMMARY,
  usage: USAGE,
  run: async (args, io) => {
    const flags = parseFlags(args, LATTICE_FLAGS);
    if (helpRequested(flags, io, USAGE)) return 0;
    const { method, ...names } = refuseFlagMisuse(flags);
    const { cat, an } = resolveIons(names.cation, names.anion);
    const st = stoichiometryFromCharges(cat.charge, an.charge);
    const r = estimateSaltThermo({
      cation: cat,
      anion: an,
      cationsPerFormula: st.cations,
      anionsPerFormula: st.anions,
      method,
      ...(flags.structure !== undefined ? { structureType: flags.structure } : {}),
      ...(flags.volume !== undefined ? { formulaUnitVolumeNm3: flags.volume } : {}),
      ...(flags.density !== undefined
        ? { densityGPerCm3: flags.density, molarMassGPerMol: molarMassForDensity(cat, an, st) }
        : {}),
    });
    const out = flags.json
      ? JSON.stringify({
          cation: cat.id,
          anion: an.id,
          cationsPerFormula: st.cations,
          anionsPerFormula: st.anions,
          ...r,
        })
      : latticeText(cat, an, st, r);
    writeLine(io.stdout, out);
    return 0;
  },
});
