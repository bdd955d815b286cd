import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { roleLabels, staffRoles, type Role, type UserSummary } from '@tunnelwright/contracts';
import { problemMessage } from '../../core/problem-message';
import { ErrorBanner } from '../../shared/error-banner';
import { UsersApi } from './users-api';

/** Moves a staff member between the laboratory's roles. Closes with the updated user. */
@Component({
  selector: 'tw-change-role-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatSelectModule, MatButtonModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Change role of {{ user.name }}</h2>
    <mat-dialog-content>
      @if (error(); as message) {
        <tw-error-banner [message]="message" (retry)="save()" />
      }
      <mat-form-field class="tw-full-width">
        <mat-label>Role</mat-label>
        <mat-select [formControl]="role" required>
          @for (choice of choices; track choice) {
            <mat-option [value]="choice">{{ roleLabels[choice] }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="button" [disabled]="busy() || role.value === user.role" (click)="save()">
        Save role
      </button>
    </mat-dialog-actions>
  `,
})
export class ChangeRoleDialog {
  private readonly api = inject(UsersApi);
  private readonly dialogRef = inject<MatDialogRef<ChangeRoleDialog, UserSummary>>(MatDialogRef);

  protected readonly user = inject<UserSummary>(MAT_DIALOG_DATA);
  protected readonly roleLabels = roleLabels;
  /** Staff move only between staff roles; a customer's role follows their organisation. */
  protected readonly choices = staffRoles;
  protected readonly role = new FormControl<Role>(this.user.role, { nonNullable: true, validators: Validators.required });
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  protected save(): void {
    this.busy.set(true);
    this.error.set(null);
    this.api.update(this.user.id, { role: this.role.value }).subscribe({
      next: (updated) => {
        this.busy.set(false);
        this.dialogRef.close(updated);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error, 'The role could not be changed.'));
      },
    });
  }
}
