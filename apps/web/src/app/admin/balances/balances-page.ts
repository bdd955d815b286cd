import { DatePipe, DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import type { Balance, Calibration } from '@tunnelwright/contracts';
import { problemMessage } from '../../core/problem-message';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { BalanceDialog, capacityUnit } from './balance-dialog';
import { BalancesApi } from './balances-api';
import { CalibrationDialog } from './calibration-dialog';
import { CalibrationHistoryDialog } from './calibration-history-dialog';
import { loadComponents } from './calibration-matrix';
import { CalibrationStateChip } from './calibration-state-chip';

/** Lab managers' list of balances: capacities, where each calibration stands, adding and editing, and calibration versions. */
@Component({
  selector: 'tw-balances-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, DecimalPipe, MatButtonModule, MatIconModule, MatProgressBarModule, MatTableModule, EmptyState, ErrorBanner, CalibrationStateChip],
  templateUrl: './balances-page.html',
  styles: `
    table {
      width: 100%;
    }
    .numeric {
      text-align: right;
      font-variant-numeric: tabular-nums;
      white-space: nowrap;
    }
    .actions,
    .mat-column-calibratedOn,
    .mat-column-dueOn {
      white-space: nowrap;
    }
  `,
})
export class BalancesPage {
  private readonly api = inject(BalancesApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  /** Capacity columns, one per load component, headed with the component and its unit. */
  protected readonly capacityColumns = loadComponents.map((component, index) => ({ id: `capacity${index}`, index, heading: `${component} (${capacityUnit(component)})` }));
  protected readonly columns = ['identifier', ...this.capacityColumns.map((column) => column.id), 'version', 'calibratedOn', 'dueOn', 'state', 'actions'];
  protected readonly balances = rxResource({ stream: () => this.api.balances() });
  protected readonly rows = computed(() => (this.balances.hasValue() ? this.balances.value() : []));
  protected readonly loadError = computed(() => {
    const error = this.balances.error();
    return error ? problemMessage(error.cause ?? error, 'The balances could not be loaded.') : null;
  });

  protected edit(balance: Balance | null): void {
    this.dialog
      .open(BalanceDialog, { data: balance, width: '640px', maxHeight: '90vh', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((saved: Balance | undefined) => {
        if (saved) {
          this.snackBar.open(`Balance ${saved.identifier} ${balance ? 'saved' : 'added'}.`, undefined, { duration: 5000 });
          this.balances.reload();
        }
      });
  }

  protected recordCalibration(balance: Balance): void {
    this.dialog
      .open(CalibrationDialog, { data: balance, width: '860px', maxWidth: '95vw', maxHeight: '90vh', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((recorded: Calibration | undefined) => {
        if (recorded) {
          this.snackBar.open(`Calibration version ${recorded.version} of ${balance.identifier} recorded.`, undefined, { duration: 5000 });
          this.balances.reload();
        }
      });
  }

  protected showCalibrations(balance: Balance): void {
    this.dialog.open(CalibrationHistoryDialog, { data: balance, width: '960px', maxWidth: '95vw', maxHeight: '90vh' });
  }
}
