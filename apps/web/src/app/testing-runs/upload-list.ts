import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { FilePreview } from './file-preview';
import { ReductionProgress } from './reduction-progress';
import { fileSizeText } from '../shared/file-size-text';
import type { UploadItem, UploadPhase } from './upload-item';

const phaseLabels: Readonly<Record<UploadPhase, string>> = {
  checking: 'Checking…',
  checked: 'Checked',
  'check-failed': 'Could not be checked',
  uploading: 'Uploading…',
  stored: 'Stored',
  duplicate: 'Already uploaded',
  failed: 'Upload failed',
};

/** The picked files, each with its preview, its own upload progress bar, its final state and its reduction. */
@Component({
  selector: 'tw-upload-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule, FilePreview, ReductionProgress],
  template: `
    <ul class="files" aria-label="Picked files">
      @for (item of items(); track item.key) {
        <li class="file" [attr.data-phase]="item.phase">
          <div class="title">
            <mat-icon aria-hidden="true">description</mat-icon>
            <strong>{{ item.file.name }}</strong>
            <span class="size">{{ sizeText(item.file.size) }}</span>
            <span class="phase" role="status">{{ phaseLabels[item.phase] }}</span>
            @if (item.phase !== 'uploading' && item.phase !== 'stored') {
              <button mat-icon-button type="button" [attr.aria-label]="'Remove ' + item.file.name" (click)="remove.emit(item.key)">
                <mat-icon>close</mat-icon>
              </button>
            }
          </div>
          @if (item.phase === 'checking') {
            <mat-progress-bar mode="indeterminate" [attr.aria-label]="'Checking ' + item.file.name" />
          }
          @if (item.phase === 'uploading' || item.phase === 'stored') {
            <mat-progress-bar mode="determinate" [value]="item.progress * 100" [attr.aria-label]="'Upload of ' + item.file.name" />
          }
          @if (item.message) {
            <p class="message" [class.bad]="item.phase === 'failed' || item.phase === 'check-failed' || item.phase === 'duplicate'">{{ item.message }}</p>
          }
          @if (item.phase === 'duplicate' && item.existingRunId) {
            <a [routerLink]="['/runs', item.existingRunId]">Open the run that holds this file</a>
          }
          @if (item.preview && item.phase !== 'stored') {
            <tw-file-preview [preview]="item.preview" />
          }
          @if (item.reductionId) {
            <tw-reduction-progress [reductionId]="item.reductionId" />
          }
        </li>
      }
    </ul>
  `,
  styles: `
    .files {
      list-style: none;
      padding: 0;
      display: grid;
      gap: 16px;
    }
    .file {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: var(--mat-sys-corner-small);
      padding: 8px 16px;
      display: grid;
      gap: 8px;
    }
    .title {
      display: flex;
      align-items: center;
      gap: 8px;
      flex-wrap: wrap;
    }
    .phase {
      margin-left: auto;
    }
    .size {
      color: var(--mat-sys-on-surface-variant);
    }
    .message {
      margin: 0;
    }
    .bad {
      color: var(--mat-sys-error);
    }
  `,
})
export class UploadList {
  readonly items = input.required<readonly UploadItem[]>();
  /** Emitted with an item's key when the technician takes it off the list. */
  readonly remove = output<number>();

  protected readonly phaseLabels = phaseLabels;
  protected readonly sizeText = fileSizeText;
}
