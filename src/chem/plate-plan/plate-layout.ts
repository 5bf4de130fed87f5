import { ChemInputError } from '../result';

/**
 * Well plates of a salt screen and their well names. The layouts are the usual ones of the
 * ANSI/SLAS 1-2004 (formerly SBS) footprint: 24 wells in 4 rows × 6 columns, 48 in 6 × 8, 96 in 8 × 12
 * (from memory); rows are lettered from A, columns numbered from 1, so a well is "A1" … "H12".
 */
export const PLATE_LAYOUTS = {
  24: { rows: 4, columns: 6 },
  48: { rows: 6, columns: 8 },
  96: { rows: 8, columns: 12 },
} as const;

export type PlateSize = keyof typeof PLATE_LAYOUTS;
export const PLATE_SIZES: readonly PlateSize[] = [24, 48, 96];

const ROW_LETTERS = 'ABCDEFGH';

/** The wells of a plate in filling order: row by row, A1, A2, … A6, B1, … (24-well plate). */
export function wellNames(plate: PlateSize): string[] {
  const { rows, columns } = PLATE_LAYOUTS[plate];
  const names: string[] = [];
  for (let r = 0; r < rows; r++) {
    for (let c = 1; c <= columns; c++) names.push(`${ROW_LETTERS[r]}${c}`);
  }
  return names;
}

/** Row index (0 = A) and column index (0 = column 1) of a well name on a plate; refuses names off the plate. */
export function wellPosition(
  plate: PlateSize,
  well: string,
  field = 'well',
): { row: number; column: number } {
  const m = /^([A-H])(\d{1,2})$/.exec(well);
  const { rows, columns } = PLATE_LAYOUTS[plate];
  const row = m ? ROW_LETTERS.indexOf(m[1]!) : -1;
  const column = m ? Number(m[2]) - 1 : -1;
  if (row < 0 || row >= rows || column < 0 || column >= columns) {
    throw new ChemInputError(
      field,
      `"${well.slice(0, 10)}" is not a well of a ${plate}-well plate`,
      `A1 … ${ROW_LETTERS[rows - 1]}${columns}`,
    );
  }
  return { row, column };
}
