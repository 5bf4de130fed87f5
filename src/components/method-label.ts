/**
 * The words a screen shows for an estimate's method id. The core names each method by a short id
 * (kept as is in the command line's JSON and the CSV, where a script reads it); on screen a formulator
 * reads the method's usual name. An id not listed here is shown as it is.
 */
const METHOD_LABELS: Readonly<Record<string, string>> = {
  kapustinskii: 'Kapustinskii',
  'born-mayer': 'Born–Mayer',
  'born-lande': 'Born–Landé',
  vbt: 'volume-based thermodynamics',
  'born-fitted': 'Born, fitted offsets',
  'hess-law': 'Hess’s law (sum of the steps)',
  'hess-cycle': 'Hess’s law (sum of the steps)',
  'relative-hess': 'Hess’s law, relative to the median',
  'zhao-vdw/packing': 'Zhao van der Waals volume ÷ packing coefficient',
  'radius-from-volume': 'radius from the volume, r = (3V/4π)^⅓',
  'general-solubility-equation': 'General Solubility Equation',
  'derived-from-density': 'from the measured density',
  'solution-cycle': 'from the measured ΔH_sol and hydration',
  'measured-calorimetric': 'measured by calorimetry',
  'measured-salt-solubility': 'measured salt solubility',
  'van-t-hoff-fit': 'van ’t Hoff fit',
};

const CALIBRATED = ' (calibrated)';

/** The usual name of a method id, keeping a "(calibrated)" suffix. */
export function methodLabel(id: string): string {
  if (id.endsWith(CALIBRATED)) return methodLabel(id.slice(0, -CALIBRATED.length)) + CALIBRATED;
  return METHOD_LABELS[id] ?? id;
}
