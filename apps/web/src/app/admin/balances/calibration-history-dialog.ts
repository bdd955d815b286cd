import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTableModule } from '@angular/material/table';
import type { Balance } from '@tunnelwright/contracts';
import { problemMessage } from '../../core/problem-message';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { BalancesApi } from './balances-api';
import { CalibrationStateChip } from './calibration-state-chip';
import { loadComponents } from './calibration-matrix';

/** Every calibration version of one balance, newest first, with who entered it and each version's matrix. */
@Component({
  selector: 'tw-calibration-history-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatDialogModule, MatButtonModule, MatProgressBarModule, MatTableModule, EmptyState, ErrorBanner, CalibrationStateChip],
  template: `
    <h2 mat-dialog-title>Calibrations of {{ balance.identifier }}</h2>
    <mat-dialog-content>
      @if (versions.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading calibrations" />
      }
      @if (loadError(); as message) {
        <tw-error-banner [message]="message" (retry)="versions.reload()" />
      } @else if (versions.hasValue()) {
        @if (versions.value().length === 0) {
          <tw-empty-state icon="tune" title="No calibration recorded" hint="Runs of tests on this balance cannot be reduced until one is recorded." />
        } @else {
          <table mat-table [dataSource]="versions.value()" aria-label="Calibration versions">
            <ng-container matColumnDef="version">
              <th mat-header-cell *matHeaderCellDef>Version</th>
              <td mat-cell *matCellDef="let version">v{{ version.version }}</td>
            </ng-container>
            <ng-container matColumnDef="calibratedOn">
              <th mat-header-cell *matHeaderCellDef>Calibrated on</th>
              <td mat-cell *matCellDef="let version">{{ version.calibratedOn | date: 'mediumDate' }}</td>
            </ng-container>
            <ng-container matColumnDef="dueOn">
              <th mat-header-cell *matHeaderCellDef>Due on</th>
              <td mat-cell *matCellDef="let version">{{ version.dueOn | date: 'mediumDate' }}</td>
            </ng-container>
            <ng-container matColumnDef="state">
              <th mat-header-cell *matHeaderCellDef>State</th>
              <td mat-cell *matCellDef="let version; let first = first">
                @if (first) {
                  <tw-calibration-state-chip [calibration]="version" />
                } @else {
                  Superseded
                }
              </td>
            </ng-container>
            <ng-container matColumnDef="entered">
              <th mat-header-cell *matHeaderCellDef>Entered</th>
              <td mat-cell *matCellDef="let version">{{ version.createdAt | date: 'medium' }} by {{ version.enteredByName || 'a former user' }}</td>
            </ng-container>
            <ng-container matColumnDef="matrix">
              <th mat-header-cell *matHeaderCellDef>Matrices</th>
              <td mat-cell *matCellDef="let version">
                <details>
                  <summary>Linear{{ version.matrices.interaction ? ' and interaction' : '' }}</summary>
                  <table class="matrix" [attr.aria-label]="'Linear matrix of version ' + version.version">
                    <tr>
                      <th></th>
                      @for (component of components; track component) {
                        <th scope="col">{{ component }}</th>
                      }
                    </tr>
                    @for (row of version.matrices.linear; track $index) {
                      <tr>
                        <th scope="row">{{ $index + 1 }}</th>
                        @for (value of row; track $index) {
                          <td>{{ value }}</td>
                        }
                      </tr>
                    }
                  </table>
                  @if (version.matrices.interaction) {
                    <p class="tw-muted">Interaction matrix: 6 × 21 terms on record.</p>
                  }
                </details>
              </td>
            </ng-container>
            <tr mat-header-row *matHeaderRowDef="columns"></tr>
            <tr mat-row *matRowDef="let row; columns: columns"></tr>
          </table>
        }
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Close</button>
    </mat-dialog-actions>
  `,
  styles: `
    table[mat-table] {
      width: 100%;
    }
    .matrix {
      border-collapse: collapse;
      font: var(--mat-sys-body-small);
      font-variant-numeric: tabular-nums;
    }
    .matrix td,
    .matrix th {
      padding: 2px 6px;
      text-align: right;
    }
  `,
})
export class CalibrationHistoryDialog {
  private readonly api = inject(BalancesApi);
  protected readonly balance = inject<Balance>(MAT_DIALOG_DATA);
  protected readonly components = loadComponents;
  protected readonly columns = ['version', 'calibratedOn', 'dueOn', 'state', 'entered', 'matrix'];
  protected readonly versions = rxResource({ stream: () => this.api.calibrations(this.balance.id) });
  protected readonly loadError = computed(() => {
    const error = this.versions.error();
    return error ? problemMessage(error.cause ?? error, 'The calibrations could not be loaded.') : null;
  });
}
