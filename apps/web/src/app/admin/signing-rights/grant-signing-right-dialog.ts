import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { roleLabels, type SigningRight, type UserSummary } from '@tunnelwright/contracts';
import { forkJoin, map } from 'rxjs';
import { ApprovalApi } from '../../approval/approval-api';
import { problemFieldErrors, problemMessage } from '../../core/problem-message';
import { ErrorBanner } from '../../shared/error-banner';
import { UsersApi } from '../users/users-api';
import { resourceCause } from '../../approval/resource-error';

/** Active analysts and lab managers who do not hold a signing right now, by name. */
export function grantCandidates(people: readonly UserSummary[], holderIds: ReadonlySet<string>): UserSummary[] {
  return people.filter((person) => person.active && !holderIds.has(person.id)).sort((a, b) => a.name.localeCompare(b.name));
}

/** Gives an analyst or lab manager the right to approve results and sign sheets; closes with the new right. */
@Component({
  selector: 'tw-grant-signing-right-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, MatSelectModule, ErrorBanner],
  template: `
    <h2 mat-dialog-title>Grant a signing right</h2>
    <mat-dialog-content>
      @if (people.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading analysts and lab managers" />
      }
      @if (people.error(); as error) {
        <tw-error-banner [message]="loadMessage(error)" (retry)="people.reload()" />
      } @else if (people.hasValue()) {
        @if (people.value().length === 0) {
          <p>Every active analyst and lab manager already holds a signing right.</p>
        } @else {
          <mat-form-field class="tw-full-width">
            <mat-label>Person</mat-label>
            <mat-select [formControl]="userId" required>
              @for (person of people.value(); track person.id) {
                <mat-option [value]="person.id">{{ person.name }} · {{ roleLabels[person.role] }} · {{ person.email }}</mat-option>
              }
            </mat-select>
            @if (userId.hasError('server')) {
              <mat-error>{{ userId.getError('server') }}</mat-error>
            } @else {
              <mat-error>Choose who receives the right</mat-error>
            }
          </mat-form-field>
          <mat-form-field class="tw-full-width">
            <mat-label>Scope note (optional)</mat-label>
            <textarea matInput [formControl]="scopeNote" rows="2" maxlength="500"></textarea>
            <mat-hint>For example which kinds of test they sign for.</mat-hint>
          </mat-form-field>
        }
      }
      @if (sendError(); as message) {
        <tw-error-banner [message]="message" [retryable]="false" />
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="button" [disabled]="sending() || !people.hasValue() || people.value().length === 0" (click)="grant()">Grant</button>
    </mat-dialog-actions>
  `,
})
export class GrantSigningRightDialog {
  private readonly api = inject(ApprovalApi);
  private readonly users = inject(UsersApi);
  private readonly dialogRef = inject<MatDialogRef<GrantSigningRightDialog, SigningRight>>(MatDialogRef);
  /** Ids of those who hold a right now; they are not offered again. */
  private readonly holderIds = inject<ReadonlySet<string>>(MAT_DIALOG_DATA);

  protected readonly roleLabels = roleLabels;
  protected readonly people = rxResource({
    stream: () => {
      const page = (role: 'analyst' | 'lab_manager') => this.users.list({ q: '', sort: 'name', order: 'asc', page: 1, pageSize: 100, role, active: true });
      return forkJoin([page('analyst'), page('lab_manager')]).pipe(map(([analysts, managers]) => grantCandidates([...analysts.items, ...managers.items], this.holderIds)));
    },
  });
  protected readonly userId = new FormControl('', { nonNullable: true, validators: Validators.required });
  protected readonly scopeNote = new FormControl('', { nonNullable: true, validators: Validators.maxLength(500) });
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected loadMessage(error: unknown): string {
    return problemMessage(resourceCause(error), 'The analysts and lab managers could not be loaded.');
  }

  protected grant(): void {
    if (this.userId.invalid || this.scopeNote.invalid) {
      this.userId.markAsTouched();
      return;
    }
    this.sending.set(true);
    this.sendError.set(null);
    this.api.grantSigningRight(this.userId.value, this.scopeNote.value.trim()).subscribe({
      next: (right) => this.dialogRef.close(right),
      error: (error: unknown) => {
        this.sending.set(false);
        const field = problemFieldErrors(error).find((candidate) => candidate.field === 'userId');
        if (field) {
          this.userId.setErrors({ server: field.message });
          this.userId.markAsTouched();
        }
        this.sendError.set(problemMessage(resourceCause(error), 'The signing right could not be granted.'));
      },
    });
  }
}
