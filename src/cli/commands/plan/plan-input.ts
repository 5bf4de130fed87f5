import { z } from 'zod';
import {
  buildPlatePlan,
  ChemInputError,
  formulaMolarMassGPerMol,
  getCounterIon,
  platePlanSchema,
  type PlatePlan,
} from '@/chem';
import { readJsonFile } from '../../input/read-json-file';
import { specFromFlags } from '../screen/screen-command';
import { compoundFileSchema, FLAG_NAMES, prepareScreen } from '../screen/screen-input';

/**
 * The `--input plan.json` of `saltsmith plan`: the compound exactly as `saltsmith screen --input`
 * reads it (same schema, same checks), and the plan.
 */
export const planFileSchema = z
  .object({
    _comment: z.string().optional(),
    compound: compoundFileSchema,
    plan: platePlanSchema,
  })
  .strict();
export type PlanFile = z.infer<typeof planFileSchema>;

/**
 * Read and validate a plan file through the CLI's one JSON file reader (size-capped before it is
 * read, strict JSON); a bad field is refused with its path (`--input plan.plate`).
 */
export async function readPlanFile(path: string): Promise<PlanFile> {
  const json = await readJsonFile(path, { flag: '--input' });
  const r = planFileSchema.safeParse(json);
  if (!r.success) {
    const i = r.error.issues[0]!;
    throw new ChemInputError(
      `--input ${i.path.join('.') || '(file)'}`,
      i.message,
      'the fields of saltsmith plan --help',
    );
  }
  return r.data;
}

/** Check the compound as `screen` does, then lay the plan out on its plate. */
export async function planFromFile(file: PlanFile): Promise<{ name: string; plan: PlatePlan }> {
  const prepared = await prepareScreen(specFromFlags({}, file.compound), {
    settings: file.compound.settings ?? {},
    keepCocrystalBand: true,
    names: Object.fromEntries(Object.entries(FLAG_NAMES).map(([k]) => [k, `compound.${k}`])),
    customIons: file.compound.customIons ?? [],
    bench: {},
  });
  const inHouse = new Map(prepared.customIons.map((ion) => [ion.id, ion]));
  const plan = buildPlatePlan(file.plan, {
    freeFormMolarMassGPerMol: formulaMolarMassGPerMol(prepared.freeFormFormula),
    drugCharge: prepared.compound.ionCharge,
    lookupIon: (id) => getCounterIon(id) ?? inHouse.get(id),
  });
  return { name: prepared.compound.name, plan };
}
