import { computed, signal } from '@angular/core';
import type { BookingAttachment } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { chooseAttachments } from './attachment-limits';
import type { AttachmentUpload, AttachmentUploadPhase } from './attachment-upload';
import type { BookingApi } from './booking-api';

/** What the owner of a queue hears as files are sent. */
export interface AttachmentQueueHandlers {
  /** One file was stored; the attachments the API answered with. */
  readonly stored?: (attachments: BookingAttachment[]) => void;
  /** Every file on the list is stored (called at once when nothing was pending). */
  readonly allStored?: () => void;
}

/**
 * Files chosen for a booking and their uploads: checked against the API's limits when chosen, then sent one
 * call per file so each has its own progress, and only the failed ones sent again on retry. Used by the
 * request form (files go once the request exists) and by a booking's card (files go at once).
 */
export class AttachmentQueue {
  /** The chosen files, with their upload state. */
  readonly uploads = signal<AttachmentUpload[]>([]);
  /** Why files just chosen were left out. */
  readonly refusals = signal<string[]>([]);
  /** Whether a file is being sent. */
  readonly busy = computed(() => this.uploads().some((upload) => upload.phase === 'uploading'));
  /** How many files failed and wait for a retry. */
  readonly failed = computed(() => this.uploads().filter((upload) => upload.phase === 'failed').length);
  private nextKey = 0;

  constructor(private readonly api: BookingApi) {}

  /** Puts the files the API will take on the list, waiting; at most the per-upload limit that are not yet stored. */
  add(files: readonly File[]): void {
    const notStored = this.uploads().filter((upload) => upload.phase !== 'stored').length;
    const choice = chooseAttachments(files, notStored);
    this.refusals.set(choice.refusals);
    this.uploads.update((uploads) => [...uploads, ...choice.accepted.map((file): AttachmentUpload => ({ key: this.nextKey++, file, phase: 'waiting', progress: 0, message: '' }))]);
  }

  /** Takes a file off the list. */
  remove(key: number): void {
    this.refusals.set([]);
    this.uploads.update((uploads) => uploads.filter((upload) => upload.key !== key));
  }

  /** Drops the files already stored, so the list shows only what is still to send. */
  clearStored(): void {
    this.uploads.update((uploads) => uploads.filter((upload) => upload.phase !== 'stored'));
  }

  /** Sends the files in `phases` (by default every waiting or failed one) to booking `bookingId`, each in its own call. */
  send(bookingId: string, handlers: AttachmentQueueHandlers = {}, phases: readonly AttachmentUploadPhase[] = ['waiting', 'failed']): void {
    const pending = this.uploads().filter((upload) => phases.includes(upload.phase));
    if (pending.length === 0) {
      handlers.allStored?.();
      return;
    }
    for (const upload of pending) {
      this.patch(upload.key, { phase: 'uploading', progress: 0, message: '' });
      this.api.attach(bookingId, upload.file).subscribe({
        next: (event) => {
          if (event.kind === 'progress') {
            this.patch(upload.key, { progress: event.fraction });
          } else {
            this.patch(upload.key, { phase: 'stored', progress: 1 });
            handlers.stored?.(event.attachments);
          }
        },
        error: (error: unknown) => this.patch(upload.key, { phase: 'failed', message: problemMessage(error, 'Not attached.') }),
        complete: () => {
          if (this.uploads().every((item) => item.phase === 'stored')) handlers.allStored?.();
        },
      });
    }
  }

  private patch(key: number, change: Partial<AttachmentUpload>): void {
    this.uploads.update((uploads) => uploads.map((upload) => (upload.key === key ? { ...upload, ...change } : upload)));
  }
}
