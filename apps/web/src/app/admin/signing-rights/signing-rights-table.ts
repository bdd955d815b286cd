import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatTableModule } from '@angular/material/table';
import type { SigningRight } from '@tunnelwright/contracts';
import { ProjectedColumnsTable } from '../shared/projected-columns-table';

/**
 * A table of signing rights with the columns every list of them has: the holder's name, the scope note and who
 * granted the right when. Further columns are projected as `matColumnDef`s; `columns` orders them all.
 */
@Component({
  selector: 'tw-signing-rights-table',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatTableModule],
  template: `
    <table mat-table [dataSource]="rights()" [attr.aria-label]="label()">
      <ng-container matColumnDef="name">
        <th mat-header-cell *matHeaderCellDef>Name</th>
        <td mat-cell *matCellDef="let right">{{ right.user.name }}@if (withEmail()) {<div class="tw-muted">{{ right.user.email }}</div>}</td>
      </ng-container>
      <ng-container matColumnDef="scopeNote">
        <th mat-header-cell *matHeaderCellDef>Scope note</th>
        <td mat-cell *matCellDef="let right">{{ right.scopeNote || '—' }}</td>
      </ng-container>
      <ng-container matColumnDef="granted">
        <th mat-header-cell *matHeaderCellDef>Granted</th>
        <td mat-cell *matCellDef="let right">{{ right.grantedAt | date: 'mediumDate' }} by {{ right.grantedBy.name }}</td>
      </ng-container>
      <tr mat-header-row *matHeaderRowDef="columns()"></tr>
      <tr mat-row *matRowDef="let row; columns: columns()"></tr>
    </table>
  `,
  styles: `
    :host {
      display: block;
    }
    table {
      width: 100%;
    }
  `,
})
export class SigningRightsTable extends ProjectedColumnsTable {
  readonly rights = input.required<readonly SigningRight[]>();
  /** The table's name for screen readers, e.g. "Current holders". */
  readonly label = input.required<string>();
  /** Every column in order: `name`, `scopeNote` and `granted` from here, the rest projected. */
  readonly columns = input.required<readonly string[]>();
  /** Whether the holder's e-mail address stands under the name. */
  readonly withEmail = input(false);
}
