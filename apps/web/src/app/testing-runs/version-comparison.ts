import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import type { ReductionView } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { IngestApi } from './ingest-api';

/** Two finished versions of a run side by side, in corrected drag counts, with the difference per point. */
@Component({
  selector: 'tw-version-comparison',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, FormsModule, MatButtonModule, MatFormFieldModule, MatProgressBarModule, MatSelectModule, MatTableModule, ErrorBanner],
  template: `
    @if (finished().length < 2) {
      <p>Two finished versions are needed for a comparison.</p>
    } @else {
      <div class="pickers">
        <mat-form-field>
          <mat-label>From version</mat-label>
          <mat-select [ngModel]="from()" (ngModelChange)="from.set($event)">
            @for (r of finished(); track r.id) {
              <mat-option [value]="r.version">v{{ r.version }}</mat-option>
            }
          </mat-select>
        </mat-form-field>
        <mat-form-field>
          <mat-label>To version</mat-label>
          <mat-select [ngModel]="to()" (ngModelChange)="to.set($event)">
            @for (r of finished(); track r.id) {
              <mat-option [value]="r.version">v{{ r.version }}</mat-option>
            }
          </mat-select>
        </mat-form-field>
      </div>
      @if (comparison.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Comparing versions" />
      }
      @if (comparison.error(); as error) {
        <tw-error-banner [message]="message(error)" (retry)="comparison.reload()" />
      } @else if (comparison.hasValue() && comparison.value(); as c) {
        <table mat-table [dataSource]="c.rows" [attr.aria-label]="'Version ' + c.from + ' against version ' + c.to">
          <ng-container matColumnDef="point">
            <th mat-header-cell *matHeaderCellDef>Point</th>
            <td mat-cell *matCellDef="let row">{{ row.pointNumber }}</td>
          </ng-container>
          <ng-container matColumnDef="yaw">
            <th mat-header-cell *matHeaderCellDef>Yaw (°)</th>
            <td mat-cell *matCellDef="let row">{{ row.yaw | number: '1.2-2' }}</td>
          </ng-container>
          <ng-container matColumnDef="from">
            <th mat-header-cell *matHeaderCellDef>v{{ c.from }} counts</th>
            <td mat-cell *matCellDef="let row">{{ row.fromDragCounts | number: '1.1-1' }}</td>
          </ng-container>
          <ng-container matColumnDef="to">
            <th mat-header-cell *matHeaderCellDef>v{{ c.to }} counts</th>
            <td mat-cell *matCellDef="let row">{{ row.toDragCounts | number: '1.1-1' }}</td>
          </ng-container>
          <ng-container matColumnDef="difference">
            <th mat-header-cell *matHeaderCellDef>Difference (counts)</th>
            <td mat-cell *matCellDef="let row">{{ signed(row.differenceDragCounts) }}</td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="columns"></tr>
          <tr mat-row *matRowDef="let row; columns: columns"></tr>
        </table>
        <p class="caution" role="note">{{ c.caution }}</p>
      }
    }
  `,
  styles: `
    .pickers {
      display: flex;
      gap: 16px;
    }
    .caution {
      font: var(--mat-sys-body-small);
    }
  `,
})
export class VersionComparison {
  readonly runId = input.required<string>();
  readonly reductions = input.required<readonly ReductionView[]>();

  private readonly api = inject(IngestApi);
  protected readonly finished = computed(() => this.reductions().filter((r) => r.state === 'done'));
  /** Chosen versions; until chosen, the two newest finished ones. */
  protected readonly from = linkedSignal<number | null>(() => this.finished()[1]?.version ?? null);
  protected readonly to = linkedSignal<number | null>(() => this.finished()[0]?.version ?? null);
  protected readonly comparison = rxResource({
    params: () => {
      const from = this.from();
      const to = this.to();
      return from !== null && to !== null && from !== to ? { runId: this.runId(), from, to } : undefined;
    },
    stream: ({ params }) => this.api.compare(params.runId, params.from, params.to),
  });
  protected readonly columns = ['point', 'yaw', 'from', 'to', 'difference'];
  protected readonly message = (error: unknown) => problemMessage(error, 'The versions could not be compared.');

  /** A difference with its sign always written, one decimal; a dash when a version lacks the point. */
  protected signed(value: number | null): string {
    if (value === null) return '—';
    const text = Math.abs(value).toFixed(1);
    return value > 0 ? `+${text}` : value < 0 ? `−${text}` : text;
  }
}
