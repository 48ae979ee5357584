import type { Checkpoint, LessonContent } from '@core/contracts';
import { newKey } from '@core/lessons';
import { caution, chapters, safetyNote, scored, settings, type DemoRecordingFacts } from './003-demo-lesson-content';

/**
 * Draft demo lesson on 'Demo: magnet through a copper tube': the magnet drifts down at a steady
 * speed from the start; the captions explain the eddy currents from 3 s and the steady speed from 6.5 s.
 */
export function eddyCurrents(recording: DemoRecordingFacts): LessonContent {
  const lesson = settings({
    title: 'Eddy currents: a magnet falling through a copper tube',
    description:
      'A strong neodymium magnet is let go at the top of a vertical copper tube and drifts down at a slow, steady speed. ' +
      'Students predict its fall, explain the braking with induced currents, and model one ring of the tube as a current loop.',
    tags: ['electromagnetic induction', 'eddy currents', 'magnets'],
    level: 'Year 11 (demo)',
  });
  const checkpoints: Checkpoint[] = [
    safetyNote(500, 'Safety: strong magnets', 'Before you try this yourself.', caution(lesson, 'magnets')),
    {
      key: newKey(),
      atMs: 1500,
      label: 'Predict: the fall',
      behaviour: 'gate',
      kind: 'prediction',
      ...scored(0, 1, [], ''),
      prompt: 'The magnet has just been let go at the top of the copper tube. Copper does not stick to magnets. How will it fall?',
      response: {
        mode: 'choices',
        options: [
          { id: 'a', text: 'Freely, as fast as a dropped stone' },
          { id: 'b', text: 'Slowly, at a steady speed' },
          { id: 'c', text: 'It will stick to the copper and stop' },
        ],
        correctOptionId: 'b',
      },
      revealAtMs: 7000,
      revealText:
        'It drifts down at a slow, steady speed. Its moving field drives eddy currents round the tube, and their field ' +
        'pushes back on the magnet.',
      askExplanation: true,
      scored: false,
    },
    {
      key: newKey(),
      atMs: 3000,
      label: 'Why so slow?',
      behaviour: 'gate',
      kind: 'multiple-choice',
      ...scored(1, 2, ['What does a magnet moving past a conductor do to the conductor?'], ''),
      prompt: 'Copper is not attracted to magnets. Why does the tube slow the magnet down?',
      options: [
        {
          id: 'a',
          text: 'Its moving field drives currents in the copper, and their field opposes the motion',
          correct: true,
          feedback: 'Right: the changing field induces eddy currents round the tube, and their field pushes back on the magnet.',
        },
        {
          id: 'b',
          text: 'Air trapped under the magnet acts as a cushion',
          correct: false,
          feedback:
            'The tube is open at both ends, so the air escapes; the same magnet falls quickly through a plastic tube of the same size.',
        },
        {
          id: 'c',
          text: 'The copper is weakly magnetised and attracts the magnet',
          correct: false,
          feedback: 'A magnet does not stick to copper. The drag appears only while the magnet moves, so it comes from induced currents.',
        },
        {
          id: 'd',
          text: 'Friction with the walls of the tube',
          correct: false,
          feedback: 'The magnet barely touches the walls, and it slides quickly through a plastic tube of the same size.',
        },
      ],
      allowSeveral: false,
      shuffle: true,
    },
    {
      key: newKey(),
      atMs: 4000,
      label: 'Field of the ring below',
      behaviour: 'gate',
      kind: 'sign',
      ...scored(
        1,
        1,
        ['Curl the fingers of your right hand the way the current flows; your thumb gives the field at the centre.'],
        'Fingers along the current (anticlockwise seen from above), and your thumb points up, $+y$. The ring’s upper face acts ' +
          'as a north pole and pushes back on the falling north pole: the induced current opposes the change that causes it.',
      ),
      prompt:
        'Take $x$ to the right, $y$ up the tube and $z$ out of the page. The magnet falls north pole first. Seen from above, ' +
        'the eddy current in the ring of copper just below the magnet flows anticlockwise. Which way does that ring’s own ' +
        'field point at its centre?',
      choiceSet: 'axis',
      answer: {
        source: 'geometry',
        geometry: {
          conductor: { shape: 'loop', center: [0, -0.02, 0], radius: 0.012, axis: 'y', current: 'anticlockwise' },
          point: [0, -0.02, 0],
          component: 'y',
        },
      },
    },
    {
      key: newKey(),
      atMs: 5000,
      label: 'A ring as a flat coil',
      behaviour: 'pause',
      kind: 'equation',
      latex: 'B(z) = \\frac{\\mu_0 N I a^2}{2\\left(a^2 + z^2\\right)^{3/2}}',
      caption:
        'Each ring of the tube acts like a flat coil. On the axis of a coil of $N$ turns and radius $a$ carrying a current $I$, ' +
        'the field is largest at the centre, $z = 0$, where $B = \\mu_0 N I / (2a)$. Move the sliders and watch the field along the axis.',
      model: {
        modelId: 'coil-on-axis',
        inputs: [
          { name: 'N', slider: true, min: 1, max: 100, step: 1, value: 20 },
          { name: 'a', slider: true, min: 1, max: 10, step: 0.5, value: 2 },
          { name: 'I', slider: true, min: 0, max: 5, step: 0.05, value: 2 },
          { name: 'z', slider: true, min: -10, max: 10, step: 0.5, value: 0 },
        ],
        plot: { input: 'z', from: -10, to: 10 },
      },
    },
    {
      key: newKey(),
      atMs: 6000,
      label: 'Field at a coil’s centre',
      behaviour: 'gate',
      kind: 'numeric',
      ...scored(
        2,
        3,
        ['Write the radius in metres before you substitute.', '$\\mu_0 = 4\\pi \\times 10^{-7}$ T m/A.'],
        'At the centre of a flat coil every turn adds the same field, so $B = \\dfrac{\\mu_0 N I}{2a}$.',
      ),
      prompt:
        'A flat coil of {{N}} turns and radius {{a}} carries a steady current of {{I}}. What is the magnetic field at its ' +
        'centre? Give it in mT.',
      expected: 'mu0*N*I/(2*a)',
      askedUnit: 'mT',
      variables: [
        { name: 'N', min: 10, max: 100, step: 10, unit: '', role: 'turns' },
        { name: 'a', min: 2, max: 8, step: 0.5, unit: 'cm', role: 'radius' },
        { name: 'I', min: 0.5, max: 3, step: 0.5, unit: 'A', role: 'none' },
      ],
      relativeTolerancePercent: 2,
      absoluteTolerance: null,
      sigFigs: { min: 2, max: 4, penalty: 0.25 },
      requireUnit: true,
      distractors: [
        {
          id: 'wire',
          formula: 'mu0*N*I/(2*pi*a)',
          feedback:
            'That is the long straight wire’s $\\mu_0 I/(2\\pi d)$, times $N$. At the centre of a coil there is no $\\pi$: $B = \\mu_0 N I/(2a)$.',
        },
      ],
    },
    {
      key: newKey(),
      atMs: 8000,
      label: 'The steady speed',
      behaviour: 'gate',
      kind: 'short-text',
      ...scored(
        1,
        2,
        [],
        'At terminal velocity the forces on the magnet balance, so the resultant force is zero and it no longer speeds up.',
      ),
      prompt:
        'Once the magnet falls at a steady speed, the upward push of the eddy currents balances its weight. What is this ' +
        'steady speed called? (two words)',
      accepted: ['terminal velocity', 'terminal speed'],
      caseSensitive: false,
      spacing: 'collapse',
    },
    {
      key: newKey(),
      atMs: 9000,
      label: 'A slit along the tube',
      behaviour: 'gate',
      kind: 'multiple-choice',
      ...scored(1, 2, [], ''),
      prompt: 'The tube is swapped for an identical one with a narrow slit cut along its whole length. How does the magnet fall now?',
      options: [
        {
          id: 'a',
          text: 'Faster',
          correct: true,
          feedback:
            'Right: the slit breaks every path round the tube, so the eddy currents are much weaker. Small loops either side ' +
            'of the slit still brake it a little.',
        },
        {
          id: 'b',
          text: 'Slower',
          correct: false,
          feedback: 'The slit takes copper out of the currents’ path round the tube; it cannot make them stronger.',
        },
        {
          id: 'c',
          text: 'Just as before',
          correct: false,
          feedback: 'The eddy currents flow round the tube, and the slit cuts that path, so the braking changes.',
        },
        {
          id: 'd',
          text: 'It stops inside the tube',
          correct: false,
          feedback: 'The drag exists only while the magnet moves, so it can slow the magnet but never hold it still.',
        },
      ],
      allowSeveral: false,
      shuffle: true,
    },
  ];
  const parts: [string, number][] = [
    ['Letting go', 0],
    ['Eddy currents', 3000],
    ['Steady speed', 6500],
  ];
  return { settings: lesson, chapters: chapters(recording, parts), checkpoints };
}
