import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { of } from 'rxjs';
import { ApprovalApi } from '../approval/approval-api';
import { issueDateText } from '../approval/approval-labels';
import { resourceCause } from '../approval/resource-error';
import { AuthFrame } from '../auth/auth-frame';
import { problemMessage, problemStatus } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { FileDropZone } from '../shared/file-drop-zone';
import { fileSizeText } from '../shared/file-size-text';
import { tidyReportNumber, verdictOf, type Verdict } from './verdict';

/** Largest file the server compares; issued sheets are far smaller. */
const maxCheckBytes = 25 * 1024 * 1024;

/** What the last dropped file turned out to be. */
interface FileOutcome {
  readonly fileName: string;
  readonly verdict: Verdict;
  readonly fileSha256: string;
  readonly fileSize: number;
}

/**
 * The public check of an issued sheet, open without signing in (the QR code on every page leads here): only the
 * number, issue date, state and SHA-256 of the sheet, and whether a dropped PDF is byte for byte the issued file.
 */
@Component({
  selector: 'tw-verify-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    AuthFrame,
    ErrorBanner,
    FileDropZone,
  ],
  templateUrl: './verify-page.html',
  styleUrl: './verify-page.scss',
})
export class VerifyPage {
  /** Route parameter: the report number to check; absent on the bare page, which asks for one. */
  readonly reportNumber = input<string>();

  private readonly api = inject(ApprovalApi);
  private readonly router = inject(Router);

  protected readonly lookup = new FormControl('', { nonNullable: true, validators: Validators.required });
  /** The look-up as a form, so Enter in the field submits it here rather than as a page load. */
  protected readonly lookupForm = new FormGroup({ reportNumber: this.lookup });
  protected readonly sheet = rxResource({
    params: () => this.reportNumber() ?? '',
    stream: ({ params }) => (params === '' ? of(null) : this.api.verification(params)),
  });
  protected readonly notFound = computed(() => problemStatus(resourceCause(this.sheet.error())) === 404);
  protected readonly checking = signal<string | null>(null);
  protected readonly outcome = signal<FileOutcome | null>(null);
  protected readonly fileError = signal<string | null>(null);
  protected readonly dateText = issueDateText;

  constructor() {
    // A new number forgets the verdict on the previous one.
    effect(() => {
      const number = this.reportNumber() ?? '';
      this.lookup.setValue(number);
      this.outcome.set(null);
      this.fileError.set(null);
    });
  }

  protected look(): void {
    const number = tidyReportNumber(this.lookup.value);
    if (number === '') {
      this.lookup.markAsTouched();
      return;
    }
    void this.router.navigate(['/verify', number]);
  }

  protected message(error: unknown): string {
    return problemMessage(resourceCause(error), 'The sheet could not be looked up. Try again.');
  }

  protected size(bytes: number): string {
    return fileSizeText(bytes);
  }

  protected check(files: File[]): void {
    const number = this.reportNumber();
    const file = files[0];
    if (!number || !file) return;
    this.outcome.set(null);
    if (file.size === 0) {
      this.fileError.set(`${file.name} is empty; choose the PDF of the sheet.`);
      return;
    }
    if (file.size > maxCheckBytes) {
      this.fileError.set(`${file.name} is ${fileSizeText(file.size)}; files over 25 MB cannot be the issued sheet.`);
      return;
    }
    this.fileError.set(files.length > 1 ? `Only the first file, ${file.name}, was checked.` : null);
    this.checking.set(file.name);
    this.api.verifyFile(number, file).subscribe({
      next: (check) => {
        this.checking.set(null);
        this.outcome.set({ fileName: file.name, verdict: verdictOf(check, file.name), fileSha256: check.fileSha256, fileSize: check.fileSize });
      },
      error: (error: unknown) => {
        this.checking.set(null);
        this.fileError.set(problemMessage(error, `${file.name} could not be checked. Try again.`));
      },
    });
  }
}
