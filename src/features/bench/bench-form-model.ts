import { z } from 'zod';
import { CELSIUS_ZERO_K } from '@/chem';
import type { MeasurementKind } from '@/persistence/records';
import type { NewMeasurement } from '@/persistence/measurements-repo';

/** The measurement form as typed. Temperatures are entered in °C and stored in K. */
export interface MeasurementDraft {
  kind: MeasurementKind;
  value: string;
  medium: string;
  ph: string;
  temperatureC: string;
  crystallinity: CrystallinityClass;
  /** Solubility: the solid found left at equilibrium; '' not stated. */
  solidForm: '' | SolidFormStated;
  text: string;
}

/** The solid left at equilibrium as the lab states it (stored in `MeasurementRecord.solidForm`). */
export type SolidFormStated = 'salt' | 'free-form' | 'unknown';

/** The choices of the "solid left" field, in order, with their words. */
export const SOLID_FORM_CHOICES: readonly { value: '' | SolidFormStated; label: string }[] = [
  { value: '', label: 'Not checked' },
  { value: 'salt', label: 'Salt' },
  { value: 'free-form', label: 'Free form' },
  { value: 'unknown', label: 'Checked, unclear' },
];

export type MeasurementErrors = Partial<Record<keyof MeasurementDraft, string>>;

export const CRYSTALLINITY_CLASSES = [
  'crystalline',
  'partly crystalline',
  'amorphous',
  'not determined',
] as const;
export type CrystallinityClass = (typeof CRYSTALLINITY_CLASSES)[number];

/** What each kind of measurement asks for, with its stored unit and accepted range. */
export const MEASUREMENT_KINDS: Record<
  MeasurementKind,
  {
    label: string;
    unit: string;
    valueLabel?: string;
    min?: number;
    max?: number;
    conditions: ('medium' | 'ph' | 'temperatureC' | 'solidForm')[];
  }
> = {
  solubility: {
    label: 'Solubility',
    unit: 'mg/mL',
    valueLabel: 'Solubility (as salt)',
    min: 0,
    max: 1000,
    conditions: ['medium', 'ph', 'temperatureC', 'solidForm'],
  },
  'melting-point': {
    label: 'Melting point',
    unit: '°C',
    valueLabel: 'Melting point (onset)',
    min: -50,
    max: 500,
    conditions: [],
  },
  // DSC peak area per mole of salt formula unit; with the melting point it gives the salt's ideal
  // (Schröder–van Laar) solubility, which sharpens the salt-solubility estimate.
  'fusion-enthalpy': {
    label: 'Enthalpy of fusion (DSC)',
    unit: 'kJ/mol',
    valueLabel: 'ΔH_fus per formula unit',
    min: 0.5,
    max: 300,
    conditions: [],
  },
  'solution-enthalpy': {
    label: 'Enthalpy of solution (calorimetry)',
    unit: 'kJ/mol',
    valueLabel: 'ΔH_sol',
    min: -300,
    max: 300,
    conditions: ['temperatureC'],
  },
  'mass-gain-80rh': {
    label: 'Mass gain at 80 % RH',
    unit: '%',
    valueLabel: 'Mass gain after 24 h',
    min: 0,
    max: 1000,
    conditions: ['temperatureC'],
  },
  crystallinity: { label: 'Crystallinity', unit: '', conditions: [] },
  note: { label: 'Note', unit: '', conditions: [] },
};

export const emptyDraft = (kind: MeasurementKind = 'solubility'): MeasurementDraft => ({
  kind,
  value: '',
  medium: kind === 'solubility' ? 'water' : '',
  ph: '',
  temperatureC:
    kind === 'mass-gain-80rh'
      ? '25'
      : kind === 'solubility'
        ? '37'
        : kind === 'solution-enthalpy'
          ? '25'
          : '',
  crystallinity: 'crystalline',
  solidForm: '',
  text: '',
});

/** A decimal typed by a person: a comma is a decimal mark, '' means not given. */
function parseDecimal(text: string): number | null | 'bad' {
  const t = text.trim().replace(',', '.').replace('−', '-');
  if (t === '') return null;
  const x = Number(t);
  return Number.isFinite(x) ? x : 'bad';
}

const finiteIn = (label: string, unit: string, min: number, max: number) =>
  z
    .number({ error: `${label} must be a number` })
    .min(min, `${label} must be at least ${min}${unit ? ' ' + unit : ''}`)
    .max(max, `${label} must be at most ${max}${unit ? ' ' + unit : ''}`);

/** 0 °C in kelvin: the core's constant (src/chem/units/temperature.ts), re-exported for the bench area. */
export { CELSIUS_ZERO_K };

/**
 * Validate a measurement draft into a record for `measurementsRepo.add`, or into field messages.
 * Nothing half-valid comes out.
 */
export function measurementFromDraft(
  draft: MeasurementDraft,
  ids: { projectId: string; candidateId: string },
): { ok: true; measurement: NewMeasurement } | { ok: false; errors: MeasurementErrors } {
  const spec = MEASUREMENT_KINDS[draft.kind];
  const errors: MeasurementErrors = {};
  const number = (
    key: 'value' | 'ph' | 'temperatureC',
    label: string,
    unit: string,
    min: number,
    max: number,
    required: boolean,
  ): number | null => {
    const x = parseDecimal(draft[key]);
    if (x === null) {
      if (required) errors[key] = `Give the ${label.toLowerCase()}`;
      return null;
    }
    const r = finiteIn(label, unit, min, max).safeParse(x === 'bad' ? Number.NaN : x);
    if (!r.success) {
      errors[key] =
        x === 'bad' ? `${label} must be a number` : (r.error.issues[0]?.message ?? 'Out of range');
      return null;
    }
    return r.data;
  };

  let value: number | null = null;
  if (spec.valueLabel) {
    value = number(
      'value',
      spec.valueLabel.replace(/ \(.*\)$/, ''),
      spec.unit,
      spec.min ?? -1e6,
      spec.max ?? 1e6,
      true,
    );
    if (draft.kind === 'solubility' && value === 0)
      errors.value = 'Solubility must be greater than zero';
  }
  const ph = spec.conditions.includes('ph')
    ? number('ph', 'pH', '', 0, 14, draft.kind === 'solubility')
    : null;
  const temperatureC = spec.conditions.includes('temperatureC')
    ? number('temperatureC', 'Temperature', '°C', 0, 100, draft.kind !== 'mass-gain-80rh')
    : null;
  const medium = draft.medium.trim();
  if (spec.conditions.includes('medium') && !medium)
    errors.medium = 'Name the medium (e.g. water, 0.1 M HCl, FaSSIF)';
  if (medium.length > 200) errors.medium = 'At most 200 characters';
  const notes = draft.text.trim();
  if (draft.kind === 'note' && !notes) errors.text = 'Write the note';
  if (notes.length > 4000) errors.text = 'At most 4000 characters';
  if (Object.keys(errors).length > 0) return { ok: false, errors };

  const text =
    draft.kind === 'crystallinity'
      ? notes
        ? `${draft.crystallinity} — ${notes}`
        : draft.crystallinity
      : notes;
  return {
    ok: true,
    measurement: {
      ...ids,
      kind: draft.kind,
      value,
      unit: spec.unit,
      ph,
      temperatureK: temperatureC === null ? null : temperatureC + CELSIUS_ZERO_K,
      medium: spec.conditions.includes('medium') ? medium : '',
      text,
      ...(spec.conditions.includes('solidForm') && draft.solidForm
        ? { solidForm: draft.solidForm }
        : {}),
    },
  };
}

/** The crystallinity class stored at the start of a crystallinity record's text. */
export function crystallinityOf(text: string): CrystallinityClass | null {
  return CRYSTALLINITY_CLASSES.find((c) => text === c || text.startsWith(`${c} — `)) ?? null;
}
