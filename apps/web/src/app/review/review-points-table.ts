import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatIconModule } from '@angular/material/icon';
import { MatTableModule } from '@angular/material/table';
import type { ReviewPoint, ReviewRun } from '@tunnelwright/contracts';
import { coefficientText, reynoldsText } from './summary-format';

/**
 * The points of one run's shown version: conditions, C_D, C_L, C_Y with U (k = 2), drag counts, warning chips and,
 * for an excluded point, the reason (row struck through and dimmed). An analyst may exclude or restore points until
 * the version is approved; then exclusions are read-only.
 */
@Component({
  selector: 'tw-review-points-table',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, MatButtonModule, MatChipsModule, MatIconModule, MatTableModule],
  template: `
    @if (frozen()) {
      <p class="frozen" role="note"><mat-icon class="material-icons" aria-hidden="true">lock</mat-icon> This version is approved: its points and exclusions can no longer change.</p>
    }
    <div class="scroll">
      <table mat-table [dataSource]="points()" [attr.aria-label]="'Points of run ' + run().runNumber">
        <ng-container matColumnDef="point">
          <th mat-header-cell *matHeaderCellDef>Point</th>
          <td mat-cell *matCellDef="let p">{{ p.pointNumber }}</td>
        </ng-container>
        <ng-container matColumnDef="yaw">
          <th mat-header-cell *matHeaderCellDef>Yaw (°)</th>
          <td mat-cell *matCellDef="let p">{{ p.yaw | number: '1.2-2' }}</td>
        </ng-container>
        <ng-container matColumnDef="speed">
          <th mat-header-cell *matHeaderCellDef>V (m/s)</th>
          <td mat-cell *matCellDef="let p">{{ p.speed | number: '1.2-2' }}</td>
        </ng-container>
        <ng-container matColumnDef="re">
          <th mat-header-cell *matHeaderCellDef>Re</th>
          <td mat-cell *matCellDef="let p">{{ reynolds(p.reynoldsNumber) }}</td>
        </ng-container>
        <ng-container matColumnDef="cd">
          <th mat-header-cell *matHeaderCellDef>C_D ± U</th>
          <td mat-cell *matCellDef="let p">{{ coefficient(p.dragCoefficient) }}</td>
        </ng-container>
        <ng-container matColumnDef="cl">
          <th mat-header-cell *matHeaderCellDef>C_L ± U</th>
          <td mat-cell *matCellDef="let p">{{ coefficient(p.liftCoefficient) }}</td>
        </ng-container>
        <ng-container matColumnDef="cy">
          <th mat-header-cell *matHeaderCellDef>C_Y ± U</th>
          <td mat-cell *matCellDef="let p">{{ coefficient(p.sideForceCoefficient) }}</td>
        </ng-container>
        <ng-container matColumnDef="counts">
          <th mat-header-cell *matHeaderCellDef>Drag counts</th>
          <td mat-cell *matCellDef="let p">{{ p.dragCounts | number: '1.1-1' }}</td>
        </ng-container>
        <ng-container matColumnDef="notes">
          <th mat-header-cell *matHeaderCellDef>Warnings and exclusion</th>
          <td mat-cell *matCellDef="let p">
            @if (p.warnings.length > 0 || p.exclusion) {
              <mat-chip-set [attr.aria-label]="'Notes on point ' + p.pointNumber">
                @for (warning of p.warnings; track $index) {
                  <mat-chip class="warning" [title]="warning.message">{{ warning.code }}</mat-chip>
                }
                @if (p.exclusion; as exclusion) {
                  <mat-chip class="excluded" [title]="'Excluded by ' + exclusion.excludedBy.name">Excluded: {{ exclusion.reason }}</mat-chip>
                }
              </mat-chip-set>
            }
          </td>
        </ng-container>
        <ng-container matColumnDef="actions">
          <th mat-header-cell *matHeaderCellDef><span class="visually-hidden">Actions</span></th>
          <td mat-cell *matCellDef="let p">
            @if (p.exclusion) {
              <button mat-button type="button" (click)="restore.emit(p)" [attr.aria-label]="'Restore point ' + p.pointNumber">Restore</button>
            } @else {
              <button mat-button type="button" (click)="exclude.emit(p)" [attr.aria-label]="'Exclude point ' + p.pointNumber">Exclude…</button>
            }
          </td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns(); sticky: true"></tr>
        <tr mat-row *matRowDef="let p; columns: columns()" [class.excluded-row]="p.exclusion !== null"></tr>
        <tr class="mat-row" *matNoDataRow>
          <td class="mat-cell empty" [attr.colspan]="columns().length">No points in this version.</td>
        </tr>
      </table>
    </div>
  `,
  styles: `
    .scroll {
      max-height: 480px;
      overflow: auto;
    }
    table {
      width: 100%;
    }
    td,
    th {
      white-space: nowrap;
    }
    .mat-column-notes {
      white-space: normal;
      min-width: 200px;
    }
    .excluded-row :is(.mat-column-point, .mat-column-yaw, .mat-column-speed, .mat-column-re, .mat-column-cd, .mat-column-cl, .mat-column-cy, .mat-column-counts) {
      text-decoration: line-through;
      opacity: 0.55;
    }
    .excluded {
      --mat-chip-elevated-container-color: var(--mat-sys-surface-variant);
    }
    .warning {
      --mat-chip-elevated-container-color: var(--mat-sys-tertiary-container);
    }
    .frozen {
      display: flex;
      align-items: center;
      gap: 8px;
    }
    .empty {
      padding: 16px;
    }
    .visually-hidden {
      position: absolute;
      width: 1px;
      height: 1px;
      overflow: hidden;
      clip: rect(0 0 0 0);
    }
  `,
})
export class ReviewPointsTable {
  readonly run = input.required<ReviewRun>();
  /** Whether the caller may exclude and restore points (analysts). */
  readonly canExclude = input(false);
  readonly exclude = output<ReviewPoint>();
  readonly restore = output<ReviewPoint>();

  protected readonly points = computed(() => this.run().selected?.points ?? []);
  protected readonly frozen = computed(() => this.run().selected?.frozen ?? false);
  protected readonly columns = computed(() => {
    const base = ['point', 'yaw', 'speed', 're', 'cd', 'cl', 'cy', 'counts', 'notes'];
    return this.canExclude() && !this.frozen() ? [...base, 'actions'] : base;
  });
  protected readonly coefficient = coefficientText;
  protected readonly reynolds = reynoldsText;
}
