import type { Page } from 'playwright-core';

export interface LoadedBody {
  url: string;
  method: string;
  status: number;
  contentType: string;
  text: string;
}

/**
 * Keeps the body of every response the page receives from now on (HTML, scripts, styles, JSON,
 * WebVTT…), for scanning. Video, audio, image and font bytes are left out: they carry no text a
 * lesson could leak into, and the video is fetched in many ranges.
 */
export function recordBodies(page: Page): { bodies: LoadedBody[]; settle(): Promise<void> } {
  const bodies: LoadedBody[] = [];
  const pending: Promise<void>[] = [];
  page.on('response', (response) => {
    const contentType = response.headers()['content-type'] ?? '';
    if (/^(video|audio|image|font)\//.test(contentType)) return;
    pending.push(
      response.body().then(
        (buffer) => {
          bodies.push({
            url: response.url(),
            method: response.request().method(),
            status: response.status(),
            contentType,
            text: buffer.toString('utf8'),
          });
        },
        // Redirects and aborted requests have no body to read.
        () => undefined,
      ),
    );
  });
  return {
    bodies,
    async settle() {
      // Responses may still arrive while earlier bodies are read.
      for (let seen = -1; seen !== pending.length;) {
        seen = pending.length;
        await Promise.all(pending);
      }
    },
  };
}
