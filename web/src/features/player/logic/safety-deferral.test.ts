import { describe, expect, it } from 'vitest';
import { suggestCautions } from '@core/lessons/safety-suggestions';
import { notesDeferToSchool } from './safety-deferral';

// Hand-written cases.
describe('notesDeferToSchool', () => {
  it('sees the deferral the studio’s suggested cautions end with', () => {
    const [caution] = suggestCautions({ title: 'Magnets (demo)', tags: [], description: '' });
    expect(caution).toBeDefined();
    expect(notesDeferToSchool(caution?.text ?? '')).toBe(true);
  });

  it('sees other wordings of it, curly apostrophes and line breaks included', () => {
    expect(notesDeferToSchool('Wear goggles.\nYour school’s rules come first.')).toBe(true);
    expect(notesDeferToSchool('Local regulations apply to mains apparatus.')).toBe(true);
    expect(notesDeferToSchool('Always follow the school policy on magnets!')).toBe(true);
  });

  it('does not take a mere mention of the school or of rules for a deferral', () => {
    expect(notesDeferToSchool('Ask the school technician for the low-voltage supply.')).toBe(false);
    expect(notesDeferToSchool('Follow the wiring diagram first. The rules of thumb are in the booklet.')).toBe(false);
    expect(notesDeferToSchool('Keep the cell disconnected while you rewire.')).toBe(false);
    expect(notesDeferToSchool('')).toBe(false);
  });
});
