import type { Compound, PlatePlanInput } from '@/chem';

/**
 * The demo scenario. Everything here is INVENTED for demonstration: "Demorazine" is a fictional weakly
 * basic compound; its pKa, solubility, melting point, log P and dose are made-up numbers chosen to look
 * like a typical poorly soluble base. They are not data about any real substance and are never used as
 * expected values in tests. The same scenario is kept as fixtures/demo/demorazine.json.
 */
export const DEMO_PROJECT_NAME = 'Demorazine (fictional demo)';

export const DEMO_COMPOUND: Compound = {
  name: 'Demorazine (fictional)',
  smiles: 'CN1CCN(CC1)c1ccc(cc1)C(=O)Nc1ccc(Cl)cc1',
  formula: 'C18H20ClN3O',
  kind: 'base',
  pKas: [{ value: 7.8, origin: 'measured' }],
  ionCharge: 1,
  intrinsicSolubilityMgPerMl: 0.015,
  // The fictional story: the demo's pKa and S₀ were "measured" in its invented lab (the numbers are invented).
  intrinsicSolubilityOrigin: 'measured',
  meltingPointC: 184,
  logP: 3.3,
  logPOrigin: 'measured',
  doseMg: 100,
  densityGPerCm3: null,
  notes:
    'Fictional compound for the demo project. Every number here is invented; replace it with your own compound.',
};

/** Counter-ion ids shortlisted in the demo project (bundled library ids). */
export const DEMO_SHORTLIST = [
  'chloride',
  'mesylate',
  'sulfate',
  'maleate',
  'tosylate',
  'napsylate',
];

/**
 * The demo's example salt-screen plan (invented, like everything in the demo): four of its shortlisted
 * counter-ions in four solvents on a 24-well plate, hydrogen chloride from a 1 M stock in 2-propanol.
 */
export const DEMO_SCREEN_PLAN: PlatePlanInput = {
  counterIons: ['chloride', 'mesylate', 'sulfate', 'maleate'],
  solvents: ['ethanol', 'acetone', '2-propanol', 'ethyl-acetate'],
  methods: ['slurry'],
  apiMgPerWell: 10,
  solventUlPerWell: 200,
  plate: 24,
  stock: { chloride: { solvent: '2-propanol', molar: 1 } },
};
