import type { OpenUploadDto, UploadDto } from '@core/contracts';
import { partSizeFor, S3_MIN_PART_BYTES } from '@core/recordings';
import { abortUpload, createUpload, resumeUpload } from '../api/upload-requests';
import { fileFacts } from './file-facts';
import { initialRate, nextRate, rebaseRate, type RateState } from './transfer-rate';
import { describeUploadProblem, type UploadProblem } from './upload-problems';
import { createTransport, type MultipartState, type TransportFile, type TransportUppy } from './uppy-transport';

export type UploadRowStatus = 'preparing' | 'uploading' | 'paused' | 'finishing' | 'done' | 'error';

/** One file in the upload queue, as its row shows it. */
export type UploadRow = {
  id: string;
  name: string;
  size: number;
  status: UploadRowStatus;
  bytesSent: number;
  rate: RateState;
  problem: UploadProblem | null;
  uploadId: string | null;
  recordingId: string | null;
  /** Continued from an unfinished upload (the file was chosen again). */
  resumed: boolean;
};

export type UploadEvent = 'started' | 'finished' | 'removed';

export type UploadManagerOptions = {
  /** Called when the server's lists change: an upload was created, finished, failed or was cancelled. */
  onEvent?: (event: UploadEvent) => void;
  limit?: number;
  retryDelays?: number[];
  now?: () => number;
  /** Builds the Uppy instance (tests wrap it to send Uppy's own events). */
  transport?: typeof createTransport;
};

type Entry = {
  row: UploadRow;
  file: File;
  upload: (MultipartState & { partSize: number }) | null;
  cancelled: boolean;
  completing: boolean;
};

const ACTIVE: UploadRowStatus[] = ['preparing', 'uploading', 'paused', 'finishing'];

/** The API chose another part size than this page expects: continue as a resumed upload with the API's. */
class PartSizeChanged extends Error {}

function sameFile(a: File, b: File): boolean {
  return a.name === b.name && a.size === b.size && a.lastModified === b.lastModified && a.type === b.type;
}

/**
 * The upload queue of the Recordings page: several files at once, pause and resume, retry, cancel, and
 * continuing an unfinished upload with a file chosen again. Rows live here; Uppy only holds the files
 * that are being sent (a file that failed leaves Uppy, so starting other files never re-sends it).
 */
export class UploadManager {
  private readonly entries = new Map<string, Entry>();
  private readonly listeners = new Set<() => void>();
  private readonly partSizes = new WeakMap<Blob, number>();
  private readonly uppy: TransportUppy;
  private readonly now: () => number;
  private snapshot: UploadRow[] = [];
  // Leaving the page stops the transfers (they can be continued later from the unfinished list): ask first.
  private readonly warnOnLeave = (event: BeforeUnloadEvent) => {
    if (this.hasActiveUploads()) event.preventDefault();
  };

  constructor(private readonly options: UploadManagerOptions = {}) {
    this.now = options.now ?? (() => performance.now());
    this.uppy = (options.transport ?? createTransport)({
      limit: options.limit ?? 4,
      retryDelays: options.retryDelays ?? [0, 1000, 3000, 5000, 10_000],
      createUpload: (file) => this.createOnServer(file),
      partSizeOf: (data) => this.partSizes.get(data),
      onPartsListed: (file, storedBytes) => this.patch(file.id, { bytesSent: storedBytes }),
      onCompleting: (file) => {
        const entry = this.entries.get(file.id);
        if (entry) entry.completing = true;
        this.patch(file.id, { status: 'finishing' });
      },
      onCompleted: (file, recordingId) => this.patch(file.id, { recordingId }),
    });
    this.uppy.on('upload-progress', (file, progress) => file && this.onProgress(file.id, progress.bytesUploaded));
    this.uppy.on('upload-success', (file) => file && this.onSuccess(file.id));
    this.uppy.on('upload-error', (file, error) => file && this.onError(file.id, error));
    this.uppy.on('upload-pause', (file, isPaused) => {
      const entry = file && this.entries.get(file.id);
      if (entry) this.patch(entry.row.id, { status: isPaused ? 'paused' : 'uploading', rate: rebaseRate(entry.row.rate) });
    });
    window.addEventListener('beforeunload', this.warnOnLeave);
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getRows = (): UploadRow[] => this.snapshot;

  hasActiveUploads(): boolean {
    return this.snapshot.some((row) => ACTIVE.includes(row.status));
  }

  /** Queues files and starts sending them; returns a sentence for each file that was already in the queue. */
  addFiles(files: File[]): string[] {
    const notices: string[] = [];
    for (const file of files) {
      const existing = [...this.entries.values()].find((entry) => sameFile(entry.file, file));
      if (existing?.row.status === 'error' && existing.row.problem?.retryable) {
        existing.file = file;
        this.retry(existing.row.id);
        continue;
      }
      if (existing && existing.row.status !== 'done' && existing.row.status !== 'error') {
        notices.push(`“${file.name}” is already in the upload list.`);
        continue;
      }
      if (existing) this.entries.delete(existing.row.id);
      try {
        this.enqueue(file, null);
      } catch (error) {
        notices.push(`“${file.name}” could not be added: ${error instanceof Error ? error.message : 'unknown reason'}.`);
      }
    }
    this.publish();
    this.start();
    return notices;
  }

  /**
   * Continues an unfinished upload with the file chosen again: the API checks it is the same file (409
   * file_mismatch otherwise, thrown to the caller); then only the parts storage lacks are sent.
   */
  async resumeWith(open: OpenUploadDto, file: File): Promise<void> {
    if ([...this.entries.values()].some((entry) => entry.row.uploadId === open.id && entry.row.status !== 'done')) {
      throw new Error(`“${open.fileName}” is already in the upload list.`);
    }
    const { type: _type, ...facts } = await fileFacts(file);
    const dto = await resumeUpload(open.id, facts);
    this.enqueue(file, dto);
    this.publish();
    this.options.onEvent?.('started');
    this.start();
  }

  pause(id: string): void {
    if (this.entries.get(id)?.row.status === 'uploading') this.uppy.pauseResume(id);
  }

  resume(id: string): void {
    if (this.entries.get(id)?.row.status === 'paused') this.uppy.pauseResume(id);
  }

  /** Sends a failed file again; with an upload already on the server, only its missing parts. */
  retry(id: string): void {
    const entry = this.entries.get(id);
    if (!entry || entry.row.status !== 'error') return;
    entry.completing = false;
    this.removeFromUppy(id);
    this.addToUppy(entry);
    this.patch(id, { status: entry.upload ? 'uploading' : 'preparing', problem: null, rate: rebaseRate(entry.row.rate) });
    this.start();
  }

  /** Stops sending and deletes what was stored (the upload and its `uploading` recording). */
  async cancel(id: string): Promise<void> {
    const entry = this.entries.get(id);
    if (!entry) return;
    entry.cancelled = true;
    this.removeFromUppy(id);
    this.entries.delete(id);
    this.publish();
    // Without an upload id yet, createOnServer sees `cancelled` when the API answers and deletes it then.
    // If this DELETE fails, the upload shows under "Unfinished uploads" (refetched below) with its own Discard.
    if (entry.upload) await abortUpload(entry.upload.uploadId).catch(() => undefined);
    this.options.onEvent?.('removed');
  }

  /** Takes a finished or refused file off the list. */
  dismiss(id: string): void {
    const entry = this.entries.get(id);
    if (!entry || ACTIVE.includes(entry.row.status)) return;
    this.removeFromUppy(id);
    this.entries.delete(id);
    this.publish();
  }

  destroy(): void {
    window.removeEventListener('beforeunload', this.warnOnLeave);
    this.uppy.destroy();
    this.entries.clear();
    this.listeners.clear();
  }

  // ---- internals --------------------------------------------------------------------------

  private enqueue(file: File, dto: UploadDto | null): void {
    const upload = dto ? { uploadId: dto.id, key: dto.key, partSize: dto.partSize } : null;
    const entry: Entry = {
      file,
      upload,
      cancelled: false,
      completing: false,
      row: {
        id: '',
        name: file.name,
        size: file.size,
        status: dto ? 'uploading' : 'preparing',
        bytesSent: 0,
        rate: initialRate,
        problem: null,
        uploadId: dto?.id ?? null,
        recordingId: dto?.recordingId ?? null,
        resumed: dto !== null,
      },
    };
    entry.row.id = this.addToUppy(entry);
    this.entries.set(entry.row.id, entry);
  }

  private addToUppy(entry: Entry): string {
    const id = this.uppy.addFile({ name: entry.file.name, type: entry.file.type, data: entry.file, source: 'Local' });
    if (entry.upload) {
      this.partSizes.set(entry.file, entry.upload.partSize);
      const resumeState: Partial<TransportFile> & { s3Multipart: MultipartState } = {
        s3Multipart: { uploadId: entry.upload.uploadId, key: entry.upload.key },
      };
      this.uppy.setFileState(id, resumeState);
    }
    return id;
  }

  private removeFromUppy(id: string): void {
    if (this.uppy.getFile(id)) this.uppy.removeFile(id);
  }

  private start(): void {
    // Failures reach the rows through 'upload-error'; the promise's own rejection adds nothing.
    this.uppy.upload().catch(() => undefined);
  }

  private async createOnServer(file: TransportFile): Promise<MultipartState> {
    const entry = this.entries.get(file.id);
    if (!entry) throw new Error('This file is no longer in the upload list.');
    const dto = await createUpload(await fileFacts(entry.file));
    if (entry.cancelled) {
      await abortUpload(dto.id).catch(() => undefined);
      throw new Error('The upload was cancelled.');
    }
    entry.upload = { uploadId: dto.id, key: dto.key, partSize: dto.partSize };
    this.patch(entry.row.id, { uploadId: dto.id, recordingId: dto.recordingId, status: 'uploading' });
    this.options.onEvent?.('started');
    if (this.uppy.getState().files[file.id] && this.partSizeDiffers(entry, dto)) throw new PartSizeChanged();
    return { uploadId: dto.id, key: dto.key };
  }

  private partSizeDiffers(entry: Entry, dto: UploadDto): boolean {
    // Uppy cut the file before the API answered, with the part size this page computes the same way.
    const used = this.partSizes.get(entry.file) ?? partSizeFor(entry.file.size);
    if (dto.partCount === 1 && entry.file.size <= Math.max(used, S3_MIN_PART_BYTES)) return false;
    return used !== dto.partSize;
  }

  private onProgress(id: string, bytesUploaded: number): void {
    const entry = this.entries.get(id);
    if (!entry || entry.row.status === 'done' || entry.row.status === 'error') return;
    const status = entry.row.status === 'paused' ? 'paused' : bytesUploaded >= entry.row.size ? 'finishing' : 'uploading';
    this.patch(id, { bytesSent: bytesUploaded, status, rate: nextRate(entry.row.rate, bytesUploaded, this.now()) });
  }

  private onSuccess(id: string): void {
    const entry = this.entries.get(id);
    if (!entry) return;
    this.patch(id, { status: 'done', bytesSent: entry.row.size, problem: null });
    // Out of Uppy once sent, so the same file can be chosen again later as a new recording.
    queueMicrotask(() => this.removeFromUppy(id));
    this.options.onEvent?.('finished');
  }

  private onError(id: string, error: unknown): void {
    const entry = this.entries.get(id);
    if (!entry || entry.cancelled) return;
    queueMicrotask(() => this.removeFromUppy(id));
    if (error instanceof PartSizeChanged) {
      this.patch(id, { status: 'error', problem: { kind: 'failed', message: '', retryable: true } });
      queueMicrotask(() => this.retry(id));
      return;
    }
    const problem = describeUploadProblem(error);
    // A refusal at completion means the API already marked the recording failed and deleted the object.
    const retryable = problem.retryable && !(entry.completing && problem.kind === 'refused');
    this.patch(id, { status: 'error', problem: { ...problem, retryable } });
    this.options.onEvent?.('finished');
  }

  private patch(id: string, change: Partial<UploadRow>): void {
    const entry = this.entries.get(id);
    if (!entry) return;
    entry.row = { ...entry.row, ...change };
    this.publish();
  }

  private publish(): void {
    this.snapshot = [...this.entries.values()].map((entry) => entry.row);
    for (const listener of this.listeners) listener();
  }
}
