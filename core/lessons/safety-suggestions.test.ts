import { describe, expect, it } from 'vitest';
import { suggestCautions } from './safety-suggestions';

const topics = (title: string, tags: string[] = [], description = '') => suggestCautions({ title, tags, description }).map((c) => c.topic);

describe('suggestCautions', () => {
  it('suggests the cell caution for cells, batteries and coils, singular or plural', () => {
    expect(topics('A cell and a coil')).toEqual(['cells']);
    expect(topics('Two batteries')).toEqual(['cells']);
    expect(topics('', ['Coils'])).toEqual(['cells']);
    expect(topics('', [], 'We connect the battery.')).toEqual(['cells']);
  });

  it('matches whole words only', () => {
    expect(topics('Cellular structures, recoil and magnetism', [], 'The remains of the day')).toEqual([]);
  });

  it('suggests magnets and mains, once each, in a fixed order', () => {
    expect(topics('Mains transformer', ['magnets'], 'A magnet, a coil and another magnet')).toEqual(['cells', 'magnets', 'mains']);
  });

  it('names the hazards and defers to the school and local regulations in every caution', () => {
    const cautions = suggestCautions({ title: 'Coil, magnet and mains', tags: [], description: '' });
    const text = (topic: string) => cautions.find((c) => c.topic === topic)?.text ?? '';
    // Common practice for school demonstrations: short circuits heat wires and cells; magnets pinch and affect implants.
    expect(text('cells')).toMatch(/heats the wire and the cell/);
    expect(text('cells')).toMatch(/switch/);
    expect(text('magnets')).toMatch(/pinch/);
    expect(text('magnets')).toMatch(/pacemakers/);
    expect(text('mains')).toMatch(/never open mains equipment/);
    for (const caution of cautions) expect(caution.text).toMatch(/school's safety rules and local regulations/);
  });
});
