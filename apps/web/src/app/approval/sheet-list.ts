import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import type { ResultSheet, ResultSheetState } from '@tunnelwright/contracts';
import { issueDateText, sheetStateLabels } from './approval-labels';
import { SheetDownloads } from './sheet-downloads';

/** Issued result sheets: number, date, state (a superseded one names its successor), downloads and the public check. */
@Component({
  selector: 'tw-sheet-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatTableModule, SheetDownloads],
  template: `
    <table mat-table [dataSource]="sheets()" [attr.aria-label]="label()">
      <ng-container matColumnDef="reportNumber">
        <th mat-header-cell *matHeaderCellDef>Report number</th>
        <td mat-cell *matCellDef="let sheet">
          <a [routerLink]="['/documents', sheet.id]">{{ sheet.reportNumber }}</a>
        </td>
      </ng-container>
      <ng-container matColumnDef="test">
        <th mat-header-cell *matHeaderCellDef>Test</th>
        <td mat-cell *matCellDef="let sheet">
          <a [routerLink]="['/tests', sheet.testId]">{{ sheet.testTitle }}</a>
          @if (showOrganisation()) {
            <div class="tw-muted">{{ sheet.organisationName }}</div>
          }
        </td>
      </ng-container>
      <ng-container matColumnDef="issueDate">
        <th mat-header-cell *matHeaderCellDef>Issued</th>
        <td mat-cell *matCellDef="let sheet">{{ dateText(sheet.issueDate) }}</td>
      </ng-container>
      <ng-container matColumnDef="state">
        <th mat-header-cell *matHeaderCellDef>State</th>
        <td mat-cell *matCellDef="let sheet">
          <span class="state" [attr.data-state]="sheet.state">{{ stateLabel(sheet.state) }}</span>
          @if (sheet.supersededBy; as successor) {
            by <a [routerLink]="['/documents', successor.id]">{{ successor.reportNumber }}</a>
          }
        </td>
      </ng-container>
      <ng-container matColumnDef="downloads">
        <th mat-header-cell *matHeaderCellDef>Files</th>
        <td mat-cell *matCellDef="let sheet"><tw-sheet-downloads [sheet]="sheet" /></td>
      </ng-container>
      <ng-container matColumnDef="verify">
        <th mat-header-cell *matHeaderCellDef><span class="tw-visually-hidden">Check</span></th>
        <td mat-cell *matCellDef="let sheet">
          <a [routerLink]="['/verify', sheet.reportNumber]" [attr.aria-label]="'Check a copy of ' + sheet.reportNumber">Check a copy</a>
        </td>
      </ng-container>
      <tr mat-header-row *matHeaderRowDef="columns()"></tr>
      <tr mat-row *matRowDef="let row; columns: columns()"></tr>
    </table>
  `,
  styles: `
    table {
      width: 100%;
    }
    .state[data-state='valid'] {
      font-weight: 500;
      color: var(--mat-sys-primary);
    }
  `,
})
export class SheetList {
  readonly sheets = input.required<readonly ResultSheet[]>();
  /** Accessible name of the table. */
  readonly label = input('Result sheets');
  /** Whether to show which test each sheet belongs to (not needed on the test's own page). */
  readonly showTest = input(false);
  /** Whether to name the customer under the test (for staff, who see every organisation's). */
  readonly showOrganisation = input(false);

  protected readonly columns = computed(() => [
    'reportNumber',
    ...(this.showTest() ? ['test'] : []),
    'issueDate',
    'state',
    'downloads',
    'verify',
  ]);
  protected stateLabel(state: ResultSheetState): string {
    return sheetStateLabels[state];
  }
  protected readonly dateText = issueDateText;
}
