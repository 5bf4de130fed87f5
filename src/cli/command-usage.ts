/**
 * What each command is for and how it is called, as plain text: read by the help (main.ts) without
 * loading the commands, and by each command for its own --help and usage errors.
 */
export const COMMAND_USAGE = {
  lattice: {
    summary: 'lattice, hydration and solution enthalpies of one salt',
    usage:
      'saltsmith lattice --cation Na+ --anion Cl- [--method auto|kapustinskii|born-mayer|born-lande|vbt] [--structure rock-salt] [--volume nm3 | --density g/cm3] [--json]',
  },
  ions: {
    summary: 'the counter-ion library: name, formula, charge, pKa values, class',
    usage: 'saltsmith ions [--search <text>] [--kind anion|cation] [--json]',
  },
  eval: {
    summary: 'answer JSON Lines requests from stdin (one JSON line out per line in)',
    usage: 'saltsmith eval < requests.jsonl   e.g. {"kind":"salt","cation":"Na+","anion":"Cl-"}',
  },
  screen: {
    summary:
      'screen a compound (or a list, --batch) against counter-ions; ranked table as CSV or JSON',
    usage: `saltsmith screen (--smiles S | --formula F) --pka 7.8[,3.1] [--kind base|acid] [--charge 1]
                  (--s0 mg/mL | --mp °C --logp X) [--dose mg] [--ions chloride,mesylate] [--input compound.json]
                  [--format csv|json] [--out file] [--top N] [--iterations 1000] [--seed 1]
                  [--gastric-chloride 0.12] [--micro-ph 7] [--temperature-c 37] [--pka-origin measured|literature|predicted|not-stated]
                  [--s0-origin measured|literature|predicted|not-stated]
                  [--keep-cocrystal-band] [--excipients magnesium-stearate,mannitol]
       saltsmith screen --batch compounds.csv|compounds.jsonl [--format csv|jsonl] [--top N] [--jobs N]
                  [--errors file] [--out file] [--ions …] [--iterations N] [settings flags as above]
  --batch runs the P(top 3) Monte Carlo only when --iterations is given (the column is empty otherwise).
  --format json adds "measure_next": [{"counter_ion","measurement","value"}], the bench measurement that
  would most reduce the doubt about first place first (same Monte Carlo: --iterations draws, --seed).
  compound.json may also hold "customIons": [{"id","smiles","charge","pKas"}] (counter-ions outside the
  library, named in "ions" by id) and "bench": {"<ion id>": {"meltingPointC", "fusionEnthalpyKJPerMol",
  "solubilityMgPerMl", "solubilityPh", "solubilityTemperatureC", "solidForm"}} (that ion's 1:1 salt, or
  its only salt form; solidForm salt|free-form|unknown). An S₀ whose origin is not given is screened as
  "not stated" (the predicted σ), never as measured.
  --excipients (or "settings": {"excipients": [...]}) judges each salt against the formulation's
  excipients by their bundled ids (an unknown id is refused with the accepted ones); the last columns
  name the excipient most likely to convert each salt and P(conversion).`,
  },
  plan: {
    summary:
      'a salt-screen plate plan: per-well amounts of drug, counter-ion and solvent (pick list)',
    usage: `saltsmith plan --input plan.json [--format csv|json] [--out file]
       saltsmith plan --solvents [--format csv|json]
  plan.json = {"compound": <the screen --input object>, "plan": {"counterIons": ["mesylate", …],
    "solvents": ["ethanol", …], "equivalents": 1.05 | [0.5, 1.0] | {"<ion id>": n}, "methods": ["slurry",
    "cooling", "evaporation", "anti-solvent"], "apiMgPerWell": 10, "solventUlPerWell": 200, "plate": 24|48|96,
    "stock": {"<ion id>": {"solvent": "<id>", "molar": 1.0}}, "allowClass1": false}}
  A Class 1 solvent (ICH Q3C) is refused unless "allowClass1": true. --solvents lists the solvent table.`,
  },
  serve: {
    summary: 'build the workbench if needed and serve it on 127.0.0.1 (npm start)',
    usage: 'saltsmith serve [--port 4173] [--dir dist] [--no-build]   (PORT sets the default port)',
  },
} as const;

export type CommandName = keyof typeof COMMAND_USAGE;
