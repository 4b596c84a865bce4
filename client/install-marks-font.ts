import { Asset } from 'expo-asset';
import { Platform } from 'react-native';
import { MARKS_FAMILY } from '../constants/marks-family';

/**
 * Declares our check-mark font (scripts/make-marks-font.ts) for U+2713 only. IBM Plex's ✓ looks
 * like √; with `unicode-range` the browser takes ✓ from this face and every other character from
 * IBM Plex, and fetches the 1.4 KB file only once a ✓ is on screen. expo-font cannot declare a
 * range, hence a rule of our own. Does nothing off the web or when already declared.
 */
export function installMarksFont(): void {
  if (Platform.OS !== 'web' || typeof document === 'undefined' || document.getElementById('sheetkeeper-marks-font'))
    return;
  const uri = Asset.fromModule(require('../assets/fonts/sheetkeeper-marks.ttf')).uri;
  const style = document.createElement('style');
  style.id = 'sheetkeeper-marks-font';
  style.textContent = `@font-face { font-family: ${MARKS_FAMILY}; src: url("${uri}") format("truetype"); unicode-range: U+2713; font-display: block; }`;
  document.head.appendChild(style);
}
