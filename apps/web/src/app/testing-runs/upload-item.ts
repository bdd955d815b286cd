import type { Preview } from '@tunnelwright/contracts';

/** Where one picked file is on its way from the technician's disk to a reduced run. */
export type UploadPhase = 'checking' | 'checked' | 'check-failed' | 'uploading' | 'stored' | 'duplicate' | 'failed';

/** One picked file, its preview and its upload. Replaced, never mutated, as it moves on. */
export interface UploadItem {
  /** Stable key for the list. */
  readonly key: number;
  readonly file: File;
  readonly phase: UploadPhase;
  /** What the reader understood of the file, once checked. */
  readonly preview: Preview | null;
  /** Share of the bytes sent, 0–1. */
  readonly progress: number;
  /** Why a check or an upload failed, or what a duplicate matches. */
  readonly message: string;
  /** The queued reduction of a stored file (none for runs that are not reduced). */
  readonly reductionId: string | null;
  /** For a duplicate: the run that already holds this exact file. */
  readonly existingRunId: string | null;
}

/** Whether the file may be sent: checked, and the reader found no issue. */
export function isReadyToUpload(item: UploadItem): boolean {
  return item.phase === 'checked' && item.preview?.valid === true;
}
