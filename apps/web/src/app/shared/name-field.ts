import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

/** The Name box of a record's editor (tunnel, service, test article), with what is wrong with the name. */
@Component({
  selector: 'tw-name-field',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    <mat-form-field>
      <mat-label>Name</mat-label>
      <input matInput [formControl]="control()" required />
      @if (control().hasError('required')) {
        <mat-error>Enter a name</mat-error>
      } @else if (control().hasError('maxlength')) {
        <mat-error>Use at most {{ control().getError('maxlength').requiredLength }} characters</mat-error>
      } @else if (control().hasError('server')) {
        <mat-error>{{ control().getError('server') }}</mat-error>
      }
    </mat-form-field>
  `,
  // In a form grid the field fills its cell, as a form field standing there directly would.
  styles: `
    :host {
      display: block;
    }
    mat-form-field {
      width: 100%;
    }
  `,
})
export class NameField {
  /** The name, required and limited in length by its validators. */
  readonly control = input.required<FormControl<string>>();
}
