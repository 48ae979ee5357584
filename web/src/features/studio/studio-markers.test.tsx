import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { buildContent, buildStudioLesson, fakePlayer, mockDraftSaves, renderStudio } from './studio.test-support';

function twoCheckpoints() {
  const first = { ...newCheckpoint('sign', 4000), label: 'Which way' };
  const second = { ...newCheckpoint('equation', 9000), label: 'Field on the axis' };
  return { first, second, lesson: buildStudioLesson(buildContent({ checkpoints: [first, second] })) };
}

afterEach(() => vi.restoreAllMocks());

describe('studio: markers', { timeout: 40_000 }, () => {
  it('moves focus between markers with arrow keys, selects with Enter and nudges by a frame and a second', async () => {
    // Undo steps coalesce by the clock: a fixed clock makes the burst one step however slowly the machine types.
    vi.spyOn(Date, 'now').mockReturnValue(Date.parse('2026-01-05T14:01:00.000Z'));
    const { lesson } = twoCheckpoints();
    const saves = mockDraftSaves(lesson);
    const { user } = renderStudio(lesson, { player: fakePlayer(0) });
    const first = await screen.findByRole('button', { name: 'Check your sign: Which way, at 0:04.000' });
    const second = screen.getByRole('button', { name: 'Equation card: Field on the axis, at 0:09.000' });
    // One Tab stop for all markers.
    expect(first).toHaveAttribute('tabindex', '0');
    expect(second).toHaveAttribute('tabindex', '-1');

    first.focus();
    await user.keyboard('{ArrowRight}');
    expect(second).toHaveFocus();
    await user.keyboard('{ArrowLeft}');
    expect(first).toHaveFocus();
    await user.keyboard('{End}{Enter}');
    expect(second).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByRole('heading', { name: 'Field on the axis' })).toBeInTheDocument();

    await user.keyboard('..'); // two frames at 25 fps
    expect(screen.getByRole('button', { name: 'Equation card: Field on the axis, at 0:09.080' })).toHaveFocus();
    await user.keyboard('{Shift>}<{/Shift}'); // one second back
    expect(screen.getByRole('button', { name: 'Equation card: Field on the axis, at 0:08.080' })).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: /^Time/ })).toHaveValue('0:08.080');

    // A burst of nudges to one checkpoint is one undo step.
    await user.keyboard('{Control>}z{/Control}');
    expect(screen.getByRole('button', { name: 'Equation card: Field on the axis, at 0:09.000' })).toBeInTheDocument();
    await user.keyboard('{Control>}{Shift>}z{/Shift}{/Control}');
    expect(screen.getByRole('button', { name: 'Equation card: Field on the axis, at 0:08.080' })).toBeInTheDocument();
    await waitFor(() => expect(saves.at(-1)?.content.checkpoints[0]?.atMs).toBe(4000));
    expect(saves.at(-1)?.content.checkpoints[1]?.atMs).toBe(8080);
  });

  it('refuses a nudge or a typed time that collides, saying why', async () => {
    const { lesson } = twoCheckpoints();
    mockDraftSaves(lesson);
    const { user } = renderStudio(lesson);
    await user.click(await screen.findByRole('button', { name: /^Check your sign/ }));
    const time = screen.getByRole('textbox', { name: /^Time/ });
    await user.clear(time);
    await user.type(time, '0:08.8{Enter}');
    expect(screen.getByText(/Not moved: 0:08.800 is only 0.2 s from “Field on the axis” at 0:09.000/)).toBeInTheDocument();
    await user.clear(time);
    await user.type(time, '1:75{Enter}');
    expect(screen.getByText('Seconds after the minutes must be below 60.')).toBeInTheDocument();
    await user.clear(time);
    await user.type(time, '0:06.5{Enter}'); // between frames at 25 fps: the nearest frame is 6.520
    expect(screen.getByRole('button', { name: 'Check your sign: Which way, at 0:06.520' })).toBeInTheDocument();
  });

  it('drags a marker to a new frame, showing the time while dragging', async () => {
    const { lesson } = twoCheckpoints();
    mockDraftSaves(lesson);
    renderStudio(lesson);
    const marker = await screen.findByRole('button', { name: /^Check your sign/ });
    // jsdom lays nothing out: the timeline is the 800 px fallback wide for 60 s, 75 ms per pixel.
    fireEvent.pointerDown(marker, { button: 0, pointerId: 1, clientX: 100 });
    fireEvent.pointerMove(marker, { pointerId: 1, clientX: 140 });
    expect(screen.getByText('0:07.000')).toBeInTheDocument();
    fireEvent.pointerUp(marker, { pointerId: 1, clientX: 140 });
    expect(screen.getByRole('button', { name: 'Check your sign: Which way, at 0:07.000' })).toBeInTheDocument();
    // Dropping it onto the other marker is refused.
    fireEvent.pointerDown(screen.getByRole('button', { name: /^Check your sign/ }), { button: 0, pointerId: 2, clientX: 100 });
    fireEvent.pointerMove(screen.getByRole('button', { name: /^Check your sign/ }), { pointerId: 2, clientX: 126 });
    fireEvent.pointerUp(screen.getByRole('button', { name: /^Check your sign/ }), { pointerId: 2, clientX: 126 });
    expect(screen.getByText(/Not moved: 0:08.960 is only 0.04 s from “Field on the axis”/)).toBeInTheDocument();
  });

  it('deletes the selected checkpoint with the key and brings it back with Undo', async () => {
    const { lesson } = twoCheckpoints();
    mockDraftSaves(lesson);
    const { user } = renderStudio(lesson);
    await user.click(await screen.findByRole('button', { name: /^Check your sign/ }));
    await user.keyboard('{Delete}');
    expect(screen.queryByRole('button', { name: /^Check your sign/ })).not.toBeInTheDocument();
    expect(screen.getByText('Deleted “Which way” at 0:04.000.')).toBeInTheDocument();
    await user.click(within(screen.getByText(/^Deleted/)).getByRole('button', { name: 'Undo' }));
    expect(screen.getByRole('button', { name: /^Check your sign/ })).toBeInTheDocument();
  });

  it('duplicates a checkpoint at the next free moment with a new key', async () => {
    const { lesson, second } = twoCheckpoints();
    const saves = mockDraftSaves(lesson);
    const { user } = renderStudio(lesson);
    await user.click(await screen.findByRole('button', { name: /^Equation card/ }));
    await user.click(screen.getByRole('button', { name: 'Duplicate' }));
    expect(screen.getByRole('button', { name: 'Equation card: Field on the axis, at 0:09.520' })).toHaveAttribute('aria-pressed', 'true');
    await waitFor(() => expect(saves.at(-1)?.content.checkpoints).toHaveLength(3));
    const keys = saves.at(-1)!.content.checkpoints.map((c) => c.key);
    expect(new Set(keys).size).toBe(3);
    expect(keys).toContain(second.key);
  });
});
