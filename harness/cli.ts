import { adapterCheckCommand } from './adapter-check/adapter-check-command';
import { answerContinue } from './reference/continuation/answer-continue';
import { answerReference } from './reference/answer-reference';
import { cutmapCommand } from './cutmap/cutmap-command';
import { fingerprintCommand } from './fingerprint/fingerprint-command';
import { jsonLines } from './json-lines';
import { matrixCommand } from './matrix/matrix-command';
import { runCommand } from './runner/commands/run-command';
import { targetsCommand } from './runner/commands/targets-command';

const USAGE = `usage: sheetkeeper <command>

commands:
  reference   principal values: JSON lines {"fn","z","convention",["w"|"n"]} on stdin, one answer per line
  continue    regular branches of g(z)^nu along a path: JSON lines {"g","nu","z0","f0"|"k","path","at"}
  run         check suites against targets: --suite FILE|ID --target NAME@VERSION [--format table|json|junit|summary] [--out FILE] [--seed N]; exit 0 pass, 1 branch findings or errors, 2 bad input, 3 accuracy findings only
  targets     the installed targets, versions, settings and entries [--format json|table] [--ways: what every way of building a value delivers, −0 included]
  fingerprint which convention a target follows on each cut: --target NAME@VERSION [--fn a,b] [--entry NAME] [--format table|json] [--out FILE]
  cutmap      where a target's function is discontinuous over a box: --target NAME@VERSION --fn sqrt [--box re0,im0,re1,im1] [--grid 81x81] [--format json|svg|table] [--out FILE]
  matrix      the same suites over every installed version of a library: --suite FILE|ID[,...] --library complex.js [--entry NAME[,...]] [--format table|json] [--out FILE]
  adapter-check  check a stdio adapter against the protocol: --program "COMMAND ARGS" | --target NAME [--config FILE] [--time-limit MS] [--format table|json] [--out FILE]; exit 0 pass, 1 fail, 2 bad input

run, targets, fingerprint, cutmap and matrix also check libraries Sheetkeeper did not install (docs/target-sources.md):
  --config FILE (default ./sheetkeeper.config.json when present), --npm PACKAGE@VERSION, --local FOLDER|FILE.tgz,
  --program "COMMAND ARGS" (each repeatable), --target-cache DIR; with exactly one of --npm/--local/--program
  and no --target, that library is the target
`;

/** The `sheetkeeper` command: dispatches a subcommand; unknown ones print the usage and exit 2. */
async function main(argv: string[]): Promise<number> {
  const [command] = argv;
  if (command === 'reference') {
    await jsonLines(process.stdin, process.stdout, answerReference);
    return 0;
  }
  if (command === 'continue') {
    await jsonLines(process.stdin, process.stdout, answerContinue);
    return 0;
  }
  if (command === 'run') return runCommand(argv.slice(1));
  if (command === 'targets') return targetsCommand(argv.slice(1));
  if (command === 'fingerprint') return fingerprintCommand(argv.slice(1));
  if (command === 'cutmap') return cutmapCommand(argv.slice(1));
  if (command === 'matrix') return matrixCommand(argv.slice(1));
  if (command === 'adapter-check') return adapterCheckCommand(argv.slice(1));
  process.stderr.write(command ? `sheetkeeper: unknown command "${command}"\n${USAGE}` : USAGE);
  return 2;
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(`sheetkeeper: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exitCode = 2;
  },
);
