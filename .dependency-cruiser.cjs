// Layer rules for Tenderline, run by `npm run lint:deps` (part of `npm run lint` and `npm test`).
// Paths are relative to the repository root; both `@/…` and relative imports are resolved.
/* eslint-disable @typescript-eslint/no-require-imports -- a CommonJS file imports with require */
const fs = require('node:fs');
const path = require('node:path');

// The squeeze pipeline's numbered stage files, fem/squeeze/NN-name.ts, in order.
const STAGES = fs
  .readdirSync(path.join(__dirname, 'fem/squeeze'))
  .filter((f) => /^\d\d-[a-z-]+\.ts$/.test(f))
  .sort();

/** One rule per stage: its runtime imports of other stages go to the stage just before it. */
function pipelineRules() {
  return STAGES.map((file, i) => ({
    name: `squeeze-stage-${file.slice(0, 2)}-calls-only-previous`,
    severity: 'error',
    comment:
      'The squeeze pipeline runs one way: stage NN calls only stage NN − 1, so a stage can be ' +
      'read, tested and changed knowing only the stage below it. Type-only imports of earlier ' +
      'stages are allowed (they call nothing).',
    from: { path: `^fem/squeeze/${file.replace('.', '\\.')}$` },
    to: {
      path: '^fem/squeeze/\\d\\d-[a-z-]+\\.ts$',
      pathNot: i > 0 ? [`^fem/squeeze/${STAGES[i - 1].replace('.', '\\.')}$`] : [],
      dependencyTypesNot: ['type-only'],
    },
  }));
}

/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'lib-data-not-to-checks',
      severity: 'error',
      comment:
        'lib/data is the storage layer under the checks: lib/checks reads cultivars and saves ' +
        'assessments through it, so lib/data importing lib/checks would make the two one tangle ' +
        '(and pull the model worker into every page that reads data).',
      from: { path: '^lib/data/' },
      to: { path: '^lib/checks/' },
    },
    {
      name: 'lib-not-to-ui',
      severity: 'error',
      comment:
        'lib/ is the server and domain layer beneath the UI: React components (components/, the ' +
        'MDX component map in mdx-components.tsx) and routes (app/) build on lib, never the other ' +
        'way round. A module that binds components belongs in components/ or app/.',
      from: { path: '^lib/' },
      to: { path: ['^components/', '^app/', '^mdx-components\\.tsx$'] },
    },
    {
      name: 'fem-not-to-own-index',
      severity: 'error',
      comment:
        'fem/index.ts is the entry point for code outside fem/. A fem file importing it imports ' +
        'the whole core, itself included: an import cycle whose load order decides what is still ' +
        'undefined. Inside fem/, import the file that declares the name.',
      from: { path: '^fem/', pathNot: '^fem/index\\.ts$' },
      to: { path: '^fem/index\\.ts$' },
    },
    {
      name: 'fem-pure',
      severity: 'error',
      comment:
        'fem/ is the numerical core: pure TypeScript on ml-matrix, with no framework, database, ' +
        'Node built-in or lib/ import, so it runs the same in the web app, the worker threads, ' +
        'the CLI and the tests. (tests/fem/purity.test.ts checks the process/console/require ' +
        'text that is not an import.)',
      from: { path: '^fem/' },
      to: { pathNot: ['^fem/', '^node_modules/ml-matrix/'] },
    },
    {
      name: 'fem-only-through-index',
      severity: 'error',
      comment:
        'Outside fem/, the core is used only through fem/index.ts, its one public surface, so ' +
        'its internals can move without touching the app. scripts/bench-solvers.ts times solver ' +
        'internals and deep-imports them on purpose, as the tests under tests/fem/ do.',
      from: {
        path: ['^(app|components|lib|scripts)/', '^(auth|proxy)\\.ts$', '^mdx-components\\.tsx$'],
        pathNot: '^scripts/bench-solvers\\.ts$',
      },
      to: { path: '^fem/', pathNot: '^fem/index\\.ts$' },
    },
    {
      name: 'no-circular',
      severity: 'error',
      comment:
        'A module cycle makes load order decide which exports are still undefined at import ' +
        'time, and neither module can be understood or tested without the other. Move the piece ' +
        'both need to a lower module.',
      from: {},
      to: { circular: true },
    },
    {
      name: 'no-circular-lib-folders',
      severity: 'error',
      comment:
        'lib/ folders are layers (e.g. lib/auth and lib/photos below lib/data, lib/properties ' +
        'below lib/validation). Two folders importing each other, even only types, are one ' +
        'layer in two places; move the shared type or helper down to the lower folder.',
      scope: 'folder',
      from: { path: '^lib/' },
      to: { path: '^lib/', circular: true },
    },
    ...pipelineRules(),
    {
      name: 'not-to-unresolvable',
      severity: 'error',
      comment:
        'An import dependency-cruiser cannot resolve is one none of these rules can check (for ' +
        'example if the @/ alias stopped resolving); it should also fail the build.',
      from: {},
      to: { couldNotResolve: true },
    },
  ],
  options: {
    doNotFollow: {
      path: 'node_modules',
    },
    // Type-only imports count: a cycle through types still ties two folders together.
    tsPreCompilationDeps: true,
    // Resolves the `@/*` path alias the same way TypeScript and Next do.
    tsConfig: { fileName: 'tsconfig.json' },
    enhancedResolveOptions: {
      exportsFields: ['exports'],
      conditionNames: ['import', 'require', 'node', 'default', 'types'],
      mainFields: ['module', 'main', 'types', 'typings'],
    },
  },
};
