import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { ResultSheet } from '@tunnelwright/contracts';
import { Observable } from 'rxjs';
import { problemMessage } from '../core/problem-message';
import { ApprovalApi, saveFile, type DownloadedFile } from './approval-api';

/** The PDF and the points CSV of one issued sheet, fetched through the signed-in session. */
@Component({
  selector: 'tw-sheet-downloads',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule],
  template: `
    <span class="buttons">
      <button mat-stroked-button type="button" [disabled]="busy() !== null" [attr.aria-label]="'Download PDF of ' + sheet().reportNumber" (click)="download('pdf')">
        <mat-icon class="material-icons">picture_as_pdf</mat-icon> PDF
      </button>
      <button mat-stroked-button type="button" [disabled]="busy() !== null" [attr.aria-label]="'Download CSV of ' + sheet().reportNumber" (click)="download('csv')">
        <mat-icon class="material-icons">table_view</mat-icon> CSV
      </button>
    </span>
    @if (error(); as message) {
      <span class="error" role="alert">{{ message }}</span>
    }
  `,
  styles: `
    :host {
      display: inline-flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 8px;
    }
    .buttons {
      display: inline-flex;
      gap: 8px;
    }
    .error {
      color: var(--mat-sys-error);
    }
  `,
})
export class SheetDownloads {
  private readonly api = inject(ApprovalApi);

  readonly sheet = input.required<Pick<ResultSheet, 'id' | 'reportNumber'>>();

  protected readonly busy = signal<'pdf' | 'csv' | null>(null);
  protected readonly error = signal<string | null>(null);

  protected download(kind: 'pdf' | 'csv'): void {
    const sheet = this.sheet();
    const request: Observable<DownloadedFile> = kind === 'pdf' ? this.api.sheetPdf(sheet) : this.api.sheetCsv(sheet);
    this.busy.set(kind);
    this.error.set(null);
    request.subscribe({
      next: (file) => {
        this.busy.set(null);
        saveFile(file);
      },
      error: (error: unknown) => {
        this.busy.set(null);
        this.error.set(problemMessage(error, `The ${kind.toUpperCase()} of ${sheet.reportNumber} could not be downloaded. Try again.`));
      },
    });
  }
}
