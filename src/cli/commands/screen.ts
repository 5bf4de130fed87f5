import { readFile, writeFile } from 'node:fs/promises';
import Papa from 'papaparse';
import { z } from 'zod';
import {
  candidatesFromLibrary,
  ChemInputError,
  COUNTER_IONS,
  drugIon,
  getCounterIon,
  parseStructure,
  phMaxAcid,
  phMaxBase,
  phSolubilityProfile,
  rankCandidates,
  rankRobustness,
  screenCompound,
  parseScreeningSettings,
  SCREENING_CAUTIONS,
  counterIonProtolyte,
  type ScreenResult,
} from '@/chem';
import { parseFlags, writeLine, type CliCommand } from '../io';
import { describeError, registerEvalKind } from './eval';

/**
 * `saltsmith screen`: screen a compound against counter-ions and write the ranked table as CSV or
 * JSON (pH_max, dose numbers at pH 1.2 and 6.8, gastric dose number, flags, reasons, top-three
 * probability from the seeded Monte Carlo) with the cautions. Also registers the
 * `"kind":"ph-solubility"` request of `saltsmith eval`.
 */

const USAGE = `saltsmith screen (--smiles S | --formula F) --pka 7.8[,3.1] [--kind base|acid] [--charge 1]
                  (--s0 mg/mL | --mp °C --logp X) [--dose mg] [--ions chloride,mesylate] [--input compound.json]
                  [--format csv|json] [--out file] [--iterations 1000] [--seed 1]
                  [--gastric-chloride 0.12] [--micro-ph 7] [--temperature-c 37] [--pka-origin measured|literature|predicted]
                  [--keep-cocrystal-band]`;

const fileSchema = z
  .object({
    name: z.string().max(120).optional(),
    smiles: z.string().max(2000).optional(),
    formula: z.string().max(200).optional(),
    kind: z.enum(['base', 'acid']).optional(),
    pKas: z.array(z.union([z.number(), z.object({ value: z.number(), origin: z.enum(['measured', 'literature', 'predicted']) })])).min(1).max(4).optional(),
    ionCharge: z.number().int().optional(),
    intrinsicSolubilityMgPerMl: z.number().nullable().optional(),
    meltingPointC: z.number().nullable().optional(),
    logP: z.number().nullable().optional(),
    doseMg: z.number().nullable().optional(),
    ions: z.array(z.string()).optional(),
    settings: z.record(z.string(), z.unknown()).optional(),
  })
  .passthrough();

const num = (flag: string, v: string | true | undefined): number | undefined => {
  if (v === undefined) return undefined;
  const x = typeof v === 'string' ? Number(v) : NaN;
  if (!Number.isFinite(x)) throw new ChemInputError(`--${flag}`, `"${String(v)}" is not a number`, 'a finite number');
  return x;
};

const r3 = (x: number | null | undefined, digits = 3) => (x === null || x === undefined ? '' : Number(x.toPrecision(digits)));

/** The ranked table, one object per candidate (the CSV rows and the JSON rows). */
export function screenTable(res: ScreenResult, robust: Map<string, number>) {
  const ranked = rankCandidates(res.rows, res.settings.weights);
  return ranked.map((k) => {
    const row = res.rows.find((r) => r.id === k.id)!;
    const at = (pH: number) => row.doseNumbers.find((d) => Math.abs(d.pH - pH) < 1e-9);
    return {
      rank: k.rank ?? '',
      candidate: row.label,
      counter_ion: row.counterIonId,
      stoichiometry_drug_to_ion: `${row.drugPerSalt}:${row.counterIonPerSalt}`,
      score: k.score === null ? '' : Number(k.score.toFixed(3)),
      p_top3: robust.has(row.id) ? Number(robust.get(row.id)!.toFixed(3)) : '',
      delta_pka: r3(row.deltaPka),
      salt_formation: row.saltFormation?.band ?? '',
      active_fraction: r3(row.error ? null : row.activeFraction),
      salt_mass_per_dose_mg: r3(row.saltMassPerDoseMg, 4),
      log10_ksp: r3(row.log10Ksp?.value),
      log10_ksp_sd: r3(row.log10Ksp?.uncertainty, 2),
      ksp_origin: row.kspOrigin ?? '',
      ph_max: r3(row.phMax),
      solubility_ph_1_2_mg_per_ml: r3(at(1.2)?.solubilityMgPerMl),
      dose_number_ph_1_2: r3(at(1.2)?.doseNumber),
      dose_number_ph_6_8: r3(at(6.8)?.doseNumber),
      gastric_dose_number: r3(row.gastric?.doseNumber),
      worst_ph: row.worst?.pH ?? '',
      worst_dose_number: r3(row.worst?.doseNumber),
      ich_m9_class: row.solubilityClass ?? '',
      disproportionation: row.disproportionation?.risk ?? '',
      flags: row.flags.map((f) => f.text).join('; '),
      reasons: row.reasons.map((r) => r.text).join('; '),
      error: row.error ?? '',
    };
  });
}

/** Neutralise spreadsheet formula injection in text cells (OWASP CSV injection guidance). */
const safeCell = (v: unknown) => (typeof v === 'string' && /^[=+\-@\t\r]/.test(v) ? `'${v}` : v);

export const screenCommand: CliCommand = {
  summary: 'screen a compound against counter-ions; ranked table as CSV or JSON',
  usage: USAGE,
  run: async (args, io) => {
    const { flags } = parseFlags(args, ['help', 'keep-cocrystal-band']);
    if (flags.help) {
      writeLine(io.stdout, USAGE);
      return 0;
    }
    try {
      const file = typeof flags.input === 'string' ? fileSchema.parse(JSON.parse(await readFile(flags.input, 'utf8'))) : {};
      const str = (k: string) => (typeof flags[k] === 'string' ? (flags[k] as string) : undefined);
      const kind = (str('kind') ?? file.kind ?? 'base') as 'base' | 'acid';
      if (kind !== 'base' && kind !== 'acid') throw new ChemInputError('--kind', `"${String(kind)}"`, 'base or acid');
      const origin = (str('pka-origin') ?? 'measured') as 'measured' | 'literature' | 'predicted';
      if (!['measured', 'literature', 'predicted'].includes(origin)) throw new ChemInputError('--pka-origin', `"${origin}"`, 'measured, literature or predicted');
      const pKas = str('pka')
        ? str('pka')!.split(',').map((s, i) => ({ value: num(`pka[${i}]`, s.trim())!, origin }))
        : (file.pKas ?? []).map((p) => (typeof p === 'number' ? { value: p, origin } : p));
      if (pKas.length === 0) throw new ChemInputError('--pka', 'no pKa given', 'one to four pKa values, ascending, comma-separated');
      const smiles = str('smiles') ?? file.smiles ?? '';
      let formula = str('formula') ?? file.formula ?? '';
      let rings = { aromatic: 0, nonAromatic: 0 };
      let structure;
      if (smiles) {
        structure = await parseStructure(smiles);
        formula = structure.formula;
        rings = structure.rings;
      }
      if (!formula) throw new ChemInputError('--smiles', 'no structure given', 'a SMILES (--smiles) or a molecular formula (--formula)');
      const ionCharge = num('charge', flags.charge) ?? file.ionCharge ?? (kind === 'base' ? 1 : -1);
      const compound = {
        name: str('name') ?? file.name ?? 'compound',
        kind,
        pKas,
        ionCharge,
        intrinsicSolubilityMgPerMl: num('s0', flags.s0) ?? file.intrinsicSolubilityMgPerMl ?? null,
        meltingPointC: num('mp', flags.mp) ?? file.meltingPointC ?? null,
        logP: num('logp', flags.logp) ?? file.logP ?? null,
        doseMg: num('dose', flags.dose) ?? file.doseMg ?? null,
      };
      const di = drugIon({ kind, ionCharge, formula }, structure);
      const ionIds = str('ions') ? str('ions')!.split(',').map((s) => s.trim().toLowerCase()).filter(Boolean) : file.ions;
      const ions = ionIds
        ? ionIds.map((id) => {
            const ion = getCounterIon(id);
            if (!ion) throw new ChemInputError('--ions', `unknown counter-ion "${id}"`, 'library ids, e.g. chloride,mesylate (saltsmith ions lists them)');
            return ion;
          })
        : COUNTER_IONS;
      const settingsIn: Record<string, unknown> = { ...(file.settings ?? {}) };
      const gc = num('gastric-chloride', flags['gastric-chloride']);
      if (gc !== undefined) settingsIn.gastricChlorideM = gc;
      const mph = num('micro-ph', flags['micro-ph']);
      if (mph !== undefined) settingsIn.microenvironmentPh = mph;
      const tc = num('temperature-c', flags['temperature-c']);
      if (tc !== undefined) {
        if (tc < -273.15) throw new ChemInputError('--temperature-c', `${tc} °C is below absolute zero`, 'a temperature above −273.15 °C');
        settingsIn.temperatureK = tc + 273.15;
      }
      const settings = parseScreeningSettings(settingsIn);
      const skipped: { id: string; label: string; deltaPka: number }[] = [];
      const candidates = candidatesFromLibrary(
        ions,
        { kind, ionCharge, pKas: pKas.map((p) => p.value), thermo: { formula: di.formula, charge: di.charge, rings: di.ringsKnown ? di.rings : rings } },
        { skipped, keepCocrystalBand: flags['keep-cocrystal-band'] === true, bands: settings.deltaPkaBands },
      );
      const res = screenCompound({ compound, drugIon: di, candidates, settings });
      const iterations = num('iterations', flags.iterations) ?? 1000;
      const seed = num('seed', flags.seed) ?? 1;
      const robust = new Map(
        rankRobustness(res.rows.map((r) => r.robustness), settings.weights, res.robustnessShared, { iterations, seed }).map((r) => [r.id, r.pTop3]),
      );
      const table = screenTable(res, robust);
      const format = str('format') ?? 'csv';
      let text: string;
      if (format === 'json') {
        text = JSON.stringify(
          {
            format: 'saltsmith-screen',
            version: 1,
            compound: res.compoundName,
            drugKind: res.drugKind,
            intrinsicSolubility: { log10M: res.freeForm.log10IntrinsicM, origin: res.freeForm.intrinsicOrigin },
            freeForm: { worst: res.freeForm.worst, solubilityClass: res.freeForm.solubilityClass, flags: res.freeForm.flags },
            robustness: { iterations, seed },
            skippedCocrystalBand: skipped,
            units: { solubility: 'mg/mL free-form equivalents', doseNumber: 'dose / 250 mL / solubility', ksp: 'log10, (mol/L)^(m+n)' },
            assumptions: res.assumptions,
            rows: table,
            cautions: SCREENING_CAUTIONS,
          },
          null,
          2,
        );
      } else if (format === 'csv') {
        const csv = Papa.unparse(table.map((row) => Object.fromEntries(Object.entries(row).map(([k, v]) => [k, safeCell(v)]))), { newline: '\n' });
        const skippedLine = skipped.length
          ? `\n# Left out (ΔpKa in the cocrystal band, Cruz-Cabeza 2012; --keep-cocrystal-band keeps them): ${skipped.map((x) => `${x.label} ΔpKa ${x.deltaPka.toFixed(1)}`).join('; ')}`
          : '';
        text = `${csv}\n# ${SCREENING_CAUTIONS.join(' ')}\n# K_sp without a measured salt solubility is an estimate; see ksp_origin and log10_ksp_sd.${skippedLine}`;
      } else throw new ChemInputError('--format', `"${format}"`, 'csv or json');
      if (typeof flags.out === 'string') {
        await writeFile(flags.out, text + '\n', 'utf8');
        writeLine(io.stderr, `wrote ${table.length} candidates to ${flags.out}`);
      } else writeLine(io.stdout, text);
      return 0;
    } catch (err) {
      const e = describeError(err);
      writeLine(io.stderr, `saltsmith screen: ${e.message}${e.accepted ? ` (accepted: ${e.accepted})` : ''}`);
      return e.type === 'internal' ? 2 : 1;
    }
  },
};

/** `{"kind":"ph-solubility"}` requests for `saltsmith eval`. */
export const phSolubilityRequestSchema = z
  .object({
    kind: z.literal('ph-solubility'),
    id: z.union([z.string().max(200), z.number()]).optional(),
    drug: z
      .object({
        kind: z.enum(['base', 'acid']),
        pKas: z.array(z.number()).min(1).max(4),
        ionCharge: z.number().int().optional(),
        /** S₀ of the free form: log₁₀ mol/L, or mg/mL with molarMassGPerMol. */
        log10IntrinsicM: z.number().optional(),
        intrinsicSolubilityMgPerMl: z.number().optional(),
        molarMassGPerMol: z.number().positive().optional(),
      })
      .strict(),
    salt: z
      .object({
        /** A library counter-ion id, or the counter-ion's pKa values and charge. */
        counterIon: z.union([z.string(), z.object({ pKas: z.array(z.number()).max(4), kind: z.enum(['anion', 'cation']) }).strict()]),
        ionCharge: z.number().int().optional(),
        drugPerSalt: z.number().int().min(1).max(4).optional(),
        counterIonPerSalt: z.number().int().min(1).max(4).optional(),
        log10Ksp: z.number(),
      })
      .strict()
      .optional(),
    phFrom: z.number().optional(),
    phTo: z.number().optional(),
    phStep: z.number().optional(),
    commonIonM: z.number().optional(),
    activity: z.enum(['ideal', 'davies']).optional(),
    temperatureK: z.number().optional(),
    ionicStrengthM: z.number().optional(),
  })
  .strict();

registerEvalKind('ph-solubility', {
  schema: phSolubilityRequestSchema,
  run: async (raw) => {
    const r = phSolubilityRequestSchema.parse(raw);
    const ionCharge = r.drug.ionCharge ?? (r.drug.kind === 'base' ? 1 : -1);
    let logS0: number;
    if (r.drug.log10IntrinsicM !== undefined) logS0 = r.drug.log10IntrinsicM;
    else if (r.drug.intrinsicSolubilityMgPerMl !== undefined && r.drug.molarMassGPerMol !== undefined) {
      if (!(r.drug.intrinsicSolubilityMgPerMl > 0)) throw new ChemInputError('drug.intrinsicSolubilityMgPerMl', 'must be greater than zero', 'S₀ > 0 mg/mL');
      logS0 = Math.log10(r.drug.intrinsicSolubilityMgPerMl / r.drug.molarMassGPerMol);
    } else throw new ChemInputError('drug.log10IntrinsicM', 'no intrinsic solubility', 'log10IntrinsicM, or intrinsicSolubilityMgPerMl with molarMassGPerMol');
    const drug = { kind: r.drug.kind, pKas: r.drug.pKas, ionCharge };
    let salt = null;
    if (r.salt) {
      const ionSpec = r.salt.counterIon;
      const lib = typeof ionSpec === 'string' ? getCounterIon(ionSpec) : undefined;
      if (typeof ionSpec === 'string' && !lib) throw new ChemInputError('salt.counterIon', `unknown counter-ion "${ionSpec}"`, 'a library id, or {"pKas": [...], "kind": "anion"|"cation"}');
      const defaultCharge = lib ? lib.charge : ionSpec !== null && typeof ionSpec === 'object' && ionSpec.kind === 'cation' ? 1 : -1;
      const q = r.salt.ionCharge ?? defaultCharge;
      const st = lib?.stoichiometries.find((s) => s.ionCharge === q);
      const ion = lib ?? { id: 'custom', name: 'custom', kind: (ionSpec as { kind: 'anion' | 'cation' }).kind, charge: q, molarMassGPerMol: 1, pKas: (ionSpec as { pKas: number[] }).pKas.map((value) => ({ value })), acceptabilityClass: null };
      const g = (a: number, b: number): number => (b === 0 ? a : g(b, a % b));
      const gg = g(Math.abs(ionCharge), Math.abs(q));
      const m = r.salt.drugPerSalt ?? Math.abs(q) / gg;
      const n = r.salt.counterIonPerSalt ?? Math.abs(ionCharge) / gg;
      salt = {
        counterIon: counterIonProtolyte(ion, { drugPerSalt: m, counterIonPerSalt: n, ionCharge: q, pKaIndex: st?.pKaIndex ?? null }),
        counterIonCharge: q,
        drugPerSalt: m,
        counterIonPerSalt: n,
        log10Ksp: r.salt.log10Ksp,
      };
    }
    const activity =
      r.activity === 'davies' ? { model: 'davies' as const, backgroundIonicStrengthM: r.ionicStrengthM ?? 0, temperatureK: r.temperatureK ?? 298.15 } : { model: 'ideal' as const };
    const p = phSolubilityProfile(drug, logS0, salt, {
      ...(r.phFrom !== undefined ? { phFrom: r.phFrom } : {}),
      ...(r.phTo !== undefined ? { phTo: r.phTo } : {}),
      ...(r.phStep !== undefined ? { phStep: r.phStep } : {}),
      commonIonM: r.commonIonM ?? 0,
      activity,
    });
    const mw = r.drug.molarMassGPerMol;
    const simple1to1 = salt && salt.drugPerSalt === 1 && salt.counterIonPerSalt === 1 && r.drug.pKas.length === 1;
    const closed = simple1to1
      ? (r.drug.kind === 'base' ? phMaxBase : phMaxAcid)(r.drug.pKas[0]!, 10 ** logS0, 10 ** salt!.log10Ksp)
      : null;
    return {
      units: 'solubility mol/L of total drug (mg/mL free-form equivalents when molarMassGPerMol is given)',
      points: p.points.map((q) => ({
        pH: q.pH,
        solubilityM: q.solubilityM,
        ...(mw ? { solubilityMgPerMl: q.solubilityM * mw } : {}),
        freeFormLimitedM: q.freeFormLimitedM,
        saltLimitedM: q.saltLimitedM,
        solid: q.solid,
      })),
      phMax: p.phMax,
      ...(closed !== null ? { phMaxClosedForm1to1: closed } : {}),
      assumptions: p.assumptions,
      caution: SCREENING_CAUTIONS[0],
    };
  },
});
