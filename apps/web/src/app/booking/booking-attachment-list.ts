import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { BookingAttachment } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { fileSizeText } from '../shared/file-size-text';
import { BookingApi } from './booking-api';

/** A booking's drawings, photos and documents, each downloaded through the signed-in session. */
@Component({
  selector: 'tw-booking-attachment-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule],
  template: `
    @for (attachment of attachments(); track attachment.id) {
      <div class="attachment">
        <span>{{ attachment.filename }} ({{ size(attachment.sizeBytes) }})</span>
        <button mat-icon-button type="button" [attr.aria-label]="'Download ' + attachment.filename" [disabled]="downloadingId() === attachment.id" (click)="download(attachment)">
          <mat-icon class="material-icons">download</mat-icon>
        </button>
      </div>
    } @empty {
      No documents yet; drawings sent with the request and result sheets appear here.
    }
    @if (downloadError(); as message) {
      <p class="error" role="alert">{{ message }}</p>
    }
  `,
  styles: `
    .attachment {
      display: flex;
      align-items: center;
      gap: 4px;
    }
    .error {
      color: var(--mat-sys-error);
      margin: 4px 0;
    }
  `,
})
export class BookingAttachmentList {
  private readonly api = inject(BookingApi);

  readonly bookingId = input.required<string>();
  readonly attachments = input.required<readonly BookingAttachment[]>();

  protected readonly downloadingId = signal<string | null>(null);
  protected readonly downloadError = signal<string | null>(null);

  protected size(bytes: number): string {
    return fileSizeText(bytes);
  }

  /** Fetches the file with the session's credentials and hands it to the browser as a download. */
  protected download(attachment: BookingAttachment): void {
    this.downloadError.set(null);
    this.downloadingId.set(attachment.id);
    this.api.attachment(this.bookingId(), attachment.id).subscribe({
      next: (blob) => {
        this.downloadingId.set(null);
        const url = URL.createObjectURL(blob);
        const link = document.createElement('a');
        link.href = url;
        link.download = attachment.filename;
        link.click();
        URL.revokeObjectURL(url);
      },
      error: (error: unknown) => {
        this.downloadingId.set(null);
        this.downloadError.set(problemMessage(error, `${attachment.filename} could not be downloaded. Try again.`));
      },
    });
  }
}
