import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import type { FieldError, Preview } from '@tunnelwright/contracts';
import { map, of, startWith } from 'rxjs';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { FileDropZone } from '../shared/file-drop-zone';
import { FilePreview } from '../testing-runs/file-preview';
import { ImportProfilesApi } from './import-profiles-api';
import { controlForField, createColumnGroup, createProfileForm, resetProfileForm } from './profile-form';
import { DELIMITER_CHOICES, formFromProfile, profileFromForm, type ImportProfileJson } from './profile-json';
import { RUN_FILE_CHANNELS } from './run-file-channels';

/** A try of the profile on the sample: what the reader made of it, and the profile it was read with. */
interface Trial {
  readonly preview: Preview;
  /** The profile's rules (without its name) as tried; Save needs them to be the current ones. */
  readonly rules: string;
}

/** The rules of a profile as text, leaving out the name, which does not change how a file is read. */
function rulesOf(profile: ImportProfileJson): string {
  return JSON.stringify({ ...profile, name: '' });
}

/**
 * Writing or changing an import profile: how the other layout is delimited, whether it has a decimal comma or a
 * units row, which of its columns become which of ours and with what factor. A sample file dropped here is read
 * through the profile as it stands; the profile can be saved only once that sample reads without a single issue.
 */
@Component({
  selector: 'tw-profile-editor-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    ErrorBanner,
    FileDropZone,
    FilePreview,
  ],
  templateUrl: './profile-editor-page.html',
  styleUrl: './profile-editor-page.scss',
})
export class ProfileEditorPage {
  /** Route parameter: the saved profile's id; absent for a new profile. */
  readonly id = input<string>();

  private readonly api = inject(ImportProfilesApi);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly delimiters = DELIMITER_CHOICES;
  protected readonly channels = RUN_FILE_CHANNELS;
  protected readonly form = createProfileForm();
  protected readonly sample = signal<File | null>(null);
  protected readonly trial = signal<Trial | null>(null);
  protected readonly trying = signal(false);
  protected readonly saving = signal(false);
  /** Why the last try or save failed, when no field can show it. */
  protected readonly error = signal('');
  /** The sample's issues as the API listed them when it refused to save. */
  protected readonly sampleErrors = signal<readonly string[]>([]);

  protected readonly saved = rxResource({
    params: () => this.id(),
    stream: ({ params: id }) => (id ? this.api.list(true).pipe(map((profiles) => profiles.find((p) => p.id === id) ?? null)) : of(null)),
  });
  /** The saved profile once loaded; null for a new one, while loading, or after a failed load. */
  private readonly savedProfile = computed(() => (this.saved.hasValue() ? this.saved.value() : null));
  protected readonly archived = computed(() => this.savedProfile()?.archived === true);
  protected readonly problemText = (error: Error) => problemMessage(error.cause ?? error, 'The profile could not be loaded.');
  protected readonly missing = computed(() => this.id() !== undefined && this.saved.status() === 'resolved' && this.savedProfile() === null);

  private readonly status = toSignal(this.form.statusChanges.pipe(startWith(this.form.status)), { initialValue: this.form.status });
  private readonly rules = toSignal(this.form.valueChanges.pipe(map(() => rulesOf(this.currentProfile()))), { initialValue: rulesOf(this.currentProfile()) });

  /** Whether the last try was made with other rules than the form now holds. */
  protected readonly stale = computed(() => {
    const trial = this.trial();
    return trial !== null && trial.rules !== this.rules();
  });
  protected readonly canSave = computed(
    () => this.status() === 'VALID' && !this.archived() && !this.stale() && this.trial()?.preview.valid === true && !this.saving() && !this.trying(),
  );
  /** What still stands between the technician and Save. */
  protected readonly saveHint = computed(() => {
    if (this.archived()) return 'This profile is archived: it stays as it was used. Save a new profile instead.';
    if (this.status() !== 'VALID') return 'Fix the fields marked in red first.';
    if (!this.sample()) return 'Drop a sample file: a profile is saved only once a sample reads through it without issues.';
    if (this.stale()) return 'The profile changed since the last try: try the sample again.';
    const trial = this.trial();
    if (trial && !trial.preview.valid) return 'The sample does not read cleanly yet: change the profile and try again.';
    return '';
  });

  constructor() {
    effect(() => {
      const saved = this.savedProfile();
      if (saved) resetProfileForm(this.form, formFromProfile(saved.name, saved.description, saved.profile));
    });
  }

  protected addColumn(): void {
    this.form.controls.columns.push(createColumnGroup());
  }

  protected removeColumn(index: number): void {
    this.form.controls.columns.removeAt(index);
  }

  protected sampleChosen(files: readonly File[]): void {
    this.sample.set(files[0] ?? null);
    this.tryOnSample();
  }

  /** Reads the sample through the profile as it stands in the form; nothing is kept. */
  protected tryOnSample(): void {
    const sample = this.sample();
    if (!sample) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const profile = this.currentProfile();
    this.trying.set(true);
    this.error.set('');
    this.sampleErrors.set([]);
    this.api.tryOnSample(sample, profile).subscribe({
      next: (preview) => {
        this.trying.set(false);
        this.trial.set({ preview, rules: rulesOf(profile) });
      },
      error: (error: unknown) => {
        this.trying.set(false);
        this.trial.set(null);
        this.showProblem(error, 'The sample could not be read.');
      },
    });
  }

  protected save(): void {
    const sample = this.sample();
    if (!sample || !this.canSave()) return;
    const { name, description } = this.form.getRawValue();
    const submission = { name: name.trim(), description: description.trim(), profile: this.currentProfile(), sample };
    const id = this.id();
    this.saving.set(true);
    this.error.set('');
    this.sampleErrors.set([]);
    (id ? this.api.update(id, submission) : this.api.create(submission)).subscribe({
      next: (saved) => {
        this.saving.set(false);
        this.snackBar.open(`${saved.name} saved.`, undefined, { duration: 4000 });
        void this.router.navigate(['/import-profiles']);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.showProblem(error, 'The profile could not be saved.');
      },
    });
  }

  private currentProfile(): ImportProfileJson {
    return profileFromForm(this.form.getRawValue());
  }

  /** Puts each field error on its control, the sample's issues in their list, and the rest in the banner. */
  private showProblem(error: unknown, fallback: string): void {
    const fields = problemFieldErrors(error);
    const unplaced: FieldError[] = [];
    const sampleErrors: string[] = [];
    for (const field of fields) {
      const control = controlForField(this.form, field.field);
      if (field.field === 'file') {
        sampleErrors.push(field.message);
      } else if (control) {
        control.setErrors({ ...control.errors, server: field.message });
        control.markAsTouched();
      } else {
        unplaced.push(field);
      }
    }
    this.sampleErrors.set(sampleErrors);
    const placedAll = fields.length > 0 && unplaced.length === 0;
    this.error.set(placedAll && sampleErrors.length === 0 ? '' : problemMessage(error, fallback));
  }
}
