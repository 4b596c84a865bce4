import Head from 'expo-router/head';

/**
 * The browser tab's title for the screen that renders it, "<title> · Sheetkeeper", so a person
 * with several tabs open (a run, a case, the review queue) can tell them apart. Every route file
 * renders one; a screen whose title depends on data (a run, a suite) passes the readable name.
 */
export function PageTitle({ title }: { title: string }) {
  return (
    <Head>
      <title>{`${title} · Sheetkeeper`}</title>
    </Head>
  );
}
