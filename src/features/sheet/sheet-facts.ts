import { CELSIUS_ZERO_K, CRITERIA } from '@/chem';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import { CRITERION_TEXT } from '@/screening-data/criteria';
import type { ProjectRecord } from '@/persistence/records';
import type { SheetSetting } from './sheet.types';

/** The compound's own facts for the sheet's header: ionisation, pKa, drug ion, S₀, dose. */
export function compoundFacts(project: ProjectRecord, screening: ProjectScreening): SheetSetting[] {
  const c = project.compound;
  const facts: SheetSetting[] = [
    { label: 'Ionisable as', value: c.kind === 'base' ? 'weak base' : 'weak acid' },
    {
      label: c.kind === 'base' ? 'pKa (conjugate acid)' : 'pKa',
      value: c.pKas.map((p) => `${p.value} (${p.origin.replace('-', ' ')})`).join(', '),
    },
    {
      label: 'Drug ion',
      value: `${screening.drugIon.formula}, charge ${c.ionCharge > 0 ? '+' : '−'}${Math.abs(c.ionCharge)}`,
    },
    {
      label: 'Free form molar mass',
      value: screening.drugIon.freeFormMolarMassGPerMol,
      unit: 'g/mol',
    },
  ];
  if (c.smiles) facts.push({ label: 'SMILES', value: c.smiles });
  if (c.formula) facts.push({ label: 'Formula', value: c.formula });
  const s0 = screening.screen.freeForm;
  facts.push({
    label: 'Intrinsic solubility S₀',
    value:
      c.intrinsicSolubilityMgPerMl ??
      `log₁₀ S₀ = ${s0.log10IntrinsicM.value.toFixed(2)} ± ${s0.log10IntrinsicM.uncertainty.toFixed(2)} (mol/L, estimate)`,
    unit:
      c.intrinsicSolubilityMgPerMl !== null
        ? `mg/mL (${(c.intrinsicSolubilityOrigin ?? 'not-stated').replace('-', ' ')})`
        : undefined,
  });
  if (c.meltingPointC !== null)
    facts.push({ label: 'Melting point', value: c.meltingPointC, unit: '°C' });
  if (c.logP !== null)
    facts.push({ label: 'log P', value: c.logP, unit: c.logPOrigin ?? undefined });
  facts.push({
    label: 'Highest single dose',
    value: c.doseMg ?? 'not given',
    unit: c.doseMg !== null ? 'mg' : undefined,
  });
  return facts;
}
/** The screening settings the ranking was computed with, media included. */
export function settingsList(screening: ProjectScreening): SheetSetting[] {
  const s = screening.settings;
  const list: SheetSetting[] = [
    {
      label: 'Temperature',
      value: Number((s.temperatureK - CELSIUS_ZERO_K).toFixed(2)),
      unit: '°C',
    },
    { label: 'Gastric medium', value: `pH ${s.gastricPh}, chloride ${s.gastricChlorideM} mol/L` },
    {
      label: 'Microenvironment pH',
      value:
        s.excipients.length > 0
          ? 'from the chosen excipients (see Excipients’ microenvironment)'
          : s.microenvironmentPhStated
            ? s.microenvironmentPh
            : `not stated — assumed ${s.microenvironmentPh}`,
    },
    { label: 'ΔpKa: cocrystal below', value: s.deltaPkaBands.cocrystalBelow },
    { label: 'ΔpKa: salt above', value: s.deltaPkaBands.saltAbove },
    { label: 'ΔpKa: stable-salt minimum', value: s.deltaPkaBands.stableSaltMin },
    {
      label: 'Activities',
      value:
        s.activityModel === 'ideal'
          ? 'ideal (activity = concentration)'
          : `Davies, I = ${s.backgroundIonicStrengthM} mol/L`,
    },
    { label: 'pH grid', value: `${s.phGrid.from}–${s.phGrid.to} in steps of ${s.phGrid.step}` },
    { label: 'Estimated salt solubility anchor', value: `${s.saltAnchorLog10} decades above S₀` },
    {
      label: 'pKa σ (measured / literature / predicted)',
      value: `${s.pkaSigmaByOrigin.measured} / ${s.pkaSigmaByOrigin.literature} / ${s.pkaSigmaByOrigin.predicted}`,
    },
  ];
  for (const m of s.media) {
    const ions = Object.entries(m.ions)
      .map(([id, c]) => `${id} ${c} mol/L`)
      .join(', ');
    list.push({ label: `Medium: ${m.label}`, value: `pH ${m.pH}${ions ? `, ${ions}` : ''}` });
  }
  return list;
}
/** The ranking weights, one per criterion, in the order of `CRITERIA`. */
export function weightsList(screening: ProjectScreening): SheetSetting[] {
  const weights = screening.settings.weights;
  return CRITERIA.map((k) => ({ label: CRITERION_TEXT[k].label, value: weights[k] }));
}
