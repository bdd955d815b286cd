import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { FileDropZone } from '../shared/file-drop-zone';
import { attachmentAccept, attachmentLimits } from './attachment-limits';
import { fileSizeText } from '../shared/file-size-text';
import type { AttachmentUpload } from './attachment-upload';

/**
 * Drawings and photos for a booking request: the shared drop zone, and the chosen files, each with its own
 * progress once sending starts.
 */
@Component({
  selector: 'tw-attachment-picker',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, FileDropZone],
  template: `
    <tw-file-drop-zone what="drawings or photos" icon="attach_file" [accept]="accept" [disabled]="disabled()" (files)="added.emit($event)" />
    <p class="hint">Up to {{ limits.files }} files of at most {{ maxMegabytes }} MB each: PDF, PNG, JPEG, DWG or DXF.</p>
    @if (refusals().length) {
      <ul class="refusals" role="alert">
        @for (refusal of refusals(); track $index) {
          <li>{{ refusal }}</li>
        }
      </ul>
    }
    @if (uploads().length) {
      <ul class="files" aria-label="Chosen files">
        @for (upload of uploads(); track upload.key) {
          <li>
            <div class="file">
              <span class="name">{{ upload.file.name }}</span>
              <span class="size">{{ size(upload.file.size) }}</span>
              @switch (upload.phase) {
                @case ('stored') {
                  <span class="state">Attached</span>
                }
                @case ('failed') {
                  <span class="state failed">{{ upload.message }}</span>
                }
              }
              @if ((upload.phase === 'waiting' || upload.phase === 'failed') && !disabled()) {
                <button mat-icon-button type="button" [attr.aria-label]="'Remove ' + upload.file.name" (click)="removed.emit(upload.key)">
                  <mat-icon class="material-icons">close</mat-icon>
                </button>
              }
            </div>
            @if (upload.phase === 'uploading' || upload.phase === 'stored') {
              <mat-progress-bar mode="determinate" [value]="upload.progress * 100" [attr.aria-label]="'Sending ' + upload.file.name" />
            }
          </li>
        }
      </ul>
    }
  `,
  styles: `
    .hint {
      color: var(--mat-sys-on-surface-variant);
      margin: 4px 0;
    }
    .refusals,
    .failed {
      color: var(--mat-sys-error);
    }
    .files {
      list-style: none;
      padding: 0;
    }
    .file {
      display: flex;
      align-items: center;
      gap: 12px;
      min-height: 40px;
    }
    .name {
      flex: 1 1 auto;
      overflow-wrap: anywhere;
    }
    .size,
    .state {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class AttachmentPicker {
  /** The files chosen so far, with their upload state. */
  readonly uploads = input.required<readonly AttachmentUpload[]>();
  /** Why files just chosen were left out. */
  readonly refusals = input<readonly string[]>([]);
  /** Whether files may not be added or removed now (the request is being sent). */
  readonly disabled = input(false);
  /** Emitted with the files dropped or picked, before any limit is checked. */
  readonly added = output<File[]>();
  /** Emitted with the key of a file taken off the list. */
  readonly removed = output<number>();

  protected readonly limits = attachmentLimits;
  protected readonly maxMegabytes = attachmentLimits.fileSize / 1024 / 1024;
  protected readonly accept = attachmentAccept;

  protected size(bytes: number): string {
    return fileSizeText(bytes);
  }
}
