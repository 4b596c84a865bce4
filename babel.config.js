// babel-preset-expo parses TypeScript for jest (web and node projects) and applies
// legacy decorators to files that use them (TypeORM entities).
module.exports = function (api) {
  api.cache(true);
  return {
    presets: ['babel-preset-expo'],
    // Under jest, `import()` (the app loads the harness's suite tools on demand, a chunk of its
    // own in the web export) becomes a deferred require: jest runs CommonJS, and native dynamic
    // import there needs --experimental-vm-modules. The flag below is what tells the preset's
    // CommonJS transform to rewrite dynamic imports; Metro builds never see it.
    plugins: process.env.NODE_ENV === 'test' ? [dynamicImportAsRequire] : [],
  };
};

function dynamicImportAsRequire() {
  return {
    name: 'sheetkeeper-dynamic-import-as-require',
    pre() {
      this.file.set('@babel/plugin-proposal-dynamic-import', '7.0.0');
    },
  };
}
