import { describe, expect, it } from 'vitest';
import { equation, multipleChoice, note, numeric, prediction, shortText, sign } from '../lessons/fixtures.test-support';
import { revealFor } from './reveal-text';

describe('revealFor', () => {
  it('states the right option, accepted text and explanation', () => {
    expect(revealFor(multipleChoice(), { seed: 's' })).toEqual({ answer: 'Towards east', explanation: 'Because of the right-hand rule.' });
    expect(revealFor(shortText(), { seed: 's' })).toEqual({ answer: 'Ampère’s law', explanation: 'Because of the right-hand rule.' });
  });

  it("computes the numeric answer from this student's stored values", () => {
    // B = μ0 N I / (2a) with a = 5 cm, N = 20, I = 1.5 A: 4π×10⁻⁷ × 20 × 1.5 / 0.10 = 3.770×10⁻⁴ T
    // (the flat-coil formula, e.g. Young & Freedman, University Physics, 15th ed., §28.5).
    expect(revealFor(numeric(), { seed: 's', values: { a: '5 cm', N: 20, I: '1.5 A' } })).toEqual({
      answer: '377 µT',
      explanation: 'Because of the right-hand rule.',
    });
  });

  it('derives a sign answer from its geometry', () => {
    // Current anticlockwise seen from +z: the field at the loop's centre points along +z, out of the page (right-hand grip rule).
    expect(revealFor(sign(), { seed: 's' })?.answer).toBe('Out of the page');
  });

  it("gives a prediction's outcome with what happens at the reveal", () => {
    expect(revealFor(prediction(), { seed: 's' })).toEqual({
      answer: 'Turn further',
      explanation: 'SECRET-REVEAL: it turns further, but not twice as far.\n\nBecause of the right-hand rule.',
    });
  });

  it('is null for checkpoints that take no answer', () => {
    expect(revealFor(note(), { seed: 's' })).toBeNull();
    expect(revealFor(equation(), { seed: 's' })).toBeNull();
  });
});
