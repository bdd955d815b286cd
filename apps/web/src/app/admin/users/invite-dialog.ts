import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { roleLabels, staffRoles, type Role } from '@tunnelwright/contracts';
import { problemMessage } from '../../core/problem-message';
import { ErrorBanner } from '../../shared/error-banner';
import { FormDialogLayout } from '../../shared/form-dialog-layout';
import { FormSubmission } from '../../shared/form-submission';
import { UsersApi } from './users-api';

/** Invites a person by e-mail; the role choices follow the kind of organisation chosen. Closes with the address. */
@Component({
  selector: 'tw-invite-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, ErrorBanner, FormDialogLayout],
  templateUrl: './invite-dialog.html',
  styles: `
    form {
      display: flex;
      flex-direction: column;
      gap: 12px;
      padding-top: 8px;
    }
  `,
})
export class InviteDialog {
  private readonly api = inject(UsersApi);

  protected readonly roleLabels = roleLabels;
  protected readonly organisations = rxResource({ stream: () => this.api.organisations() });
  protected readonly organisationsError = computed(() => {
    const error = this.organisations.error();
    return error ? problemMessage(error.cause ?? error, 'The organisations could not be loaded.') : null;
  });
  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    name: ['', [Validators.required, Validators.maxLength(120)]],
    organisationId: ['', Validators.required],
    role: ['' as Role | '', Validators.required],
  });
  private readonly organisationId = toSignal(this.form.controls.organisationId.valueChanges, { initialValue: '' });
  /** Staff roles for the laboratory itself, "customer" for a customer organisation. */
  protected readonly roleChoices = computed<readonly Role[]>(() => {
    const chosen = this.organisations.hasValue()
      ? this.organisations.value().find((organisation) => organisation.id === this.organisationId())
      : undefined;
    if (!chosen) {
      return [];
    }
    return chosen.kind === 'lab' ? staffRoles : ['customer'];
  });
  protected readonly submission = new FormSubmission(this.form, { failure: 'The invitation could not be sent.' });

  constructor() {
    this.form.controls.organisationId.valueChanges.subscribe(() => {
      const choices = this.roleChoices();
      const role = this.form.controls.role.value;
      // A customer organisation has only one possible role, so choose it; otherwise drop a role that no longer fits.
      if (choices.length === 1) {
        this.form.controls.role.setValue(choices[0]);
      } else if (role && !choices.includes(role)) {
        this.form.controls.role.setValue('');
      }
    });
  }

  protected send(): void {
    if (!this.submission.checkValid()) {
      return;
    }
    const { email, name, organisationId, role } = this.form.getRawValue();
    if (!role) {
      return;
    }
    // The dialog closes with the address the invitation went to.
    this.submission.send(this.api.invite({ email: email.trim(), name: name.trim(), organisationId, role }), () => email.trim());
  }
}
