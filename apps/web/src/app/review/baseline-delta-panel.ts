import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, linkedSignal } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import type { ReviewRun } from '@tunnelwright/contracts';
import { baselineDeltas, YAW_MATCH_TOLERANCE } from './baseline-delta';
import { runLabel } from './chart-series';
import { keptChoice } from './kept-choice';
import { ReviewChart, type ChartLine } from './review-chart';

/** ΔC_D of each overlaid run against a chosen baseline run, in drag counts at matching yaw, as a chart and a table. */
@Component({
  selector: 'tw-baseline-delta-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, MatFormFieldModule, MatSelectModule, MatTableModule, ReviewChart],
  template: `
    <mat-form-field subscriptSizing="dynamic">
      <mat-label>Baseline run</mat-label>
      <mat-select [value]="baselineId()" (selectionChange)="baselineId.set($event.value)">
        @for (run of runs(); track run.id) {
          <mat-option [value]="run.id">{{ label(run) }}</mat-option>
        }
      </mat-select>
    </mat-form-field>
    <p class="hint">1 drag count = 0.0001 in C_D. Points are matched when their yaws differ by at most {{ tolerance }}°; excluded points take no part.</p>
    <tw-review-chart [lines]="lines()" caption="ΔC_D against the baseline" xTitle="Yaw (°)" yTitle="ΔC_D (counts)" />
    <div class="scroll">
      <table mat-table [dataSource]="rows()" aria-label="Drag difference from the baseline">
        <ng-container matColumnDef="run">
          <th mat-header-cell *matHeaderCellDef>Run</th>
          <td mat-cell *matCellDef="let row">{{ row.runLabel }}</td>
        </ng-container>
        <ng-container matColumnDef="point">
          <th mat-header-cell *matHeaderCellDef>Point</th>
          <td mat-cell *matCellDef="let row">{{ row.pointNumber }}</td>
        </ng-container>
        <ng-container matColumnDef="yaw">
          <th mat-header-cell *matHeaderCellDef>Yaw (°)</th>
          <td mat-cell *matCellDef="let row">{{ row.yaw | number: '1.2-2' }}</td>
        </ng-container>
        <ng-container matColumnDef="cd">
          <th mat-header-cell *matHeaderCellDef>C_D</th>
          <td mat-cell *matCellDef="let row">{{ row.dragCoefficient | number: '1.4-4' }}</td>
        </ng-container>
        <ng-container matColumnDef="baseline">
          <th mat-header-cell *matHeaderCellDef>Baseline C_D</th>
          <td mat-cell *matCellDef="let row">{{ row.baselineDragCoefficient === null ? '—' : (row.baselineDragCoefficient | number: '1.4-4') }}</td>
        </ng-container>
        <ng-container matColumnDef="delta">
          <th mat-header-cell *matHeaderCellDef>ΔC_D (counts)</th>
          <td mat-cell *matCellDef="let row">{{ row.deltaCounts === null ? 'No baseline point at this yaw' : (row.deltaCounts | number: '1.1-1') }}</td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns; sticky: true"></tr>
        <tr mat-row *matRowDef="let row; columns: columns"></tr>
        <tr class="mat-row" *matNoDataRow>
          <td class="mat-cell empty" [attr.colspan]="columns.length">Tick a second run to compare it with the baseline.</td>
        </tr>
      </table>
    </div>
  `,
  styles: `
    .hint {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .scroll {
      max-height: 360px;
      overflow: auto;
      margin-top: 12px;
    }
    table {
      width: 100%;
    }
    td,
    th {
      white-space: nowrap;
    }
    .empty {
      padding: 16px;
    }
  `,
})
export class BaselineDeltaPanel {
  /** The overlaid runs; the baseline is chosen among them. */
  readonly runs = input.required<readonly ReviewRun[]>();

  protected readonly tolerance = YAW_MATCH_TOLERANCE;
  protected readonly columns = ['run', 'point', 'yaw', 'cd', 'baseline', 'delta'];
  protected readonly label = runLabel;
  /** The baseline: kept while it is still overlaid, else the first run. */
  protected readonly baselineId = linkedSignal<readonly ReviewRun[], string | null>({
    source: this.runs,
    computation: (runs, previous) => keptChoice(runs, previous, () => runs[0]?.id ?? null),
  });
  private readonly baseline = computed(() => this.runs().find((r) => r.id === this.baselineId()) ?? null);
  protected readonly rows = computed(() => {
    const baseline = this.baseline();
    return baseline ? baselineDeltas(baseline, this.runs()) : [];
  });
  protected readonly lines = computed<ChartLine[]>(() => {
    const byRun = new Map<string, ChartLine>();
    for (const row of this.rows()) {
      if (row.deltaCounts === null) continue;
      const line = byRun.get(row.runId) ?? { label: row.runLabel, points: [], kind: 'measured' as const };
      byRun.set(row.runId, { ...line, points: [...line.points, { x: row.yaw, y: row.deltaCounts }] });
    }
    return [...byRun.values()];
  });
}
