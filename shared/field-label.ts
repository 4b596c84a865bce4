/**
 * A list's items, by the key that holds them, named as the suite form titles them: `paths.0`
 * is "Path 1", the form's panel for it.
 */
const ITEMS: Record<string, string> = {
  paths: 'Path',
  properties: 'Property',
  counterparts: 'Counterpart',
  cuts: 'Cut',
  points: 'point',
  at: 't',
  along: 'place',
  offsets: 'offset',
};

/** The suite's own fields, as the form's panels and first fields are titled. */
const TOP: Record<string, string> = {
  id: 'Id',
  title: 'Title',
  story: 'Story',
  subject: 'Subject',
  version: 'Version',
  entry: 'Entry',
  branch: 'Branch',
  convention: 'Convention on the cuts',
  paths: 'Paths',
  tolerances: 'Tolerances',
  properties: 'Property checks',
  counterparts: 'Counterparts',
  '(body)': 'the whole suite',
};

/** Keys further in whose words in the form differ from the key itself (the rest lose their underscores). */
const WORDS: Record<string, string> = {
  re: 'real part',
  im: 'imaginary part',
  g: 'g(z)',
  nu: 'ν',
  z0: 'reference point z0',
  f0: 'value f0 at z0',
  to_infinity: 'continues to infinity',
  distance: 'distance from the cuts',
};

/**
 * A field key of a zod issue (`paths.0.samples`, as `fieldIssues` and the API write it) in the
 * words of the form that shows it: "Path 1 · samples". Indices count from 1 and take the name of
 * the item they pick; the suite upload, the suite form and the review's refusal all say it so.
 * A leading `body.` or `file.` (where the API found the suite) is dropped.
 */
export function fieldLabel(field: string): string {
  const keys = field.replace(/^(body|file)\./, '').split('.');
  const words: string[] = [];
  keys.forEach((key, i) => {
    const item = ITEMS[keys[i - 1] ?? ''];
    if (/^\d+$/.test(key) && item) {
      words[words.length - 1] = `${item} ${Number(key) + 1}`;
      return;
    }
    words.push((i === 0 ? TOP[key] : WORDS[key]) ?? key.replace(/_/g, ' '));
  });
  return words.join(' · ');
}
