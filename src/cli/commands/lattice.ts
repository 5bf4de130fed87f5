import { kapustinskiiLatticeEnergyKJ, SKELETON_RADII_A, ChemInputError } from '@/chem';
import { parseFlags, writeLine, type CliCommand } from '../io';

/**
 * `saltsmith lattice --cation Na+ --anion Cl- [--json]`: one lattice enthalpy, for a person at a terminal.
 */
export const latticeCommand: CliCommand = {
  summary: 'lattice enthalpy of one salt (Kapustinskii)',
  usage: 'saltsmith lattice --cation Na+ --anion Cl- [--json]',
  run: async (args, io) => {
    const { flags } = parseFlags(args, ['json']);
    const known = SKELETON_RADII_A as Record<string, { charge: number; radiusA: number; source: string }>;
    const c = known[String(flags.cation)];
    const a = known[String(flags.anion)];
    if (!c || !a) {
      writeLine(io.stderr, `unknown ion: give --cation and --anion from ${Object.keys(known).join(', ')}`);
      return 2;
    }
    try {
      const e = kapustinskiiLatticeEnergyKJ({
        cationCharge: c.charge,
        anionCharge: a.charge,
        cationRadiusA: c.radiusA,
        anionRadiusA: a.radiusA,
      });
      if (flags.json) {
        writeLine(io.stdout, JSON.stringify({ latticeEnthalpyKJ: e, signConvention: 'dissociation, positive' }));
      } else {
        writeLine(
          io.stdout,
          `ΔH_L (dissociation, > 0) = ${e.value.toFixed(0)} ± ${e.uncertainty.toFixed(0)} kJ/mol  [${e.method}]`,
        );
      }
      return 0;
    } catch (err) {
      writeLine(io.stderr, err instanceof ChemInputError ? err.message : String(err));
      return 2;
    }
  },
};
