import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatTooltipModule } from '@angular/material/tooltip';

/** Edit, and archive or restore, for one row of a catalogue list; each button names the record for screen readers. */
@Component({
  selector: 'tw-row-actions',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule, MatTooltipModule],
  template: `
    <button mat-icon-button type="button" matTooltip="Edit" [attr.aria-label]="'Edit ' + name()" (click)="edit.emit()">
      <mat-icon class="material-icons">edit</mat-icon>
    </button>
    @if (archived()) {
      <button mat-icon-button type="button" matTooltip="Restore" [disabled]="busy()" [attr.aria-label]="'Restore ' + name()" (click)="archive.emit(false)">
        <mat-icon class="material-icons">unarchive</mat-icon>
      </button>
    } @else {
      <button mat-icon-button type="button" matTooltip="Archive" [disabled]="busy()" [attr.aria-label]="'Archive ' + name()" (click)="archive.emit(true)">
        <mat-icon class="material-icons">archive</mat-icon>
      </button>
    }
  `,
})
export class RowActions {
  readonly name = input.required<string>();
  readonly archived = input(false);
  readonly busy = input(false);
  readonly edit = output<void>();
  /** `true` to archive, `false` to restore. */
  readonly archive = output<boolean>();
}
