// How jest compiles the node-side TypeScript (server, harness, shared, scripts and their tests,
// and the end-to-end files): SWC, with the same choices as tsconfig.json and as tsx, which runs
// the server (legacy decorators for the TypeORM entities, no decorator metadata, class fields
// assigned rather than defined). babel-preset-expo, which the web project keeps for React Native,
// took 10 s to compile one route test's imports cold; a fresh clone compiles everything cold.
module.exports = {
  '\\.[jt]sx?$': [
    '@swc/jest',
    {
      jsc: {
        parser: { syntax: 'typescript', tsx: true, decorators: true },
        transform: { legacyDecorator: true, decoratorMetadata: false, useDefineForClassFields: false },
        target: 'es2022',
      },
      module: { type: 'commonjs' },
      sourceMaps: 'inline',
    },
  ],
};
