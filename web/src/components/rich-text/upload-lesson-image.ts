import { ApiErrorBodySchema, CsrfDtoSchema, LessonImageDtoSchema, type LessonImageDto } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { api, ApiError } from '@/lib/api-client';

export const LESSON_IMAGE_TYPES = ['image/png', 'image/jpeg', 'image/gif', 'image/webp'] as const;

/** What is wrong with a file before it is sent, or null when it may be uploaded. */
export function imageFileProblem(file: File): string | null {
  if (!(LESSON_IMAGE_TYPES as readonly string[]).includes(file.type)) {
    return `“${file.name}” is not a PNG, JPEG, GIF or WebP image.`;
  }
  if (file.size > LIMITS.lessonImageBytesMax) {
    return `“${file.name}” is ${(file.size / 1024 / 1024).toFixed(1)} MiB; an image may be at most ${LIMITS.lessonImageBytesMax / 1024 / 1024} MiB.`;
  }
  if (file.size === 0) return `“${file.name}” is empty.`;
  return null;
}

async function send(lessonId: string, file: File, body: ArrayBuffer, token: string): Promise<Response> {
  try {
    return await fetch(`/api/lessons/${encodeURIComponent(lessonId)}/images`, {
      method: 'POST',
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        'Content-Type': file.type,
        // Header values are ASCII: the API decodes the percent-encoded name.
        'X-File-Name': encodeURIComponent(file.name),
        'X-CSRF-Token': token,
      },
      body,
    });
  } catch {
    throw new ApiError(0, 'network_error', 'Pinfield could not reach its server. Check your network connection and try again.');
  }
}

async function toError(response: Response): Promise<ApiError> {
  const parsed = ApiErrorBodySchema.safeParse(await response.json().catch(() => null));
  if (parsed.success)
    return new ApiError(response.status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.details ?? []);
  return new ApiError(response.status, 'unexpected_response', `The server answered with status ${response.status} and no explanation.`);
}

/**
 * Sends an image file as the raw request body (the API sniffs its type) and returns the stored image
 * with Markdown ready to insert. The JSON client cannot send raw bodies, so this asks for the CSRF
 * token the same way and retries once when it was stale.
 */
export async function uploadLessonImage(lessonId: string, file: File): Promise<LessonImageDto> {
  // At most 5 MiB, read once: the bytes are sent again as they are if the token needs refreshing.
  const body = await file.arrayBuffer();
  let { csrfToken } = await api.get('/api/auth/csrf', CsrfDtoSchema);
  let response = await send(lessonId, file, body, csrfToken);
  if (response.status === 403) {
    const error = await toError(response);
    if (error.code !== 'csrf_invalid') throw error;
    ({ csrfToken } = await api.get('/api/auth/csrf', CsrfDtoSchema));
    response = await send(lessonId, file, body, csrfToken);
  }
  if (!response.ok) throw await toError(response);
  const parsed = LessonImageDtoSchema.safeParse(await response.json().catch(() => null));
  if (!parsed.success) throw new ApiError(response.status, 'unexpected_response', 'The server sent a reply Pinfield could not read.');
  return parsed.data;
}
