/**
 * The migrated, seeded database every node test file copies (CREATE DATABASE … TEMPLATE). Its
 * name carries the jest run's process id, set by globalSetup before the workers start, so two
 * jest runs on one machine never drop each other's template.
 */
export function templateDatabase(): string {
  const name = process.env.SHEETKEEPER_TEST_TEMPLATE;
  if (!name)
    throw new Error(
      'SHEETKEEPER_TEST_TEMPLATE is unset: run the node tests through jest (tests/setup/global-setup.ts)',
    );
  return name;
}
