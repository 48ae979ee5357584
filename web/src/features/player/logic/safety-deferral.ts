/** Sentences of a Markdown text, roughly: split after . ! ? and at line breaks. */
function sentencesOf(text: string): string[] {
  return text.split(/(?<=[.!?])\s+|\n+/).filter((sentence) => sentence.trim() !== '');
}

const WHOSE = /\b(?:school|local)\b/i;
const RULES = /\b(?:rules?|regulations?|polic(?:y|ies))\b/i;
const FIRST = /\b(?:follow|first|precedence|priority|prevail|apply|applies)\b/i;

/**
 * Whether the teacher's safety notes already defer to the school's rules: one sentence that names
 * the school's (or local) rules or regulations and puts them first, as "Follow your school's safety
 * rules and local regulations, which take precedence over this note." (the studio's suggested
 * cautions end so). A sentence that only mentions the school ("ask the school technician") does not.
 */
export function notesDeferToSchool(notes: string): boolean {
  return sentencesOf(notes).some((sentence) => WHOSE.test(sentence) && RULES.test(sentence) && FIRST.test(sentence));
}
