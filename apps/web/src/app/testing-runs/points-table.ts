import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatChipsModule } from '@angular/material/chips';
import { MatTableModule } from '@angular/material/table';
import type { ReducedPoint } from './ingest-api';
import { expandedUncertainty } from './point-uncertainty';
import { warningText } from './run-labels';

/** One row of the points table: the point and the warnings the reduction raised about it. */
interface PointRow {
  readonly point: ReducedPoint;
  readonly cdUncertainty: number | null;
  readonly warnings: readonly { code: string; text: string }[];
}

/** The reduced points of one version: conditions, coefficients with U (k = 2), drag counts and warning chips. */
@Component({
  selector: 'tw-points-table',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, MatChipsModule, MatTableModule],
  template: `
    <div class="scroll">
      <table mat-table [dataSource]="rows()" aria-label="Reduced points">
        <ng-container matColumnDef="point">
          <th mat-header-cell *matHeaderCellDef>Point</th>
          <td mat-cell *matCellDef="let row">{{ row.point.pointNumber }}</td>
        </ng-container>
        <ng-container matColumnDef="yaw">
          <th mat-header-cell *matHeaderCellDef>Yaw (°)</th>
          <td mat-cell *matCellDef="let row">{{ row.point.yaw | number: '1.2-2' }}</td>
        </ng-container>
        <ng-container matColumnDef="q">
          <th mat-header-cell *matHeaderCellDef>q (Pa)</th>
          <td mat-cell *matCellDef="let row">{{ row.point.dynamicPressure | number: '1.1-1' }}</td>
        </ng-container>
        <ng-container matColumnDef="speed">
          <th mat-header-cell *matHeaderCellDef>V (m/s)</th>
          <td mat-cell *matCellDef="let row">{{ row.point.speed | number: '1.2-2' }}</td>
        </ng-container>
        <ng-container matColumnDef="cdUncorrected">
          <th mat-header-cell *matHeaderCellDef>C_D uncorr.</th>
          <td mat-cell *matCellDef="let row">{{ row.point.cdUncorrected | number: '1.4-4' }}</td>
        </ng-container>
        <ng-container matColumnDef="cdCorrected">
          <th mat-header-cell *matHeaderCellDef>C_D corr.</th>
          <td mat-cell *matCellDef="let row">{{ row.point.cdCorrected | number: '1.4-4' }}</td>
        </ng-container>
        <ng-container matColumnDef="cdUncertainty">
          <th mat-header-cell *matHeaderCellDef>U(C_D), k=2</th>
          <td mat-cell *matCellDef="let row">{{ row.cdUncertainty === null ? '—' : '±' + (row.cdUncertainty | number: '1.4-4') }}</td>
        </ng-container>
        <ng-container matColumnDef="cl">
          <th mat-header-cell *matHeaderCellDef>C_L corr.</th>
          <td mat-cell *matCellDef="let row">{{ row.point.clCorrected | number: '1.4-4' }}</td>
        </ng-container>
        <ng-container matColumnDef="cs">
          <th mat-header-cell *matHeaderCellDef>C_S corr.</th>
          <td mat-cell *matCellDef="let row">{{ row.point.csCorrected | number: '1.4-4' }}</td>
        </ng-container>
        <ng-container matColumnDef="dragCounts">
          <th mat-header-cell *matHeaderCellDef>Drag counts</th>
          <td mat-cell *matCellDef="let row">{{ row.point.dragCounts | number: '1.1-1' }}</td>
        </ng-container>
        <ng-container matColumnDef="warnings">
          <th mat-header-cell *matHeaderCellDef>Warnings</th>
          <td mat-cell *matCellDef="let row">
            @if (row.warnings.length > 0) {
              <mat-chip-set [attr.aria-label]="'Warnings of point ' + row.point.pointNumber">
                @for (warning of row.warnings; track $index) {
                  <mat-chip [title]="warning.text">{{ warning.code }}</mat-chip>
                }
              </mat-chip-set>
            }
          </td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns; sticky: true"></tr>
        <tr mat-row *matRowDef="let row; columns: columns"></tr>
        <tr class="mat-row" *matNoDataRow>
          <td class="mat-cell empty" [attr.colspan]="columns.length">No points in this version.</td>
        </tr>
      </table>
    </div>
  `,
  styles: `
    .scroll {
      overflow: auto;
      max-height: 480px;
    }
    table {
      width: 100%;
    }
    .empty {
      padding: 16px;
    }
  `,
})
export class PointsTable {
  readonly points = input.required<readonly ReducedPoint[]>();
  /** The reduction's warnings; those naming a point are shown on its row. */
  readonly warnings = input<readonly Readonly<Record<string, unknown>>[]>([]);

  protected readonly columns = ['point', 'yaw', 'q', 'speed', 'cdUncorrected', 'cdCorrected', 'cdUncertainty', 'cl', 'cs', 'dragCounts', 'warnings'];

  protected readonly rows = computed<PointRow[]>(() =>
    this.points().map((point) => ({
      point,
      cdUncertainty: expandedUncertainty(point, 'dragCoefficient'),
      warnings: this.warnings()
        .filter((warning) => warning['point'] === point.pointNumber)
        .map((warning) => ({ code: typeof warning['code'] === 'string' ? warning['code'] : 'WARNING', text: warningText(warning) })),
    })),
  );
}
