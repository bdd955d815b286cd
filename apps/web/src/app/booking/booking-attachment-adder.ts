import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { BookingAttachment } from '@tunnelwright/contracts';
import { ErrorBanner } from '../shared/error-banner';
import { AttachmentPicker } from './attachment-picker';
import { AttachmentQueue, type AttachmentQueueHandlers } from './attachment-queue';
import type { AttachmentUploadPhase } from './attachment-upload';
import { BookingApi } from './booking-api';

/**
 * Adds drawings or photos to a booking that already exists: the shared drop zone behind a button, each file sent at
 * once with its own progress, a failed file retried alone or taken off the list.
 */
@Component({
  selector: 'tw-booking-attachment-adder',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule, ErrorBanner, AttachmentPicker],
  template: `
    @if (open()) {
      <div class="adder" role="group" [attr.aria-label]="'Add files to the booking of ' + tunnelName()">
        <tw-attachment-picker [uploads]="queue.uploads()" [refusals]="queue.refusals()" (added)="add($event)" (removed)="queue.remove($event)" />
        <p class="status" role="status">{{ status() }}</p>
        @if (failureText(); as message) {
          <tw-error-banner [message]="message" (retry)="send(['failed'])" />
        }
        <button mat-button type="button" [disabled]="queue.busy()" (click)="close()">Done adding files</button>
      </div>
    } @else {
      <button mat-button type="button" (click)="open.set(true)">
        <mat-icon class="material-icons">attach_file</mat-icon>
        Add drawings or photos
      </button>
    }
  `,
  styles: `
    .adder {
      margin-top: 8px;
    }
    .status {
      color: var(--mat-sys-on-surface-variant);
      margin: 4px 0;
    }
    .status:empty {
      display: none;
    }
  `,
})
export class BookingAttachmentAdder {
  private readonly api = inject(BookingApi);

  readonly bookingId = input.required<string>();
  /** Names the booking in the group's label. */
  readonly tunnelName = input('');
  /** Emitted with the attachments of each file once the API has stored it. */
  readonly attached = output<BookingAttachment[]>();

  protected readonly queue = new AttachmentQueue(this.api);
  protected readonly open = signal(false);
  /** The latest file stored, announced to screen readers. */
  protected readonly status = signal('');
  protected readonly failureText = computed(() => {
    const failed = this.queue.failed();
    if (this.queue.busy() || failed === 0) return null;
    return `${failed === 1 ? 'One file' : `${failed} files`} could not be attached.`;
  });

  /** Checks the chosen files against the limits and sends those the API will take. */
  protected add(files: File[]): void {
    this.queue.add(files);
    this.send(['waiting']);
  }

  /** Sends the files in `phases`: new ones as they are chosen, failed ones when the user asks to try again. */
  protected send(phases: readonly AttachmentUploadPhase[]): void {
    const handlers: AttachmentQueueHandlers = {
      stored: (attachments) => {
        this.status.set(`Attached ${attachments.map((attachment) => attachment.filename).join(', ')}.`);
        this.attached.emit(attachments);
      },
      // Stored files now show in the booking's documents, so the list keeps only what still needs attention.
      allStored: () => this.queue.clearStored(),
    };
    this.queue.send(this.bookingId(), handlers, phases);
  }

  protected close(): void {
    this.queue.clearStored();
    this.open.set(false);
  }
}
