/**
 * Cautions the studio offers for a lesson's safety notes when its title, tags or description mention
 * apparatus with a known hazard. Suggestions only: each defers to the school's rules and local
 * regulations, and the teacher decides what to keep (common practice for school demonstrations).
 */
export type CautionTopic = 'cells' | 'magnets' | 'mains';

export interface Caution {
  topic: CautionTopic;
  text: string;
}

const DEFER = "Follow your school's safety rules and local regulations, which take precedence over this note.";

const TOPICS: ReadonlyArray<{ topic: CautionTopic; pattern: RegExp; text: string }> = [
  {
    topic: 'cells',
    // Whole words, singular or plural: "cell", "cells", "battery", "batteries", "coil", "coils", "solenoid(s)".
    pattern: /\b(?:cells?|batter(?:y|ies)|coils?|solenoids?)\b/i,
    text:
      'A cell or battery shorted through a coil heats the wire and the cell quickly and can burn fingers. ' +
      'Use a low voltage, keep connections short, put a switch in the circuit and do not leave the coil connected. ' +
      DEFER,
  },
  {
    topic: 'magnets',
    pattern: /\b(?:magnets?|neodymium)\b/i,
    text:
      'Strong magnets snap together and can pinch skin; handle them one at a time. ' +
      'Keep them away from pacemakers and other medical implants, bank cards and phones. ' +
      DEFER,
  },
  {
    topic: 'mains',
    pattern: /\bmains\b/i,
    text: 'Use only school-approved, tested mains apparatus, and never open mains equipment or work inside it. ' + DEFER,
  },
];

/** The cautions whose topic the lesson's title, tags or description mention, each once, in a fixed order. */
export function suggestCautions(text: { title: string; tags: string[]; description: string }): Caution[] {
  const haystack = [text.title, ...text.tags, text.description].join('\n');
  return TOPICS.filter(({ pattern }) => pattern.test(haystack)).map(({ topic, text: caution }) => ({ topic, text: caution }));
}
