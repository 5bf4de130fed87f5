import { z } from 'zod';
import {
  buildCustomCounterIon,
  celsiusToKelvin,
  ChemInputError,
  counterIonFromParentSmiles,
  getCounterIon,
  readSmilesStrictly,
  type CounterIon,
  type CounterIonDescriptors,
  type MeasurementInput,
  type ScreeningCandidate,
} from '@/chem';

/**
 * What `screen --input F` adds for the salt's own solubility: counter-ions outside the library
 * (`customIons`, built from the parent's SMILES, their descriptors computed by openchemlib) and bench
 * data per counter-ion (`bench`: melting point, DSC enthalpy of fusion, measured solubility with its
 * equilibrium pH, temperature and the solid left), for that counter-ion's 1:1 salt or its only salt form.
 */
const ID = /^[a-z0-9]+(-[a-z0-9]+)*$/;
const pka = z.number().min(-10).max(20);

export const customIonSpecSchema = z
  .object({
    id: z.string().max(60).regex(ID, 'a kebab-case id, e.g. my-sulfonate'),
    name: z.string().trim().min(1).max(80).optional(),
    smiles: z.string().trim().min(1).max(2000),
    charge: z
      .number()
      .int()
      .min(-3)
      .max(3)
      .refine((c) => c !== 0, 'an ion cannot be neutral'),
    pKas: z.array(pka).max(4).default([]),
  })
  .strict();
export type CustomIonSpec = z.infer<typeof customIonSpecSchema>;

export const benchEntrySchema = z
  .object({
    meltingPointC: z.number().min(-50).max(500).optional(),
    fusionEnthalpyKJPerMol: z.number().min(0.5).max(300).optional(),
    solubilityMgPerMl: z.number().positive().max(1000).optional(),
    /** Equilibrium pH of the saturated solution the solubility was measured in. */
    solubilityPh: z.number().min(0).max(14).optional(),
    /** Temperature of the solubility measurement, °C (not given: taken as 25 °C, and said). */
    solubilityTemperatureC: z.number().min(0).max(100).optional(),
    /** The solid left at equilibrium, when the lab checked it. */
    solidForm: z.enum(['salt', 'free-form', 'unknown']).optional(),
  })
  .strict()
  .superRefine((b, ctx) => {
    if (Object.keys(b).length === 0)
      ctx.addIssue({
        code: 'custom',
        message: 'give at least one of meltingPointC, fusionEnthalpyKJPerMol, solubilityMgPerMl',
      });
    if (b.solubilityMgPerMl !== undefined) return;
    for (const key of ['solubilityPh', 'solubilityTemperatureC', 'solidForm'] as const) {
      if (b[key] !== undefined)
        ctx.addIssue({
          code: 'custom',
          path: [key],
          message: 'describes a solubility: give solubilityMgPerMl with it',
        });
    }
  });
export type BenchEntry = z.infer<typeof benchEntrySchema>;

/** In-house counter-ions from their SMILES, refused with the field named when they contradict themselves. */
export async function buildCustomIons(
  specs: readonly CustomIonSpec[],
  drugKind: 'base' | 'acid',
): Promise<{ ions: CounterIon[]; descriptors: Record<string, CounterIonDescriptors> }> {
  if (specs.length === 0) return { ions: [], descriptors: {} };
  const ocl = await import('openchemlib');
  const ions: CounterIon[] = [];
  const descriptors: Record<string, CounterIonDescriptors> = {};
  const want = drugKind === 'base' ? -1 : 1;
  specs.forEach((spec, i) => {
    const field = `customIons.${i}`;
    if (getCounterIon(spec.id)) {
      throw new ChemInputError(
        `${field}.id`,
        `"${spec.id}" is a bundled counter-ion; an in-house ion never takes a bundled id`,
        'an id of your own, e.g. my-sulfonate',
      );
    }
    if (ions.some((o) => o.id === spec.id))
      throw new ChemInputError(`${field}.id`, `"${spec.id}" is given twice`, 'each id once');
    if (Math.sign(spec.charge) !== want) {
      throw new ChemInputError(
        `${field}.charge`,
        `${spec.charge} does not suit a ${drugKind} (it forms salts with ${want < 0 ? 'anions' : 'cations'})`,
        want < 0 ? '−1, −2 or −3' : '1, 2 or 3',
      );
    }
    const sorted = [...spec.pKas].sort((a, b) => a - b);
    if (sorted.some((v, k) => v !== spec.pKas[k]))
      throw new ChemInputError(`${field}.pKas`, 'pKa values out of order', 'ascending pKa values');
    // The one structure check; a hydroxide may stand beside a quaternary cation ("C[N+](C)(C)C.[OH-]").
    readSmilesStrictly(ocl, spec.smiles, `${field}.smiles`, {
      allowComponents: (part) => part === '[OH-]',
    });
    let parent;
    try {
      parent = counterIonFromParentSmiles(ocl, spec.smiles, spec.charge);
    } catch (err) {
      throw new ChemInputError(
        `${field}.smiles`,
        err instanceof ChemInputError
          ? err.message.replace(/^smiles: /, '').replace(/ \(accepted:.*$/, '')
          : String(err),
        'the SMILES of the neutral parent acid or base, or of the ion with the same charge',
      );
    }
    try {
      ions.push(
        buildCustomCounterIon(
          {
            name: spec.name ?? spec.id,
            kind: want < 0 ? 'anion' : 'cation',
            formula: parent.ionFormula,
            charge: spec.charge,
            ionSmiles: '',
            pKas: sorted,
            pKaSource: 'given in the --input file',
            acceptabilityClass: null,
            aromaticRings: parent.rings.aromatic,
            nonAromaticRings: parent.rings.nonAromatic,
          },
          spec.id,
        ),
      );
    } catch (err) {
      if (err instanceof ChemInputError)
        throw new ChemInputError(
          `${field}.${err.field}`,
          err.message.replace(/^[^:]*: /, '').replace(/ \(accepted:.*$/, ''),
          err.accepted,
        );
      throw err;
    }
    descriptors[spec.id] = parent.descriptors;
  });
  return { ions, descriptors };
}

/**
 * Attach descriptors of in-house ions and the bench data to the candidates. A bench entry names a
 * screened counter-ion and goes to its 1:1 salt, or to its only salt form.
 */
export function withExtras(
  candidates: readonly ScreeningCandidate[],
  descriptors: Record<string, CounterIonDescriptors>,
  bench: Record<string, BenchEntry>,
): ScreeningCandidate[] {
  const out = candidates.map((c) =>
    descriptors[c.counterIon.id]
      ? { ...c, counterIonDescriptors: descriptors[c.counterIon.id]! }
      : c,
  );
  for (const [ionId, entry] of Object.entries(bench)) {
    const forms = out.filter((c) => c.counterIon.id === ionId);
    if (forms.length === 0)
      throw new ChemInputError(
        `bench.${ionId}`,
        `"${ionId}" is not among the screened counter-ions`,
        'the id of a screened counter-ion (see "ions")',
      );
    const target =
      forms.find(
        (c) => c.stoichiometry.drugPerSalt === 1 && c.stoichiometry.counterIonPerSalt === 1,
      ) ?? (forms.length === 1 ? forms[0] : undefined);
    if (!target)
      throw new ChemInputError(
        `bench.${ionId}`,
        `${ionId} is screened in ${forms.length} salt forms and none is 1:1`,
        'a counter-ion with a 1:1 salt or a single salt form',
      );
    const ms: MeasurementInput[] = [];
    const base = { ph: null, temperatureK: null, medium: 'water', text: 'from the --input file' };
    if (entry.meltingPointC !== undefined)
      ms.push({ ...base, kind: 'melting-point', value: entry.meltingPointC, unit: '°C' });
    if (entry.fusionEnthalpyKJPerMol !== undefined)
      ms.push({
        ...base,
        kind: 'fusion-enthalpy',
        value: entry.fusionEnthalpyKJPerMol,
        unit: 'kJ/mol',
      });
    if (entry.solubilityMgPerMl !== undefined)
      ms.push({
        ...base,
        kind: 'solubility',
        value: entry.solubilityMgPerMl,
        unit: 'mg/mL',
        ph: entry.solubilityPh ?? null,
        temperatureK:
          entry.solubilityTemperatureC === undefined
            ? null
            : celsiusToKelvin(entry.solubilityTemperatureC),
        solidForm: entry.solidForm ?? null,
      });
    const k = out.indexOf(target);
    out[k] = { ...target, measurements: [...(target.measurements ?? []), ...ms] };
  }
  return out;
}
