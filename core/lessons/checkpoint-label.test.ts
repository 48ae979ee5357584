import { describe, expect, it } from 'vitest';
import { checkpointLabel } from './checkpoint-label';
import { SIGN_CHOICE_LABELS, signChoiceLabel } from './choice-labels';
import { SIGN_CHOICES } from '../contracts/checkpoints';
import { equation, multipleChoice, note } from './fixtures.test-support';

describe('checkpointLabel', () => {
  it('uses the label when there is one', () => {
    expect(checkpointLabel(multipleChoice({ label: '  Needle direction ' }))).toBe('Needle direction');
  });

  it('falls back to the first words of the prompt without Markdown', () => {
    expect(
      checkpointLabel(
        multipleChoice({
          prompt: '## **Which** way does [the needle](https://example.org) turn when $I$ doubles and the coil is reversed?',
        }),
      ),
    ).toBe('Which way does the needle turn when I…');
  });

  it("uses an equation card's caption and a note's body", () => {
    expect(checkpointLabel(equation({ caption: 'Centre field' }))).toBe('Centre field');
    expect(checkpointLabel(note({ body: '> Keep the switch open' }))).toBe('Keep the switch open');
  });

  it('falls back to the kind when there is no text', () => {
    expect(checkpointLabel(multipleChoice({ prompt: '  ' }))).toBe('Multiple choice');
    expect(checkpointLabel(equation({ caption: '' }))).toBe('Equation card');
  });
});

describe('SIGN_CHOICE_LABELS', () => {
  it('labels every choice of every set', () => {
    for (const choices of Object.values(SIGN_CHOICES)) for (const choice of choices) expect(SIGN_CHOICE_LABELS[choice]).toBeTruthy();
    expect(signChoiceLabel('+x')).toBe('+x direction');
    expect(signChoiceLabel('into')).toBe('Into the page');
    expect(signChoiceLabel('sideways')).toBe('sideways');
  });
});
