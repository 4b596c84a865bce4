import { installMarksFont } from '../../client/install-marks-font';
import { MARKS_FAMILY } from '../../constants/marks-family';
import { theme } from '../../constants/theme';

// Jest has no asset registry; the exported app gives the font file's URL here.
jest.mock('expo-asset', () => ({
  Asset: { fromModule: () => ({ uri: '/assets/assets/fonts/sheetkeeper-marks.ttf' }) },
}));

describe('installMarksFont', () => {
  it('declares the check-mark face for U+2713 only, once', () => {
    installMarksFont();
    installMarksFont();
    const rules = document.querySelectorAll('#sheetkeeper-marks-font');
    expect(rules).toHaveLength(1);
    expect(rules[0]!.textContent).toMatch(
      new RegExp(
        `font-family: ${MARKS_FAMILY}; src: url\\("/assets/assets/fonts/sheetkeeper-marks.ttf"\\) format\\("truetype"\\); unicode-range: U\\+2713;`,
      ),
    );
  });

  it('puts the check-mark family before IBM Plex in every font of the theme on the web', () => {
    for (const family of Object.values(theme.font)) expect(family).toMatch(new RegExp(`^${MARKS_FAMILY}, IBMPlex`));
  });
});
