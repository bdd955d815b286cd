import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { roleLabels } from '@tunnelwright/contracts';
import { AuthService } from '../core/auth-service';
import { ErrorBanner } from '../shared/error-banner';
import { PageSubmission } from '../shared/page-submission';
import { ChangePasswordForm } from './change-password-form';
import { ProfileApi } from './profile-api';

/** The signed-in user's name, and a way to change their password. */
@Component({
  selector: 'tw-profile-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatCardModule,
    MatFormFieldModule,
    MatInputModule,
    MatButtonModule,
    MatProgressBarModule,
    ErrorBanner,
    ChangePasswordForm,
  ],
  templateUrl: './profile-page.html',
  styles: `
    .cards {
      display: grid;
      grid-template-columns: repeat(auto-fit, minmax(320px, 1fr));
      gap: 16px;
      align-items: start;
    }
    mat-card {
      background: var(--mat-sys-surface);
    }
    .facts {
      margin: 0 0 16px;
      line-height: 1.6;
    }
    .actions {
      display: flex;
      justify-content: flex-end;
    }
  `,
})
export class ProfilePage {
  private readonly auth = inject(AuthService);
  private readonly api = inject(ProfileApi);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly user = this.auth.user;
  protected readonly roleLabel = computed(() => {
    const role = this.auth.role();
    return role ? roleLabels[role] : '';
  });
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: [this.auth.user()?.name ?? '', [Validators.required, Validators.maxLength(120)]],
  });
  protected readonly submission = new PageSubmission(this.form);

  protected save(): void {
    this.submission.send(
      () => this.api.update({ name: this.form.controls.name.value.trim() }),
      (user) => {
        this.auth.updateUser(user);
        this.form.markAsPristine();
        this.snackBar.open('Your name has been saved.', undefined, { duration: 4000 });
      },
    );
  }
}
