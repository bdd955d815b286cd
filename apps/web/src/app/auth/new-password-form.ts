import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, input, output, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { passwordMinLength } from '@tunnelwright/contracts';
import { debounceTime } from 'rxjs';
import { matchingPasswords } from './matching-passwords';
import { PasswordStrength, PasswordStrengthService } from './password-strength';
import { focusFirstInvalid } from '../shared/focus-first-invalid';

const strengthWords = ['Very weak', 'Weak', 'Fair', 'Strong', 'Very strong'] as const;

/** Choose-and-confirm password fields with a strength meter; emits the password when valid. */
@Component({
  selector: 'tw-new-password-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  templateUrl: './new-password-form.html',
  styleUrl: './new-password-form.scss',
})
export class NewPasswordForm {
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly strength = inject(PasswordStrengthService);

  /** Label of the submit button. */
  readonly submitLabel = input('Set password');
  /** Whether a submission is in progress. */
  readonly busy = input(false);
  /** A field error from the server for the password, shown under the field. */
  readonly serverError = input<string | null>(null);
  /** Words the password should not be built from (name, e-mail). */
  readonly userInputs = input<string[]>([]);
  /** Emitted with the chosen password. */
  readonly submitted = output<string>();

  protected readonly minLength = passwordMinLength;
  protected readonly form = inject(NonNullableFormBuilder).group(
    {
      password: ['', [Validators.required, Validators.minLength(passwordMinLength), Validators.maxLength(256)]],
      confirm: ['', Validators.required],
    },
    { validators: matchingPasswords },
  );
  protected readonly result = signal<PasswordStrength | null>(null);
  protected readonly strengthWord = computed(() => {
    const current = this.result();
    return current ? strengthWords[current.score] : '';
  });
  /** Whether the password is long enough but too easy to guess (the server requires a score of 3). */
  protected readonly tooGuessable = computed(() => (this.result()?.score ?? 4) < 3);

  constructor() {
    let latest = 0;
    this.form.controls.password.valueChanges.pipe(debounceTime(150), takeUntilDestroyed()).subscribe((value) => {
      const ticket = ++latest;
      if (!value) {
        this.result.set(null);
        return;
      }
      void this.strength.score(value, this.userInputs()).then((strength) => {
        if (ticket === latest) {
          this.result.set(strength);
        }
      });
    });
  }

  /** Clears both fields, e.g. after the password has been changed. */
  reset(): void {
    this.form.reset();
    this.result.set(null);
  }

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    this.submitted.emit(this.form.controls.password.value);
  }
}
