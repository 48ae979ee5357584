import { useId, useRef, useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';
import { UploadIcon } from '@/components/ui/icons';
import { Textarea } from '@/components/ui/input';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { RichText } from './rich-text';
import { imageFileProblem, LESSON_IMAGE_TYPES, uploadLessonImage } from './upload-lesson-image';

export type MarkdownFieldProps = {
  label: ReactNode;
  value: string;
  onChange: (next: string) => void;
  onBlur?: () => void;
  error?: string;
  hint?: ReactNode;
  /** With a lesson, "Add image" uploads to it and inserts the image's Markdown at the cursor. */
  lessonId?: string;
  /** One- or two-line texts (options, hints, feedback). */
  small?: boolean;
  /** Shows a character count as the text nears this length. */
  maxLength?: number;
  className?: string;
};

const FORMAT_HINT = 'Markdown: **bold**, *italic*, [text](https://…) links, $…$ for math.';

/** A Markdown textarea with a live preview (rendered exactly as students see it) and image upload. */
export function MarkdownField({
  label,
  value,
  onChange,
  onBlur,
  error,
  hint,
  lessonId,
  small = false,
  maxLength,
  className,
}: MarkdownFieldProps) {
  const id = useId();
  const textareaRef = useRef<HTMLTextAreaElement>(null);
  const fileRef = useRef<HTMLInputElement>(null);
  const [preview, setPreview] = useState(false);
  const [uploading, setUploading] = useState(false);
  const [uploadError, setUploadError] = useState<string | null>(null);
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const uploadErrorId = `${id}-upload-error`;
  const describedBy = [hintId, error ? errorId : null, uploadError ? uploadErrorId : null].filter(Boolean).join(' ');
  const nearLimit = maxLength !== undefined && value.length > maxLength * 0.8;

  function insertAtCursor(snippet: string) {
    const textarea = textareaRef.current;
    const start = textarea?.selectionStart ?? value.length;
    const end = textarea?.selectionEnd ?? value.length;
    const before = value.slice(0, start);
    // An image reads best on a line of its own.
    const lead = before === '' || before.endsWith('\n') ? '' : '\n';
    const inserted = `${lead}${snippet}\n`;
    onChange(before + inserted + value.slice(end));
    const caret = start + inserted.length;
    requestAnimationFrame(() => {
      textarea?.focus();
      textarea?.setSelectionRange(caret, caret);
    });
  }

  async function upload(file: File | undefined) {
    if (!file || !lessonId) return;
    setUploadError(null);
    const problem = imageFileProblem(file);
    if (problem) {
      setUploadError(problem);
      return;
    }
    setUploading(true);
    try {
      const image = await uploadLessonImage(lessonId, file);
      insertAtCursor(image.markdown);
    } catch (failure) {
      const message = isApiError(failure) ? failure.message : 'The image could not be uploaded.';
      setUploadError(`The image was not added: ${message}`);
    } finally {
      setUploading(false);
      if (fileRef.current) fileRef.current.value = '';
    }
  }

  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <div className="flex flex-wrap items-end justify-between gap-2">
        <label htmlFor={id} className="font-bold">
          {label}
        </label>
        <div className="flex gap-2">
          {lessonId ? (
            <>
              <input
                ref={fileRef}
                type="file"
                accept={LESSON_IMAGE_TYPES.join(',')}
                className="sr-only"
                tabIndex={-1}
                aria-label={`Image file for ${typeof label === 'string' ? label : 'this text'}`}
                onChange={(event) => void upload(event.target.files?.[0])}
              />
              <Button variant="ghost" size="sm" busy={uploading} onClick={() => fileRef.current?.click()}>
                <UploadIcon className="size-4" />
                {uploading ? 'Uploading…' : 'Add image'}
              </Button>
            </>
          ) : null}
          <Button variant="ghost" size="sm" aria-pressed={preview} aria-controls={`${id}-preview`} onClick={() => setPreview(!preview)}>
            {preview ? 'Hide preview' : 'Preview'}
          </Button>
        </div>
      </div>
      <p id={hintId} className="text-sm text-ink-muted">
        {hint ? <>{hint} </> : null}
        {small ? null : FORMAT_HINT}
      </p>
      <div className={cn('grid gap-2', preview && !small ? 'md:grid-cols-2' : '')}>
        <Textarea
          ref={textareaRef}
          id={id}
          value={value}
          rows={small ? 2 : 5}
          invalid={Boolean(error)}
          aria-describedby={describedBy}
          onChange={(event) => onChange(event.target.value)}
          onBlur={onBlur}
        />
        {preview ? (
          <section
            id={`${id}-preview`}
            aria-label="Preview"
            className="min-h-11 rounded-md border border-dashed border-line-strong bg-paper px-3 py-2"
          >
            {value.trim() === '' ? <p className="text-sm text-ink-muted">Nothing to preview yet.</p> : <RichText markdown={value} />}
          </section>
        ) : null}
      </div>
      {nearLimit ? (
        <p className={cn('text-sm', value.length > maxLength ? 'font-bold text-danger' : 'text-ink-muted')}>
          {value.length} of {maxLength} characters
        </p>
      ) : null}
      <FieldError id={errorId} message={error} />
      <FieldError id={uploadErrorId} message={uploadError ?? undefined} />
    </div>
  );
}
