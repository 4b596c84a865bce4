import { buildCliPackage, CLI_PACKAGE_DIR } from './cli-package/build-cli-package';

/**
 * `npm run build:cli`: assembles the CLI package in packages/cli (compiled harness, the files it
 * reads at run time, its dependencies bundled), ready for `npm pack` there (docs/cli-package.md).
 */
const copied = buildCliPackage(CLI_PACKAGE_DIR, { bundle: true });
console.log(
  `[sheetkeeper] built packages/cli: the compiled CLI, ${copied} harness file(s), suites/ and its dependencies`,
);
