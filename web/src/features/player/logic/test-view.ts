import type { StudentCheckpoint, StudentLessonView } from '@core/contracts';

/** A small lesson of invented checkpoints for the player's tests. */
export const answered = { required: true, points: 1, attempts: 2, hintCount: 1 };

export const mcAt = (key: string, atMs: number, behaviour: StudentCheckpoint['behaviour'] = 'pause'): StudentCheckpoint => ({
  key,
  atMs,
  label: `Question ${key}`,
  behaviour,
  ...answered,
  kind: 'multiple-choice',
  prompt: 'Which way does the needle turn?',
  options: [
    { id: 'a', text: 'Towards the coil' },
    { id: 'b', text: 'Away from the coil' },
  ],
  allowSeveral: false,
});

export const noteAt = (key: string, atMs: number, behaviour: StudentCheckpoint['behaviour'] = 'pause'): StudentCheckpoint => ({
  key,
  atMs,
  label: `Note ${key}`,
  behaviour,
  kind: 'note',
  tone: 'remark',
  body: 'Watch the needle as the switch closes.',
});

export const predictionAt = (key: string, atMs: number, revealAtMs: number): StudentCheckpoint => ({
  key,
  atMs,
  label: 'Predict',
  behaviour: 'pause',
  ...answered,
  attempts: 1,
  kind: 'prediction',
  prompt: 'What will the needle do when the current doubles?',
  options: [
    { id: 'p1', text: 'Turn further' },
    { id: 'p2', text: 'Stay put' },
  ],
  revealAtMs,
  askExplanation: true,
  scored: false,
});

export function viewOf(checkpoints: StudentCheckpoint[], safetyNotes = ''): StudentLessonView {
  return { title: 'Coil and compass (demo)', locale: 'en-GB', safetyNotes, chapters: [], checkpoints };
}
