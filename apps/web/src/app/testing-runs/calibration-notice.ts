import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { TestCalibrationState } from '@tunnelwright/contracts';
import { openReasonDialog } from '../shared/reason-dialog';
import { TestDetailApi } from './test-detail-api';

/**
 * Staff's warning that a test's balance calibration is past due, so uploads are refused; for lab managers the way to
 * allow it with a reason; and, once allowed, who did so, when and why.
 */
@Component({
  selector: 'tw-calibration-notice',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatButtonModule, MatIconModule],
  template: `
    @if (overdue(); as state) {
      <section class="notice" [class.allowed]="!!state.override" aria-labelledby="calibration-notice-title">
        <mat-icon class="material-icons" aria-hidden="true">{{ state.override ? 'verified_user' : 'warning' }}</mat-icon>
        <div class="body">
          <h2 id="calibration-notice-title">{{ state.override ? 'Overdue calibration allowed for this test' : 'Balance calibration overdue' }}</h2>
          <p>
            Calibration version {{ state.calibration.version }} of balance {{ state.balanceIdentifier }} was due on
            {{ state.calibration.dueOn | date: 'mediumDate' }}.
            @if (!state.override) {
              Uploads of run files for this test are refused until the balance is recalibrated or a lab manager allows the overdue calibration.
            }
          </p>
          @if (state.override; as override) {
            <p class="override">
              {{ override.grantedByName || 'A lab manager' }} allowed it on {{ override.createdAt | date: 'medium' }}: “{{ override.reason }}”. Runs are
              reduced with this version, and certified sheets list it as a deviation with this reason.
            </p>
          } @else if (isLabManager()) {
            <button mat-flat-button type="button" (click)="allow(state)">Allow overdue calibration…</button>
          }
        </div>
      </section>
    }
  `,
  styles: `
    .notice {
      display: flex;
      gap: 12px;
      align-items: flex-start;
      margin: 16px 0;
      padding: 12px 16px;
      border-radius: 12px;
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    .notice.allowed {
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    h2 {
      font: var(--mat-sys-title-medium);
      margin: 0 0 4px;
    }
    p {
      margin: 0 0 8px;
    }
    .override {
      white-space: pre-line;
    }
  `,
})
export class CalibrationNotice {
  private readonly api = inject(TestDetailApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly testId = input.required<string>();
  /** The test's calibration state from GET /api/tests/:id; null or absent when there is nothing to say. */
  readonly state = input<TestCalibrationState | null | undefined>(null);
  readonly isLabManager = input(false);
  /** Emits once an override is recorded, so the page reloads the test and its audit trail. */
  readonly changed = output<void>();

  /** The state while the current calibration is overdue, with its calibration narrowed to present. */
  protected readonly overdue = computed(() => {
    const state = this.state();
    return state?.calibration?.overdue ? { ...state, calibration: state.calibration } : null;
  });

  protected allow(state: TestCalibrationState & { calibration: NonNullable<TestCalibrationState['calibration']> }): void {
    openReasonDialog(this.dialog, {
      title: 'Allow the overdue calibration for this test?',
      message:
        `Runs of this test will be reduced with calibration version ${state.calibration.version} of balance ${state.balanceIdentifier}, ` +
        `although it was due on ${state.calibration.dueOn}. Say why the results are still sound, e.g. a check loading; ` +
        'the reason goes into the audit trail and onto certified sheets as a deviation.',
      missingReason: 'Say why the overdue calibration may be used',
      cancelLabel: 'Keep uploads refused',
      confirmLabel: 'Allow overdue calibration',
      send: (reason) => this.api.allowOverdueCalibration(this.testId(), reason),
      failure: 'The override could not be recorded.',
    }).subscribe((recorded) => {
      if (recorded) {
        this.snackBar.open('The override is on record; run files of this test can be uploaded.', undefined, { duration: 5000 });
        this.changed.emit();
      }
    });
  }
}
