/**
 * The architecture rule: src/chem is the pure computation core. It imports nothing from React,
 * Dexie, zustand, recharts, Node built-ins, or the app's UI, state and storage code.
 * tests/arch/architecture.test.ts proves that a deliberate violation fails this check.
 * @type {import('dependency-cruiser').IConfiguration}
 */
module.exports = {
  forbidden: [
    {
      name: 'chem-is-pure',
      severity: 'error',
      comment: 'src/chem must stay free of UI, state, storage and Node code (see DEVELOPERS.md).',
      from: { path: '^src/chem/' },
      to: {
        path: [
          '^src/(app|features|components|stores|persistence|cli)/',
          'node_modules/(react|react-dom|dexie|dexie-react-hooks|zustand|recharts)/',
        ],
      },
    },
    {
      name: 'chem-no-node-builtins',
      severity: 'error',
      from: { path: '^src/chem/' },
      to: { dependencyTypes: ['core'] },
    },
    {
      name: 'one-way-flow',
      severity: 'error',
      comment:
        'Imports flow core ← persistence ← stores ← screening-data ← features ← app; nothing below imports app/.',
      from: { path: '^src/(persistence|stores|screening-data|features|components|chem)/' },
      to: { path: '^src/app/' },
    },
    {
      name: 'features-stay-apart',
      severity: 'error',
      comment:
        'A feature does not import another feature; the app shell composes them. What several areas share (the screening every area reads) lives in src/screening-data, outside the features.',
      from: { path: '^src/features/([^/]+)/' },
      to: { path: '^src/features/', pathNot: '^src/features/$1/' },
    },
    {
      name: 'screening-data-below-features',
      severity: 'error',
      comment:
        'src/screening-data is the shared screening layer under the feature areas: it reads the core, storage, stores and the shared chart types, never a feature or the app shell.',
      from: { path: '^src/screening-data/' },
      to: { path: '^src/(features|app)/' },
    },
    {
      name: 'storage-below-ui',
      severity: 'error',
      from: { path: '^src/persistence/' },
      to: { path: '^src/(features|components|stores|screening-data)/' },
    },
    {
      name: 'core-through-index',
      severity: 'error',
      comment:
        'Layers outside src/chem import the core only through @/chem (src/chem/index.ts), so the core can move its files without breaking them.',
      from: { path: '^src/', pathNot: '^src/chem/' },
      to: { path: '^src/chem/', pathNot: '^src/chem/index\\.ts$' },
    },
    {
      name: 'no-circular',
      severity: 'error',
      from: {},
      to: { circular: true },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    enhancedResolveOptions: {
      exportsFields: ['exports'],
      conditionNames: ['import', 'require', 'node', 'default', 'types'],
    },
    exclude: { path: '\\.d\\.ts$' },
  },
};
