import { describe, expect, it } from 'vitest';
import { lessonPaths, sectionBaseOf } from './section-base';

describe('section base', () => {
  it('is the section the path is in', () => {
    expect(sectionBaseOf('/teacher/lessons')).toBe('/teacher');
    expect(sectionBaseOf('/substitute/lessons/abc/preview')).toBe('/substitute');
    expect(sectionBaseOf('/coordinator')).toBe('/coordinator');
    // Only whole segments count.
    expect(sectionBaseOf('/substitutes/lessons')).toBe('/teacher');
    expect(sectionBaseOf('/admin/people')).toBe('/teacher');
  });

  it('keeps lesson links inside the section; a substitute edits their own copies in their section; creating is the teacher’s', () => {
    const to = lessonPaths('/substitute');
    expect(to.list).toBe('/substitute/lessons');
    expect(to.overview('l1')).toBe('/substitute/lessons/l1');
    expect(to.preview('l1')).toBe('/substitute/lessons/l1/preview');
    expect(to.studio('l1')).toBe('/substitute/lessons/l1/studio');
    expect(to.create('r 1')).toBe('/teacher/lessons/new?recording=r%201');
  });
});
