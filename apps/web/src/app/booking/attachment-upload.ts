/** Where one chosen file is: waiting for the request, being sent, stored, or failed. */
export type AttachmentUploadPhase = 'waiting' | 'uploading' | 'stored' | 'failed';

/** One file chosen for a booking request; replaced, never mutated, as it moves on. */
export interface AttachmentUpload {
  /** Stable key for the list. */
  readonly key: number;
  readonly file: File;
  readonly phase: AttachmentUploadPhase;
  /** Share of the bytes sent, 0–1. */
  readonly progress: number;
  /** Why the upload failed. */
  readonly message: string;
}
