// babel-preset-expo parses TypeScript for jest (web and node projects) and applies
// legacy decorators to files that use them (TypeORM entities).
module.exports = function (api) {
  api.cache(true);
  return { presets: ['babel-preset-expo'] };
};
