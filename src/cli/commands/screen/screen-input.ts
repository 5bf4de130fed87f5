import { z } from 'zod';
import {
  candidatesFromLibrary,
  ChemInputError,
  compoundSchema,
  COUNTER_IONS,
  drugIon,
  getCounterIon,
  intrinsicSolubilityOriginSchema,
  parseFormula,
  pkaOriginSchema,
  checkScreeningSettings,
  resolveExcipients,
  parseStructure,
  sameElements,
  type CounterIon,
  type Estimate,
  type IntrinsicSolubilityOrigin,
  type PkaEntry,
} from '@/chem';
import { usageError } from '../../args/cli-error';
import {
  benchEntrySchema,
  buildCustomIons,
  customIonSpecSchema,
  withExtras,
  type BenchEntry,
  type CustomIonSpec,
} from './screen-extras';

/**
 * The input of one screen, whatever it came from (flags, an --input file, a row of a batch file): a
 * plain compound description, checked here so that every route refuses the same things the same way.
 */
export interface CompoundSpec {
  name: string;
  smiles: string;
  formula: string;
  kind: 'base' | 'acid';
  pKas: PkaEntry[];
  /** Charge of the drug ion; default +1 for a base, −1 for an acid. */
  ionCharge: number | null;
  intrinsicSolubilityMgPerMl: number | null;
  /** Where S₀ comes from; null or absent: not stated (screened with the predicted σ). */
  intrinsicSolubilityOrigin?: IntrinsicSolubilityOrigin | null;
  meltingPointC: number | null;
  logP: number | null;
  doseMg: number | null;
  /** Counter-ion library ids; null screens the whole library. */
  ions: string[] | null;
}

/** How a field is named to the user: a flag (`--s0`) or a batch column (`s0_mg_per_ml`). */
export type FieldNames = Partial<Record<keyof CompoundSpec | 'settings', string>>;

/** Flag names of the compound fields, for messages. */
export const FLAG_NAMES: FieldNames = {
  name: '--name',
  smiles: '--smiles',
  formula: '--formula',
  kind: '--kind',
  pKas: '--pka',
  ionCharge: '--charge',
  intrinsicSolubilityMgPerMl: '--s0',
  meltingPointC: '--mp',
  logP: '--logp',
  doseMg: '--dose',
  ions: '--ions',
};

const pka = z.number().min(-10).max(20);

/** The `--input compound.json` file: the compound's fields, an optional ion list and settings. */
export const compoundFileSchema = z
  .object({
    _comment: z.string().optional(),
    name: z.string().max(120).optional(),
    smiles: z.string().max(2000).optional(),
    formula: z.string().max(200).optional(),
    kind: z.enum(['base', 'acid']).optional(),
    pKas: z
      .array(z.union([pka, z.object({ value: pka, origin: pkaOriginSchema }).strict()]))
      .min(1)
      .max(4)
      .optional(),
    ionCharge: z.number().int().min(-3).max(3).optional(),
    intrinsicSolubilityMgPerMl: z.number().positive().max(1e4).nullable().optional(),
    intrinsicSolubilityOrigin: intrinsicSolubilityOriginSchema.nullable().optional(),
    meltingPointC: z.number().min(-100).max(600).nullable().optional(),
    logP: z.number().min(-10).max(15).nullable().optional(),
    doseMg: z.number().positive().max(1e5).nullable().optional(),
    ions: z.array(z.string().min(1).max(80)).min(1).max(200).optional(),
    settings: z.record(z.string(), z.unknown()).optional(),
    customIons: z.array(customIonSpecSchema).max(50).optional(),
    bench: z.record(z.string().max(80), benchEntrySchema).optional(),
    // fields of an exported compound record that a screen does not read
    logPOrigin: z.unknown().optional(),
    densityGPerCm3: z.unknown().optional(),
    cellVolumeA3: z.unknown().optional(),
    formulaUnitsPerCell: z.unknown().optional(),
    notes: z.unknown().optional(),
  })
  .strict();
export type CompoundFile = z.infer<typeof compoundFileSchema>;

const name = (names: FieldNames, f: keyof CompoundSpec | 'settings') => names[f] ?? f;

/**
 * Resolve counter-ion ids against the library: unknown ids, an id given twice and ions of the wrong
 * kind for the drug (a cation for a base) are refused, naming the field.
 */
export function resolveCounterIons(
  ids: readonly string[] | null,
  kind: 'base' | 'acid',
  field: string,
  inHouse: readonly CounterIon[] = [],
): readonly CounterIon[] {
  if (ids === null) return [...COUNTER_IONS, ...inHouse];
  const seen = new Set<string>();
  const want = kind === 'base' ? 'anion' : 'cation';
  return ids.map((raw) => {
    const id = raw.trim().toLowerCase();
    if (seen.has(id)) throw usageError(field, `"${id}" is given twice`, 'each counter-ion once');
    seen.add(id);
    const ion = getCounterIon(id) ?? inHouse.find((x) => x.id === id);
    if (!ion)
      throw new ChemInputError(
        field,
        `unknown counter-ion "${raw.slice(0, 80)}"`,
        'library ids, e.g. chloride,mesylate (saltsmith ions lists them), or ids of customIons',
      );
    if (ion.kind !== want) {
      throw new ChemInputError(
        field,
        `${ion.name} is a counter-${ion.kind}; a ${kind} forms salts with counter-${want}s`,
        `counter-${want}s (saltsmith ions --kind ${want})`,
      );
    }
    return ion;
  });
}

/** The drug ion's charge: the stated one, else +1 for a base and −1 for an acid; refused when it does not fit. */
function checkedIonCharge(spec: CompoundSpec, n: FieldNames): number {
  if (spec.pKas.length === 0)
    throw new ChemInputError(name(n, 'pKas'), 'no pKa given', 'one to four pKa values, ascending');
  const ionCharge = spec.ionCharge ?? (spec.kind === 'base' ? 1 : -1);
  if (ionCharge === 0 || (spec.kind === 'base') !== ionCharge > 0) {
    throw new ChemInputError(
      name(n, 'ionCharge'),
      `${ionCharge} does not fit a ${spec.kind} (a base forms a cation, an acid an anion)`,
      spec.kind === 'base' ? '1, 2 or 3' : '−1, −2 or −3',
    );
  }
  return ionCharge;
}

/** The structure (when a SMILES is given) and the free form's formula, checked against each other. */
async function structureAndFormula(spec: CompoundSpec, n: FieldNames) {
  let structure;
  let formula = spec.formula.trim();
  if (spec.smiles.trim() !== '') {
    structure = await parseStructure(spec.smiles, { field: name(n, 'smiles') });
    if (structure.netCharge !== 0) {
      throw new ChemInputError(
        name(n, 'smiles'),
        `the structure carries a net charge of ${structure.netCharge}`,
        'the neutral free form; the drug ion follows from --kind and --charge',
      );
    }
    if (
      formula !== '' &&
      !sameElements(parseFormula(formula, name(n, 'formula')).elements, structure.elements)
    ) {
      throw new ChemInputError(
        name(n, 'formula'),
        `${formula} disagrees with the structure's ${structure.formula}`,
        'the formula of the structure, or no formula',
      );
    }
    formula = structure.formula;
  }
  if (formula === '')
    throw new ChemInputError(
      name(n, 'smiles'),
      'no structure given',
      'a SMILES or a molecular formula of the neutral free form',
    );
  return { structure, formula };
}

/** The compound the core screens, checked with the project's compound schema. */
function checkedCompound(spec: CompoundSpec, ionCharge: number, formula: string, n: FieldNames) {
  const compound = {
    name: spec.name,
    kind: spec.kind,
    pKas: spec.pKas,
    ionCharge,
    intrinsicSolubilityMgPerMl: spec.intrinsicSolubilityMgPerMl,
    intrinsicSolubilityOrigin: spec.intrinsicSolubilityOrigin ?? null,
    meltingPointC: spec.meltingPointC,
    logP: spec.logP,
    doseMg: spec.doseMg,
  };
  // the record as the schema reads it, written out (no spread copy per compound)
  const checked = compoundSchema.safeParse({
    name: compound.name,
    kind: compound.kind,
    pKas: compound.pKas,
    ionCharge,
    intrinsicSolubilityMgPerMl: compound.intrinsicSolubilityMgPerMl,
    intrinsicSolubilityOrigin: compound.intrinsicSolubilityOrigin,
    meltingPointC: compound.meltingPointC,
    logP: compound.logP,
    doseMg: compound.doseMg,
    smiles: spec.smiles,
    formula,
    logPOrigin: null,
    densityGPerCm3: null,
    notes: '',
  });
  if (!checked.success) {
    const issue = checked.error.issues[0]!;
    const field = String(issue.path[0] ?? 'compound') as keyof CompoundSpec;
    throw new ChemInputError(name(n, field), issue.message, 'see saltsmith screen --help');
  }
  return compound;
}

/**
 * What a screen needs, checked: the compound, its drug ion, the candidates and the settings. With
 * `deferSolutionEnthalpy` the candidates' ΔH_sol is left to `solutionEnthalpyLater` (computed only for
 * the rows a `--top N` batch writes, when no ranked number depends on it: screenCompoundTop).
 */
export async function prepareScreen(
  spec: CompoundSpec,
  opts: {
    settings: Record<string, unknown>;
    keepCocrystalBand: boolean;
    names: FieldNames;
    customIons?: readonly CustomIonSpec[];
    bench?: Record<string, BenchEntry>;
    deferSolutionEnthalpy?: boolean;
  },
) {
  const n = opts.names;
  const ionCharge = checkedIonCharge(spec, n);
  const { structure, formula } = await structureAndFormula(spec, n);
  const compound = checkedCompound(spec, ionCharge, formula, n);
  const di = drugIon({ kind: spec.kind, ionCharge, formula }, structure);
  const custom = await buildCustomIons(opts.customIons ?? [], spec.kind);
  const ions = resolveCounterIons(spec.ions, spec.kind, name(n, 'ions'), custom.ions);
  // checked once at an edge: a batch passes the same checked settings for every compound
  const settings = checkScreeningSettings(opts.settings);
  resolveExcipients(settings.excipients, 'settings.excipients');
  const skipped: { id: string; label: string; deltaPka: number }[] = [];
  const solutionEnthalpyLater = opts.deferSolutionEnthalpy
    ? new Map<string, () => Estimate | null>()
    : undefined;
  const rings = structure ? structure.rings : { aromatic: 0, nonAromatic: 0 };
  const libraryCandidates = candidatesFromLibrary(
    ions,
    {
      kind: spec.kind,
      ionCharge,
      pKas: spec.pKas.map((p) => p.value),
      thermo: { formula: di.formula, charge: di.charge, rings: di.ringsKnown ? di.rings : rings },
    },
    {
      skipped,
      keepCocrystalBand: opts.keepCocrystalBand,
      bands: settings.deltaPkaBands,
      solutionEnthalpyLater,
    },
  );
  const candidates = withExtras(libraryCandidates, custom.descriptors, opts.bench ?? {});
  return {
    compound,
    drugIon: di,
    candidates,
    settings,
    skipped,
    freeFormFormula: formula,
    customIons: custom.ions,
    solutionEnthalpyLater,
  };
}

export type PreparedScreen = Awaited<ReturnType<typeof prepareScreen>>;
