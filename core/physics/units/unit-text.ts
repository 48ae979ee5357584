/** Character-level clean-up shared by the number, unit and formula readers (what students actually type). */

const SUPERSCRIPTS: Readonly<Record<string, string>> = {
  '⁰': '0',
  '¹': '1',
  '²': '2',
  '³': '3',
  '⁴': '4',
  '⁵': '5',
  '⁶': '6',
  '⁷': '7',
  '⁸': '8',
  '⁹': '9',
  '⁻': '-',
  '⁺': '+',
};

/** Whether a character is a superscript digit or sign (⁻⁵). */
export function isSuperscript(ch: string | undefined): boolean {
  return ch !== undefined && ch in SUPERSCRIPTS;
}

/** Replaces a run of superscripts by plain characters ('⁻⁵' → '-5'). */
export function plainSuperscripts(text: string): string {
  let out = '';
  for (const ch of text) out += SUPERSCRIPTS[ch] ?? ch;
  return out;
}

/**
 * Unicode spaces → ' ', minus signs and dashes → '-', the multiplication dots → '*'; micro signs are
 * unified to U+00B5 and the ohm sign to 'Ω' (U+03A9). Superscripts are left for the readers.
 */
export function normaliseCharacters(text: string): string {
  return text
    .replace(/[\u00a0\u2000-\u200b\u202f\u205f\u3000\t\r\n]/g, ' ')
    .replace(/[\u2212\u2012\u2013\u2014\ufe63\uff0d]/g, '-')
    .replace(/[\u00b7\u22c5\u2219\u2022]/g, '*')
    .replace(/\u03bc/g, '\u00b5')
    .replace(/\u2126/g, '\u03a9');
}
