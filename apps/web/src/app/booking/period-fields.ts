import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { PeriodInput } from '@tunnelwright/contracts';
import { labInstant } from './lab-time';

/** The start and end of a period, as `datetime-local` values in the lab's zone. */
export interface PeriodControls {
  readonly start: FormControl<string>;
  readonly end: FormControl<string>;
}

/** Required start and end controls, filled with the given `datetime-local` values. */
export function periodControls(start: string, end: string): PeriodControls {
  return {
    start: new FormControl(start, { nonNullable: true, validators: Validators.required }),
    end: new FormControl(end, { nonNullable: true, validators: Validators.required }),
  };
}

/** What the fields say: the period as instants when both are valid, and whether the end comes on or before the start. */
export interface PeriodReading {
  readonly period: PeriodInput | null;
  readonly outOfOrder: boolean;
}

/** Reads the fields as wall time in the lab's zone. */
export function readPeriod(controls: PeriodControls, labZone: string): PeriodReading {
  const start = labInstant(controls.start.value, labZone);
  const end = labInstant(controls.end.value, labZone);
  if (!start || !end) {
    return { period: null, outOfOrder: false };
  }
  return { period: { start, end }, outOfOrder: Date.parse(end) <= Date.parse(start) };
}

/**
 * The Start and End fields of a dialog that asks for a period. The host adds no box of its own, so the two fields
 * sit in the surrounding form's layout as if written there.
 */
@Component({
  selector: 'tw-period-fields',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    <mat-form-field>
      <mat-label>Start</mat-label>
      <input matInput type="datetime-local" [formControl]="controls().start" required />
      @if (controls().start.invalid) {
        <mat-error>Choose the start</mat-error>
      }
    </mat-form-field>
    <mat-form-field>
      <mat-label>End</mat-label>
      <input matInput type="datetime-local" [formControl]="controls().end" required />
      @if (controls().end.invalid) {
        <mat-error>Choose the end</mat-error>
      }
    </mat-form-field>
  `,
  styles: `
    :host {
      display: contents;
    }
  `,
})
export class PeriodFields {
  readonly controls = input.required<PeriodControls>();
}
