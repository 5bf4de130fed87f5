import type { CounterIon } from '../library/counter-ion.types';
import { ChemInputError } from '../result';
import { parentHandling } from './counter-ion-handling.data';
import { PLATE_LAYOUTS, wellNames, type PlateSize } from './plate-layout';
import type { CrystallisationMethod, PlatePlanInput } from './plate-plan.schema';
import { getSolvent, type IchQ3cClass, type Solvent } from './solvents.data';
import {
  counterIonDose,
  drugMmol,
  poorSolubilityWarning,
  type CounterIonDose,
} from './well-amounts';

/** One planned well: what goes in, how much, and what to watch. */
export interface PlannedWell {
  well: string;
  counterIonId: string;
  counterIonName: string;
  parentName: string;
  solventId: string;
  solventName: string;
  method: CrystallisationMethod;
  apiMg: number;
  apiMmol: number;
  equivalents: number;
  counterIon: CounterIonDose;
  stock: { solventId: string; molar: number } | null;
  solventUl: number;
  ichQ3cClass: IchQ3cClass | null;
  warnings: string[];
}

export interface PlatePlan {
  plate: PlateSize;
  wells: PlannedWell[];
  /** Wells of the plate left empty, in filling order. */
  emptyWells: string[];
  /** Notes on the plan as a whole: Class 2 solvents with their PDE, a Class 1 solvent let through. */
  notes: string[];
}

/** The order wells are filled in, in words (shown with every plan). */
export const PLATE_FILL_ORDER =
  'Wells are filled row by row (A1, A2, … then B1, …): counter-ions in the order given, each with every solvent, each solvent with every equivalents level, each level with every method.';

/** 1.05 equivalents for a 1:1 salt: a small excess of the acid or base is common practice. */
export const ONE_TO_ONE_EXCESS = 1.05;

/**
 * Default equivalents of a counter-ion's parent per mole of drug: counter-ions per drug ion of the
 * salt (a 2:1 hemisulfate takes 0.5 eq of sulfuric acid), with a 5 % excess for a 1:1 salt (common
 * practice). The salt is the given stoichiometry, else the library's first one that balances the
 * drug ion's charge.
 */
export function defaultEquivalents(
  ion: CounterIon,
  drugCharge: number,
  stoichiometry?: { drugPerSalt: number; counterIonPerSalt: number },
): number {
  const s = stoichiometry ??
    ion.stoichiometries.find(
      (x) => x.drugPerSalt * Math.abs(drugCharge) === x.counterIonPerSalt * Math.abs(x.ionCharge),
    ) ?? { drugPerSalt: 1, counterIonPerSalt: 1 };
  const ratio = s.counterIonPerSalt / s.drugPerSalt;
  return ratio === 1 ? ONE_TO_ONE_EXCESS : ratio;
}

export interface PlanContext {
  /** Molar mass of the drug's free form, g/mol. */
  freeFormMolarMassGPerMol: number;
  /** Charge of the drug ion (+1 for a monobasic drug). */
  drugCharge: number;
  /** A counter-ion by id (the bundled library, in-house ions). */
  lookupIon: (id: string) => CounterIon | undefined;
  /** The stoichiometry chosen for a counter-ion (e.g. the shortlist's), if any. */
  stoichiometry?: (ionId: string) => { drugPerSalt: number; counterIonPerSalt: number } | undefined;
  /** How the plan's fields are named in messages (default "plan"). */
  prefix?: string;
}

function resolveSolvent(id: string, field: string, allowClass1: boolean): Solvent {
  const s = getSolvent(id);
  if (!s)
    throw new ChemInputError(
      field,
      `unknown solvent "${id}"`,
      'a solvent id of saltsmith plan --solvents',
    );
  if (s.ichQ3cClass === 1 && !allowClass1) {
    throw new ChemInputError(
      field,
      `${s.name} is an ICH Q3C Class 1 solvent (limit ${s.ichConcentrationLimitPpm} ppm): Class 1 solvents should not be used in making drug substances (ICH Q3C(R8))`,
      'a Class 2 or 3 solvent, or "allowClass1": true if you must',
    );
  }
  return s;
}

function uniqueIds(ids: readonly string[], field: string): string[] {
  const seen = new Set<string>();
  return ids.map((raw, i) => {
    const id = raw.trim().toLowerCase();
    if (seen.has(id))
      throw new ChemInputError(`${field}.${i}`, `"${id}" is given twice`, 'each id once');
    seen.add(id);
    return id;
  });
}

function resolveIons(plan: PlatePlanInput, ctx: PlanContext, p: string): CounterIon[] {
  const want = ctx.drugCharge > 0 ? 'anion' : 'cation';
  return uniqueIds(plan.counterIons, `${p}.counterIons`).map((id, i) => {
    const ion = ctx.lookupIon(id);
    const field = `${p}.counterIons.${i}`;
    if (!ion)
      throw new ChemInputError(
        field,
        `unknown counter-ion "${id}"`,
        'library ids (saltsmith ions) or in-house ion ids',
      );
    if (ion.kind !== want) {
      throw new ChemInputError(
        field,
        `${ion.name} is a counter-${ion.kind}; this drug needs counter-${want}s`,
        `counter-${want}s`,
      );
    }
    const stock = plan.stock?.[id];
    if (!stock && parentHandling(id)?.form === 'stock-only') {
      throw new ChemInputError(
        `${p}.stock.${id}`,
        `${parentHandling(id)!.note}; no stock solution is given`,
        '{"solvent": "<id>", "molar": <mol/L>}',
      );
    }
    return ion;
  });
}

function equivalentLevels(plan: PlatePlanInput, ion: CounterIon, ctx: PlanContext): number[] {
  const e = plan.equivalents;
  const given = typeof e === 'number' || Array.isArray(e) ? e : e?.[ion.id];
  if (given === undefined)
    return [defaultEquivalents(ion, ctx.drugCharge, ctx.stoichiometry?.(ion.id))];
  return typeof given === 'number' ? [given] : given;
}

function checkStocks(
  plan: PlatePlanInput,
  ionIds: readonly string[],
  p: string,
  allowClass1: boolean,
) {
  for (const [ionId, stock] of Object.entries(plan.stock ?? {})) {
    if (!ionIds.includes(ionId)) {
      throw new ChemInputError(
        `${p}.stock.${ionId}`,
        `"${ionId}" is not one of the plan's counter-ions`,
        ionIds.join(', '),
      );
    }
    resolveSolvent(stock.solvent, `${p}.stock.${ionId}.solvent`, allowClass1);
  }
  if (typeof plan.equivalents === 'object' && !Array.isArray(plan.equivalents)) {
    for (const ionId of Object.keys(plan.equivalents)) {
      if (!ionIds.includes(ionId)) {
        throw new ChemInputError(
          `${p}.equivalents.${ionId}`,
          `"${ionId}" is not one of the plan's counter-ions`,
          ionIds.join(', '),
        );
      }
    }
  }
}

function planNotes(solvents: readonly Solvent[]): string[] {
  return solvents.flatMap((s) => {
    if (s.ichQ3cClass === 2)
      return [
        `${s.name}: ICH Q3C Class 2 — PDE ${s.ichPdeMgPerDay} mg/day, limit ${s.ichConcentrationLimitPpm} ppm (${s.sources.ich}).`,
      ];
    if (s.ichQ3cClass === 1)
      return [
        `${s.name}: ICH Q3C Class 1 (limit ${s.ichConcentrationLimitPpm} ppm), used at the user's insistence — Class 1 solvents should not be used in making drug substances (${s.sources.ich}).`,
      ];
    return [];
  });
}

/**
 * Lay a plan out on its plate and compute every well's amounts. Refuses (ChemInputError naming the
 * field) an unknown counter-ion or solvent, an ion of the wrong kind, a Class 1 solvent unless allowed,
 * a gas or solution-only parent without a stock, and a plan with more wells than the plate holds.
 */
export function buildPlatePlan(plan: PlatePlanInput, ctx: PlanContext): PlatePlan {
  const p = ctx.prefix ?? 'plan';
  const allow = plan.allowClass1 === true;
  const solvents = uniqueIds(plan.solvents, `${p}.solvents`).map((id, i) =>
    resolveSolvent(id, `${p}.solvents.${i}`, allow),
  );
  const ions = resolveIons(plan, ctx, p);
  checkStocks(
    plan,
    ions.map((i) => i.id),
    p,
    allow,
  );
  const methods: CrystallisationMethod[] = plan.methods ?? ['slurry'];
  const levels = new Map(ions.map((ion) => [ion.id, equivalentLevels(plan, ion, ctx)]));
  const needed = ions.reduce(
    (n, ion) => n + solvents.length * levels.get(ion.id)!.length * methods.length,
    0,
  );
  if (needed > plan.plate) {
    const bigger = ([24, 48, 96] as const).find((n) => n >= needed);
    throw new ChemInputError(
      `${p}.plate`,
      `the plan needs ${needed} wells (counter-ions × solvents × equivalents × methods); a ${plan.plate}-well plate (${PLATE_LAYOUTS[plan.plate].rows} × ${PLATE_LAYOUTS[plan.plate].columns}) holds ${plan.plate}`,
      bigger
        ? `plate ${bigger}, or fewer counter-ions, solvents, equivalents or methods`
        : 'at most 96 wells: fewer counter-ions, solvents, equivalents or methods',
    );
  }
  const names = wellNames(plan.plate);
  const apiMmol = drugMmol(plan.apiMgPerWell, ctx.freeFormMolarMassGPerMol);
  const wells: PlannedWell[] = [];
  for (const ion of ions) {
    const stock = plan.stock?.[ion.id];
    for (const solvent of solvents) {
      for (const eq of levels.get(ion.id)!) {
        for (const method of methods) {
          const dose = counterIonDose(ion, apiMmol, eq, stock);
          const warning = stock
            ? null
            : poorSolubilityWarning(
                ion.id,
                ion.parent.name,
                solvent.id,
                dose.mg,
                plan.solventUlPerWell,
              );
          wells.push({
            well: names[wells.length]!,
            counterIonId: ion.id,
            counterIonName: ion.name,
            parentName: ion.parent.name,
            solventId: solvent.id,
            solventName: solvent.name,
            method,
            apiMg: plan.apiMgPerWell,
            apiMmol,
            equivalents: eq,
            counterIon: dose,
            stock: stock ? { solventId: stock.solvent, molar: stock.molar } : null,
            solventUl: plan.solventUlPerWell,
            ichQ3cClass: solvent.ichQ3cClass,
            warnings: warning ? [warning] : [],
          });
        }
      }
    }
  }
  return {
    plate: plan.plate,
    wells,
    emptyWells: names.slice(wells.length),
    notes: planNotes(solvents),
  };
}
