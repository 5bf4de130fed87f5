import { createInterface } from 'node:readline';
import { z } from 'zod';
import {
  ChemInputError, estimateSaltThermo, findThermoIon, findThermoIonByFormula, getCounterIon, organicIonFromFormula, organicIonFromSmiles,
  stoichiometryFromCharges, type ThermoIon,
} from '@/chem';
import { writeLine, type CliCommand } from '../io';

/**
 * `saltsmith eval`: JSON Lines in, one JSON line out per request, in order.
 *
 * Every request has a `"kind"`; this file handles `"salt"` and keeps a registry so other areas can add
 * their own kinds (`registerEvalKind('ph-solubility', handler)` from their module, imported once by
 * src/cli/main.ts). A line that fails gets `{"line": n, "ok": false, "error": {...}}` and the run goes on;
 * the exit status is 1 if any line failed.
 */

/** What a kind's handler returns for one request (merged into the output line). */
export type EvalHandler = {
  /** zod schema of the request (with its `kind` literal). */
  schema: z.ZodType;
  run: (request: unknown) => Promise<Record<string, unknown>>;
};

const KINDS = new Map<string, EvalHandler>();

/** Add a request kind to `saltsmith eval`. Throws if the kind is taken. */
export function registerEvalKind(kind: string, handler: EvalHandler): void {
  if (KINDS.has(kind)) throw new Error(`eval kind "${kind}" is already registered`);
  KINDS.set(kind, handler);
}

/** The kinds `eval` understands, for help text and tests. */
export function evalKinds(): string[] {
  return [...KINDS.keys()];
}

const ringsSchema = z.object({ aromatic: z.number().int().min(0).max(50), nonAromatic: z.number().int().min(0).max(50) }).strict();
const chargeSchema = z.number().int().min(-4).max(4).refine((z_) => z_ !== 0, 'charge must not be zero');

/**
 * An ion: a bundled id or symbol, a library counter-ion id, a formula with charge (a bundled ion with the same
 * formula and charge is used when no ring counts are given), or a SMILES with charge.
 */
export const ionSpecSchema = z.union([
  z.string().min(1).max(80),
  z.object({ formula: z.string().min(1).max(200), charge: chargeSchema, rings: ringsSchema.optional(), label: z.string().max(80).optional() }).strict(),
  z.object({ smiles: z.string().min(1).max(500), charge: chargeSchema, label: z.string().max(80).optional() }).strict(),
]);

/** The `"kind": "salt"` request. */
export const saltRequestSchema = z
  .object({
    kind: z.literal('salt'),
    /** Echoed back, to match answers to questions. */
    id: z.union([z.string().max(200), z.number()]).optional(),
    cation: ionSpecSchema,
    anion: ionSpecSchema,
    cationsPerFormula: z.number().int().min(1).max(6).optional(),
    anionsPerFormula: z.number().int().min(1).max(6).optional(),
    method: z.enum(['auto', 'kapustinskii', 'born-mayer', 'born-lande', 'vbt']).optional(),
    structureType: z.string().max(40).optional(),
    formulaUnitVolumeNm3: z.number().positive().optional(),
    densityGPerCm3: z.number().positive().optional(),
    molarMassGPerMol: z.number().positive().optional(),
    temperatureK: z.number().optional(),
    packingCoefficient: z.number().optional(),
  })
  .strict()
  .refine((r) => !(r.formulaUnitVolumeNm3 !== undefined && r.densityGPerCm3 !== undefined), {
    message: 'give formulaUnitVolumeNm3 or densityGPerCm3, not both',
    path: ['densityGPerCm3'],
  });

type IonSpec = z.infer<typeof ionSpecSchema>;

/** Resolve an ion spec to a ThermoIon. `role` names the field in errors. */
export async function resolveIon(spec: IonSpec, role: 'cation' | 'anion', packingCoefficient?: number): Promise<ThermoIon> {
  const opts = packingCoefficient !== undefined ? { packingCoefficient } : {};
  if (typeof spec === 'string') {
    const bundled = findThermoIon(spec);
    if (bundled) return bundled;
    const lib = getCounterIon(spec.trim().toLowerCase());
    if (lib) {
      const viaThermo = lib.thermoId ? findThermoIon(lib.thermoId) : undefined;
      if (viaThermo) return viaThermo;
      return organicIonFromFormula(lib.formula, lib.charge, lib.rings, { ...opts, label: lib.name, id: lib.id });
    }
    throw new ChemInputError(role, `unknown ion "${spec}"`, 'a bundled ion id or symbol (sodium, Na+, SO4 2-), a counter-ion library id (mesylate), {"formula","charge"} or {"smiles","charge"}');
  }
  if ('formula' in spec) {
    const bundled = findThermoIonByFormula(spec.formula, spec.charge);
    if (bundled && !spec.rings) return bundled;
    return organicIonFromFormula(spec.formula, spec.charge, spec.rings ?? { aromatic: 0, nonAromatic: 0 }, { ...opts, ...(spec.label ? { label: spec.label } : {}) });
  }
  return organicIonFromSmiles(spec.smiles, spec.charge, { ...opts, ...(spec.label ? { label: spec.label } : {}) });
}

const CAUTION = 'Screening estimate: it does not establish a salt form. Experiments, the regulatory guidance in force and the lab’s safety rules decide.';

const ionSummary = (ion: ThermoIon) => ({
  label: ion.label,
  charge: ion.charge,
  ...(ion.id ? { id: ion.id } : {}),
  ...(ion.formula ? { formula: ion.formula } : {}),
  ...(ion.radiusA ? { radiusA: ion.radiusA } : {}),
  ...(ion.volumeNm3 ? { volumeNm3: ion.volumeNm3 } : {}),
  sizeEstimated: ion.estimatedSize === true,
  sources: ion.sources,
});

registerEvalKind('salt', {
  schema: saltRequestSchema,
  run: async (raw) => {
    const r = saltRequestSchema.parse(raw);
    const cation = await resolveIon(r.cation, 'cation', r.packingCoefficient);
    const anion = await resolveIon(r.anion, 'anion', r.packingCoefficient);
    if (cation.charge <= 0) throw new ChemInputError('cation.charge', `${cation.label} has charge ${cation.charge}`, 'a positive charge');
    if (anion.charge >= 0) throw new ChemInputError('anion.charge', `${anion.label} has charge ${anion.charge}`, 'a negative charge');
    const st = stoichiometryFromCharges(cation.charge, anion.charge);
    const p = r.cationsPerFormula ?? st.cations;
    const q = r.anionsPerFormula ?? st.anions;
    const res = estimateSaltThermo({
      cation, anion, cationsPerFormula: p, anionsPerFormula: q,
      ...(r.method ? { method: r.method } : {}),
      ...(r.structureType !== undefined ? { structureType: r.structureType } : {}),
      ...(r.formulaUnitVolumeNm3 !== undefined ? { formulaUnitVolumeNm3: r.formulaUnitVolumeNm3 } : {}),
      ...(r.densityGPerCm3 !== undefined ? { densityGPerCm3: r.densityGPerCm3 } : {}),
      ...(r.molarMassGPerMol !== undefined ? { molarMassGPerMol: r.molarMassGPerMol } : {}),
      ...(r.temperatureK !== undefined ? { temperatureK: r.temperatureK } : {}),
    });
    return {
      cation: ionSummary(cation),
      anion: ionSummary(anion),
      cationsPerFormula: p,
      anionsPerFormula: q,
      units: 'kJ/mol per formula unit; uncertainty is one standard uncertainty',
      ...res,
      caution: CAUTION,
    };
  },
});

/** Turn any thrown error into the JSON error object of one line. */
export function describeError(err: unknown): { field: string; message: string; accepted?: string; type: string } {
  if (err instanceof ChemInputError) return { type: 'input', field: err.field, message: err.message, accepted: err.accepted };
  if (err instanceof z.ZodError) {
    const first = err.issues[0];
    const field = first && first.path.length ? first.path.join('.') : 'request';
    return { type: 'schema', field, message: err.issues.map((i) => `${i.path.join('.') || 'request'}: ${i.message}`).join('; ') };
  }
  return { type: 'internal', field: 'request', message: err instanceof Error ? err.message : String(err) };
}

/** Evaluate one parsed JSON value as a request. */
export async function evaluateRequest(value: unknown): Promise<Record<string, unknown>> {
  if (!value || typeof value !== 'object' || Array.isArray(value)) {
    throw new ChemInputError('request', 'each line must be a JSON object', `an object with "kind": ${evalKinds().map((k) => `"${k}"`).join(' or ')}`);
  }
  const kind = (value as { kind?: unknown }).kind;
  const handler = typeof kind === 'string' ? KINDS.get(kind) : undefined;
  if (!handler) {
    throw new ChemInputError('kind', `unknown kind ${JSON.stringify(kind ?? null)}`, evalKinds().join(', '));
  }
  return { kind, ...(await handler.run(value)) };
}

export const evalCommand: CliCommand = {
  summary: 'answer JSON Lines requests from stdin (one JSON line out per line in)',
  usage: 'saltsmith eval < requests.jsonl   e.g. {"kind":"salt","cation":"Na+","anion":"Cl-"}',
  run: async (_args, io) => {
    const rl = createInterface({ input: io.stdin, crlfDelay: Infinity });
    let lineNo = 0;
    let failed = 0;
    for await (const line of rl) {
      lineNo++;
      if (line.trim() === '') continue;
      let value: unknown;
      let id: unknown;
      try {
        value = JSON.parse(line);
        id = value && typeof value === 'object' && !Array.isArray(value) ? (value as { id?: unknown }).id : undefined;
      } catch (err) {
        failed++;
        writeLine(io.stdout, JSON.stringify({ line: lineNo, ok: false, error: { type: 'json', field: 'line', message: `not valid JSON: ${err instanceof Error ? err.message : String(err)}` } }));
        continue;
      }
      try {
        const answer = await evaluateRequest(value);
        writeLine(io.stdout, JSON.stringify({ line: lineNo, ...(id !== undefined ? { id } : {}), ok: true, ...answer }));
      } catch (err) {
        failed++;
        writeLine(io.stdout, JSON.stringify({ line: lineNo, ...(id !== undefined ? { id } : {}), ok: false, error: describeError(err) }));
      }
    }
    return failed > 0 ? 1 : 0;
  },
};
