import { ChangeDetectionStrategy, Component, ElementRef, input, output, signal, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { attachmentAccept, attachmentLimits } from './attachment-limits';
import { attachmentSizeText, type AttachmentUpload } from './attachment-upload';

/**
 * Drawings and photos for a booking request: a drop zone that is also a button (Enter or Space opens the file
 * dialog), and the chosen files, each with its own progress once sending starts.
 */
@Component({
  selector: 'tw-attachment-picker',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule],
  template: `
    <div
      class="zone"
      role="button"
      tabindex="0"
      [class.over]="over()"
      [class.disabled]="disabled()"
      [attr.aria-disabled]="disabled()"
      aria-label="Drop drawings or photos here, or press Enter to choose files"
      (keydown.enter)="open($event)"
      (keydown.space)="open($event)"
      (click)="open($event)"
      (dragover)="dragOver($event)"
      (dragleave)="over.set(false)"
      (drop)="drop($event)"
    >
      <mat-icon class="material-icons" aria-hidden="true">attach_file</mat-icon>
      <span>Drop drawings or photos here, or <u>choose files</u></span>
    </div>
    <p class="hint">Up to {{ limits.files }} files of at most {{ maxMegabytes }} MB each: PDF, PNG, JPEG, DWG or DXF.</p>
    <input #picker class="picker" type="file" multiple [accept]="accept" aria-label="Choose drawings or photos" (change)="picked(picker)" />
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
              @if (upload.phase === 'waiting' && !disabled()) {
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
    .zone {
      display: flex;
      align-items: center;
      justify-content: center;
      gap: 12px;
      min-height: 72px;
      border: 2px dashed var(--mat-sys-outline);
      border-radius: var(--mat-sys-corner-medium);
      cursor: pointer;
      padding: 12px;
    }
    .zone:focus-visible {
      outline: 3px solid var(--mat-sys-primary);
      outline-offset: 2px;
    }
    .zone.over {
      background: var(--mat-sys-secondary-container);
      border-color: var(--mat-sys-primary);
    }
    .zone.disabled {
      opacity: 0.5;
      cursor: not-allowed;
    }
    .picker {
      position: absolute;
      width: 1px;
      height: 1px;
      opacity: 0;
      pointer-events: none;
    }
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
  protected readonly over = signal(false);
  private readonly picker = viewChild.required<ElementRef<HTMLInputElement>>('picker');

  protected size(bytes: number): string {
    return attachmentSizeText(bytes);
  }

  protected open(event: Event): void {
    event.preventDefault();
    if (!this.disabled()) this.picker().nativeElement.click();
  }

  protected dragOver(event: DragEvent): void {
    event.preventDefault();
    this.over.set(!this.disabled());
  }

  protected drop(event: DragEvent): void {
    event.preventDefault();
    this.over.set(false);
    const dropped = Array.from(event.dataTransfer?.files ?? []);
    if (!this.disabled() && dropped.length > 0) this.added.emit(dropped);
  }

  protected picked(picker: HTMLInputElement): void {
    const chosen = Array.from(picker.files ?? []);
    // Cleared so the same file can be picked again after it was removed from the list.
    picker.value = '';
    if (chosen.length > 0) this.added.emit(chosen);
  }
}
