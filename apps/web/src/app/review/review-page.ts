import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import type { ReviewPoint, ReviewRun } from '@tunnelwright/contracts';
import { filter, switchMap } from 'rxjs';
import { AuthService } from '../core/auth-service';
import { problemMessage } from '../core/problem-message';
import { SafetyNotice } from '../core/safety-notice';
import { ConfirmDialog, type ConfirmDialogData } from '../shared/confirm-dialog';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { openReasonDialog } from '../shared/reason-dialog';
import { BaselineDeltaPanel } from './baseline-delta-panel';
import { runLabel, runSeries, type ReviewAxis, type ReviewCoefficient } from './chart-series';
import { FullScalePanel } from './full-scale-panel';
import { keptChoice } from './kept-choice';
import { ReviewApi } from './review-api';
import { ReviewChart, type ChartLine } from './review-chart';
import { ReviewPointsTable } from './review-points-table';
import { RunPicker, type VersionChoice } from './run-picker';
import { SphereCalibrationPanel } from './sphere-calibration-panel';

/** One chart of the coefficient grid. */
interface CoefficientChart {
  readonly caption: string;
  readonly yTitle: string;
  readonly xTitle: string;
  readonly xLog: boolean;
  readonly joined: boolean;
  readonly lines: ChartLine[];
}

const charts: readonly { coefficient: ReviewCoefficient; axis: ReviewAxis; caption: string; yTitle: string; xTitle: string }[] = [
  { coefficient: 'dragCoefficient', axis: 'yaw', caption: 'Drag coefficient against yaw', yTitle: 'C_D', xTitle: 'Yaw (°)' },
  { coefficient: 'liftCoefficient', axis: 'yaw', caption: 'Lift coefficient against yaw', yTitle: 'C_L', xTitle: 'Yaw (°)' },
  { coefficient: 'sideForceCoefficient', axis: 'yaw', caption: 'Side-force coefficient against yaw', yTitle: 'C_Y', xTitle: 'Yaw (°)' },
  { coefficient: 'dragCoefficient', axis: 'reynoldsNumber', caption: 'Drag coefficient against Reynolds number', yTitle: 'C_D', xTitle: 'Reynolds number' },
  { coefficient: 'dragCoefficient', axis: 'speed', caption: 'Drag coefficient against speed', yTitle: 'C_D', xTitle: 'Speed (m/s)' },
];

/**
 * The analyst's review of a test: runs overlaid on coefficient charts with error bars from U (k = 2), drag
 * differences against a baseline run, sphere calibrations against published curves, the points with their warnings
 * and exclusions, and a full-scale summary. Re-reduction and version comparison stay on the run page.
 */
@Component({
  selector: 'tw-review-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterLink,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
    BaselineDeltaPanel,
    EmptyState,
    ErrorBanner,
    FullScalePanel,
    ReviewChart,
    ReviewPointsTable,
    RunPicker,
    SafetyNotice,
    SphereCalibrationPanel,
  ],
  templateUrl: './review-page.html',
  styleUrl: './review-page.scss',
})
export class ReviewPage {
  /** Route parameter: the test's id. */
  readonly id = input.required<string>();

  private readonly api = inject(ReviewApi);
  private readonly dialog = inject(MatDialog);
  private readonly role = inject(AuthService).role;

  /** Whether the caller may exclude and restore points (the API allows analysts only). */
  protected readonly canExclude = computed(() => this.role() === 'analyst');
  /** Versions the analyst picked, by run; other runs show their newest finished version. */
  private readonly chosenVersions = signal<Readonly<Record<string, string>>>({});
  protected readonly review = rxResource({
    params: () => ({ id: this.id(), reductionIds: Object.values(this.chosenVersions()) }),
    stream: ({ params }) => this.api.testReview(params.id, params.reductionIds),
  });
  protected readonly runs = computed(() => (this.review.hasValue() ? this.review.value().runs : []));
  protected readonly reducedRuns = computed(() => this.runs().filter((run) => run.selected !== null));

  /** Runs overlaid on the charts: every reduced data run at first, then as the analyst ticks them. */
  protected readonly shown = linkedSignal<readonly ReviewRun[], ReadonlySet<string>>({
    source: this.reducedRuns,
    computation: (runs, previous) => {
      // Keep the ticks through a reload; the first time runs arrive, tick every data run (or every run if none).
      if (previous && (previous.source.length > 0 || runs.length === 0)) return previous.value;
      const data = runs.filter((r) => r.kind !== 'sphere_calibration');
      return new Set((data.length > 0 ? data : runs).map((r) => r.id));
    },
  });
  protected readonly overlaid = computed(() => this.reducedRuns().filter((run) => this.shown().has(run.id)));
  protected readonly coefficientCharts = computed<CoefficientChart[]>(() =>
    charts.map((chart) => ({
      caption: chart.caption,
      yTitle: chart.yTitle,
      xTitle: chart.xTitle,
      xLog: chart.axis === 'reynoldsNumber',
      // A yaw sweep joins up in yaw order; against Re or speed the points are shown unjoined.
      joined: chart.axis === 'yaw',
      lines: runSeries(this.overlaid(), chart.coefficient, chart.axis).map((series) => ({ label: series.label, points: series.points, kind: 'measured' as const })),
    })),
  );
  protected readonly sphereRuns = computed(() => this.reducedRuns().filter((run) => run.kind === 'sphere_calibration' && run.selected?.sphere));
  /** The run whose points the table lists. */
  protected readonly tableRunId = linkedSignal<readonly ReviewRun[], string | null>({
    source: this.reducedRuns,
    computation: (runs, previous) => keptChoice(runs, previous, () => runs[0]?.id ?? null),
  });
  protected readonly tableRun = computed(() => this.reducedRuns().find((run) => run.id === this.tableRunId()) ?? null);
  protected readonly actionError = signal<string | null>(null);
  protected readonly label = runLabel;
  protected readonly message = (error: unknown) => problemMessage(error, 'The review could not be loaded.');

  protected toggle(runId: string): void {
    const next = new Set(this.shown());
    if (!next.delete(runId)) next.add(runId);
    this.shown.set(next);
  }

  protected chooseVersion(choice: VersionChoice): void {
    this.chosenVersions.update((chosen) => ({ ...chosen, [choice.runId]: choice.reductionId }));
  }

  protected exclude(run: ReviewRun, point: ReviewPoint): void {
    const selected = run.selected;
    if (!selected) return;
    this.actionError.set(null);
    openReasonDialog(this.dialog, {
      title: `Exclude point ${point.pointNumber} of run ${run.runNumber}?`,
      message: 'The point stays listed, marked with your reason, and is left out of charts, comparisons and the result. You can restore it until the results are approved.',
      missingReason: 'Say why the point is left out',
      cancelLabel: 'Cancel',
      confirmLabel: 'Exclude point',
      send: (reason) => this.api.exclude(selected.reductionId, point.index, reason),
      failure: 'The point could not be excluded.',
    }).subscribe((exclusion) => {
      if (exclusion) this.review.reload();
    });
  }

  protected restore(run: ReviewRun, point: ReviewPoint): void {
    const selected = run.selected;
    if (!selected) return;
    const data: ConfirmDialogData = {
      title: `Restore point ${point.pointNumber}?`,
      message: `Point ${point.pointNumber} of run ${run.runNumber} goes back into the charts, comparisons and the result. The reason given for leaving it out stays in the audit trail.`,
      confirmLabel: 'Restore',
    };
    this.actionError.set(null);
    this.dialog
      .open(ConfirmDialog, { data })
      .afterClosed()
      .pipe(
        filter((confirmed) => confirmed === true),
        switchMap(() => this.api.restore(selected.reductionId, point.index)),
      )
      .subscribe({
        next: () => this.review.reload(),
        error: (error: unknown) => this.actionError.set(problemMessage(error, 'The point could not be restored.')),
      });
  }
}
