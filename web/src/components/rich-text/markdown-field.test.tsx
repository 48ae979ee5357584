import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import type { LessonImageDto } from '@core/contracts';
import { server } from '@/testing/mocks/server';
import { MarkdownField } from './markdown-field';
import { RichText } from './rich-text';

const LESSON_ID = '0b5a7c1d-2e3f-4a5b-8c6d-7e8f9a0b1c2d';
const IMAGE_ID = '9c8b7a6d-5e4f-4a3b-9c2d-1e0f9a8b7c6d';

function Controlled({ initial = '', lessonId }: { initial?: string; lessonId?: string }) {
  const [value, setValue] = useState(initial);
  return (
    <MarkdownField
      label="Question"
      value={value}
      onChange={setValue}
      lessonId={lessonId}
      error={value.length > 20 ? 'Too long.' : undefined}
    />
  );
}

function setup(props: { initial?: string; lessonId?: string } = {}) {
  const user = userEvent.setup({ applyAccept: false });
  render(<Controlled {...props} />);
  return { user, textarea: screen.getByLabelText('Question') as HTMLTextAreaElement };
}

describe('MarkdownField', () => {
  it('is a labelled textarea whose error is its description', async () => {
    const { user, textarea } = setup();
    await user.type(textarea, 'A coil of twenty-one turns');
    expect(textarea).toHaveValue('A coil of twenty-one turns');
    expect(textarea).toHaveAccessibleDescription(expect.stringContaining('Too long.'));
  });

  it('previews the text as students see it, raw HTML as text', async () => {
    const { user } = setup({ initial: 'Field $B$ <b>bold?</b>' });
    await user.click(screen.getByRole('button', { name: 'Preview' }));
    const preview = screen.getByRole('region', { name: 'Preview' });
    expect(preview.querySelector('.katex')).not.toBeNull();
    expect(preview.querySelector('b')).toBeNull();
    expect(preview).toHaveTextContent('<b>bold?</b>');
    await user.click(screen.getByRole('button', { name: 'Hide preview' }));
    expect(screen.queryByRole('region', { name: 'Preview' })).toBeNull();
  });

  it('uploads an image as the raw body and inserts its Markdown at the cursor', async () => {
    const seen: { type: string | null; name: string | null; csrf: string | null; size: number }[] = [];
    server.use(
      http.post(`/api/lessons/${LESSON_ID}/images`, async ({ request }) => {
        const body = await request.arrayBuffer();
        seen.push({
          type: request.headers.get('content-type'),
          name: request.headers.get('x-file-name'),
          csrf: request.headers.get('x-csrf-token'),
          size: body.byteLength,
        });
        return HttpResponse.json<LessonImageDto>(
          {
            id: IMAGE_ID,
            url: `/api/lesson-images/${IMAGE_ID}`,
            markdown: `![coil.png](/api/lesson-images/${IMAGE_ID})`,
            contentType: 'image/png',
            size: body.byteLength,
          },
          { status: 201 },
        );
      }),
    );
    const { user, textarea } = setup({ initial: 'Before after', lessonId: LESSON_ID });
    textarea.setSelectionRange(7, 7);
    await user.upload(
      screen.getByLabelText('Image file for Question'),
      new File([new Uint8Array([137, 80, 78, 71, 1, 2])], 'coil.png', { type: 'image/png' }),
    );
    await waitFor(() => expect(textarea).toHaveValue(`Before \n![coil.png](/api/lesson-images/${IMAGE_ID})\nafter`));
    expect(seen).toEqual([{ type: 'image/png', name: 'coil.png', csrf: 'csrf-1', size: 6 }]);
  });

  it("shows the server's refusal under the field and keeps the text", async () => {
    server.use(
      http.post(`/api/lessons/${LESSON_ID}/images`, () =>
        HttpResponse.json({ error: { code: 'payload_too_large', message: 'An image may be at most 5 MiB.' } }, { status: 413 }),
      ),
    );
    const { user, textarea } = setup({ initial: 'Keep me', lessonId: LESSON_ID });
    await user.upload(screen.getByLabelText('Image file for Question'), new File(['x'], 'big.png', { type: 'image/png' }));
    expect(await screen.findByText('The image was not added: An image may be at most 5 MiB.')).toBeInTheDocument();
    expect(textarea).toHaveValue('Keep me');
    expect(textarea).toHaveAccessibleDescription(expect.stringContaining('An image may be at most 5 MiB.'));
  });

  it('refuses a file that is not an image before sending it', async () => {
    // No handler: a request would fail the test (onUnhandledRequest: 'error').
    const { user } = setup({ lessonId: LESSON_ID });
    await user.upload(screen.getByLabelText('Image file for Question'), new File(['<svg/>'], 'logo.svg', { type: 'image/svg+xml' }));
    expect(screen.getByText('“logo.svg” is not a PNG, JPEG, GIF or WebP image.')).toBeInTheDocument();
  });

  it('has no image button without a lesson', () => {
    setup();
    expect(screen.queryByRole('button', { name: 'Add image' })).toBeNull();
  });
});

describe('RichText', () => {
  it('renders Markdown with the given class and no script', () => {
    const { container } = render(<RichText markdown={'**Careful:** <script>alert(1)</script>'} className="text-sm" />);
    const root = container.firstElementChild as HTMLElement;
    expect(root).toHaveClass('rich-text', 'text-sm');
    expect(root.querySelector('strong')).toHaveTextContent('Careful:');
    expect(root.querySelector('script')).toBeNull();
  });
});
