import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { marksFont } from './marks-font';

/** `npm run make:marks-font`: writes our check-mark font (scripts/marks-font.ts) where the app loads it from. */
const file = path.join(__dirname, '..', 'assets', 'fonts', 'sheetkeeper-marks.ttf');
writeFileSync(file, Buffer.from(marksFont().toArrayBuffer()));
console.log(`wrote ${file}`);
