import { act, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { buildContent, buildStudioLesson, fakePlayer, mockDraftSaves, renderStudio } from './studio.test-support';

describe('studio: pinning', { timeout: 40_000 }, () => {
  it('pins at the current frame from the Pin menu and with P then a digit, and saves', async () => {
    const lesson = buildStudioLesson(buildContent());
    const saves = mockDraftSaves(lesson);
    const player = fakePlayer(12.31); // 25 fps: the frame starts at 12.320 s
    const { user } = renderStudio(lesson, { player });

    await user.click(await screen.findByRole('button', { name: /Pin at 0:12.320/ }));
    await user.click(within(screen.getByRole('group', { name: 'Checkpoint kinds' })).getByRole('button', { name: /Multiple choice/ }));
    expect(screen.getByRole('button', { name: 'Multiple choice, at 0:12.320' })).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByText('Pinned a multiple choice at 0:12.320.')).toBeInTheDocument();

    act(() => player.play(20));
    await user.keyboard('p2');
    expect(screen.getByRole('button', { name: 'Numeric answer, at 0:20.000' })).toBeInTheDocument();

    await waitFor(() =>
      expect(saves.at(-1)?.content.checkpoints.map((c) => [c.kind, c.atMs])).toEqual([
        ['multiple-choice', 12_320],
        ['numeric', 20_000],
      ]),
    );
    expect(saves[0]!.revision).toBe(3);
  });

  it('refuses a pin too close to another checkpoint and offers the nearest free frame', async () => {
    const existing = { ...newCheckpoint('note', 12_000), label: 'Watch the needle' };
    const lesson = buildStudioLesson(buildContent({ checkpoints: [existing] }));
    mockDraftSaves(lesson);
    const { user } = renderStudio(lesson, { player: fakePlayer(12.2) });
    await screen.findByRole('button', { name: /Pin at 0:12.200/ });

    await user.keyboard('p1');
    expect(
      screen.getByText(
        'Not pinned: 0:12.200 is only 0.2 s from “Watch the needle” at 0:12.000; this lesson keeps at least 0.5 s between checkpoints.',
      ),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Multiple choice/ })).not.toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Pin at 0:12.520 instead' }));
    expect(screen.getByRole('button', { name: 'Multiple choice, at 0:12.520' })).toBeInTheDocument();
  });

  it('refuses a pin past the end of the recording', async () => {
    const lesson = buildStudioLesson(buildContent(), {
      recording: { id: 'r', title: 'Short (test)', durationMs: 5000, frameRate: 25, ready: true },
    });
    mockDraftSaves(lesson);
    const { user } = renderStudio(lesson, { player: fakePlayer(7) });
    await screen.findByRole('button', { name: /Pin at/ });
    await user.keyboard('p7');
    expect(screen.getByText('Not pinned: 0:07.000 is past the end of the recording (0:05.000).')).toBeInTheDocument();
  });

  it('does not fire shortcuts while typing in a field', async () => {
    const lesson = buildStudioLesson(buildContent());
    mockDraftSaves(lesson);
    const { user } = renderStudio(lesson, { player: fakePlayer(3) });
    const title = await screen.findByRole('textbox', { name: 'Title' });
    await user.clear(title);
    await user.type(title, 'p1 and ?');
    expect(title).toHaveValue('p1 and ?');
    expect(screen.queryByRole('button', { name: /^Multiple choice, at/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('dialog', { name: 'Keyboard shortcuts' })).not.toBeInTheDocument();
  });

  it('lists every shortcut in the help sheet, opened with ?', async () => {
    const lesson = buildStudioLesson(buildContent());
    mockDraftSaves(lesson);
    const { user } = renderStudio(lesson);
    await screen.findByRole('button', { name: /Pin at/ });
    await user.keyboard('?');
    const sheet = screen.getByRole('dialog', { name: 'Keyboard shortcuts' });
    expect(within(sheet).getByText('Pin a numeric answer at the current frame')).toBeInTheDocument();
    expect(within(sheet).getByText('Move the selected checkpoint one frame later')).toBeInTheDocument();
    expect(within(sheet).getAllByRole('row')).toHaveLength(1 + 7 + 16);
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('dialog', { name: 'Keyboard shortcuts' })).not.toBeInTheDocument();
  });
});
