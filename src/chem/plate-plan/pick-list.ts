import type { PlatePlan } from './build-plate-plan';

/**
 * The pick list of a plan: one row per well with the amounts a chemist weighs and pipettes, in the
 * field names of `saltsmith plan` (units in the names). Numbers are rounded to 4 significant digits,
 * enough for a balance reading to 0.01 mg and a pipette to 0.1 µL at the amounts of a screen.
 */
export interface PickListRow {
  well: string;
  counter_ion: string;
  solvent: string;
  method: string;
  api_mg: number;
  api_mmol: number;
  counter_ion_equivalents: number;
  counter_ion_parent: string;
  counter_ion_mmol: number;
  counter_ion_mg: number;
  /** µL of the neat liquid or the stock solution; null for a solid weighed in. */
  counter_ion_ul: number | null;
  /** 'solid' weighed in, 'liquid' by volume from its density, 'stock' from a stock solution. */
  counter_ion_dosing: string;
  stock_solvent: string | null;
  stock_molar: number | null;
  solvent_ul: number;
  solvent_ich_q3c_class: number | null;
  warnings: string;
}

/** A number to 4 significant digits. */
export const fourFigures = (x: number): number => Number(x.toPrecision(4));

export function pickListRows(plan: PlatePlan): PickListRow[] {
  return plan.wells.map((w) => ({
    well: w.well,
    counter_ion: w.counterIonId,
    solvent: w.solventId,
    method: w.method,
    api_mg: fourFigures(w.apiMg),
    api_mmol: fourFigures(w.apiMmol),
    counter_ion_equivalents: w.equivalents,
    counter_ion_parent: w.parentName,
    counter_ion_mmol: fourFigures(w.counterIon.mmol),
    counter_ion_mg: fourFigures(w.counterIon.mg),
    counter_ion_ul: w.counterIon.ul === null ? null : fourFigures(w.counterIon.ul),
    counter_ion_dosing: w.counterIon.dosing,
    stock_solvent: w.stock?.solventId ?? null,
    stock_molar: w.stock?.molar ?? null,
    solvent_ul: fourFigures(w.solventUl),
    solvent_ich_q3c_class: w.ichQ3cClass,
    warnings: w.warnings.join(' '),
  }));
}
