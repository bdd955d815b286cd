import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { ReductionView } from '@tunnelwright/contracts';
import { switchMap, takeWhile, tap, timer } from 'rxjs';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { IngestApi } from './ingest-api';
import { reductionStateLabels } from './run-labels';

/** How often the reduction's state is asked for while it runs, ms. */
const POLL_EVERY_MS = 1000;

function finished(reduction: ReductionView): boolean {
  return reduction.state === 'done' || reduction.state === 'failed';
}

/** The live state of one reduction: polled until it is done or failed, with its progress and any error location. */
@Component({
  selector: 'tw-reduction-progress',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatProgressBarModule, ErrorBanner],
  template: `
    @if (reduction.error(); as error) {
      <tw-error-banner [message]="message(error)" (retry)="reduction.reload()" />
    } @else if (reduction.value(); as r) {
      <div class="reduction" role="status" [attr.aria-label]="'Reduction version ' + r.version">
        <span>Reduction v{{ r.version }}: {{ stateLabels[r.state] }}{{ r.state === 'running' ? ' ' + percent() + ' %' : '' }}{{ r.state === 'done' ? ', ' + r.pointCount + ' points' : '' }}</span>
        @if (!done()) {
          <mat-progress-bar [mode]="r.state === 'queued' ? 'query' : 'determinate'" [value]="percent()" [attr.aria-label]="'Reduction progress'" />
        }
        @if (r.error; as e) {
          <p class="error">{{ e.message }}@if (e.line !== null) { (line {{ e.line }}@if (e.column !== null) {, column {{ e.column }}})}</p>
        }
      </div>
    } @else {
      <mat-progress-bar mode="indeterminate" aria-label="Loading the reduction" />
    }
  `,
  styles: `
    .reduction {
      display: grid;
      gap: 4px;
    }
    .error {
      color: var(--mat-sys-error);
      margin: 0;
    }
  `,
})
export class ReductionProgress {
  readonly reductionId = input.required<string>();
  /** Emitted once with the reduction when it is done or failed. */
  readonly settled = output<ReductionView>();

  private readonly api = inject(IngestApi);
  protected readonly reduction = rxResource({
    params: () => this.reductionId(),
    stream: ({ params }) =>
      timer(0, POLL_EVERY_MS).pipe(
        switchMap(() => this.api.reduction(params)),
        takeWhile((reduction) => !finished(reduction), true),
        tap((reduction) => {
          if (finished(reduction)) this.settled.emit(reduction);
        }),
      ),
  });
  private readonly current = computed(() => (this.reduction.hasValue() ? this.reduction.value() : undefined));
  protected readonly percent = computed(() => Math.round((this.current()?.progress ?? 0) * 100));
  protected readonly done = computed(() => {
    const value = this.current();
    return value !== undefined && finished(value);
  });
  protected readonly stateLabels = reductionStateLabels;
  protected readonly message = (error: unknown) => problemMessage(error, 'The reduction state could not be loaded.');
}
