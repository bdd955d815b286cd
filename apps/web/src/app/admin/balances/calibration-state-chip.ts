import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { Calibration } from '@tunnelwright/contracts';
import { calibrationDue, todayUtc } from './calibration-due';

const icons = { overdue: 'error', soon: 'schedule', current: 'check_circle', none: 'help' } as const;

/** A chip saying how a calibration stands: overdue, due in N days, or not calibrated yet. */
@Component({
  selector: 'tw-calibration-state-chip',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIconModule],
  template: `<span class="chip" [class]="'chip ' + due().tone"><mat-icon class="material-icons" aria-hidden="true">{{ icon() }}</mat-icon>{{ due().label }}</span>`,
  styles: `
    .chip {
      display: inline-flex;
      align-items: center;
      gap: 4px;
      padding: 2px 10px 2px 6px;
      border-radius: 16px;
      font: var(--mat-sys-label-medium);
      white-space: nowrap;
    }
    mat-icon {
      font-size: 18px;
      width: 18px;
      height: 18px;
    }
    .overdue {
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    .soon {
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    .current {
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
    .none {
      background: var(--mat-sys-surface-container-high);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class CalibrationStateChip {
  readonly calibration = input.required<Pick<Calibration, 'dueOn' | 'overdue'> | null>();
  /** The day counted from, `YYYY-MM-DD`; today in UTC unless given. */
  readonly today = input<string>(todayUtc());

  protected readonly due = computed(() => calibrationDue(this.calibration(), this.today()));
  protected readonly icon = computed(() => icons[this.due().tone]);
}
