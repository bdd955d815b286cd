import { ChangeDetectionStrategy, Component, ElementRef, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import { testStateSchema, type Article, type Test } from '@tunnelwright/contracts';
import { of } from 'rxjs';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { focusFirstInvalid } from '../shared/focus-first-invalid';
import { ArticleDialog, type ArticleDialogData } from './article-dialog';
import { testStateLabels } from './run-labels';
import { buildTestForm, configurationRow, defaultMinimumSamplesPerPoint, fillTestForm, testControlPath, testInputFrom } from './test-form';
import { TestSetupApi } from './test-setup-api';

/** Staff open a test for a customer's article in a tunnel, or edit one (route parameter `id`). Saving goes to the test. */
@Component({
  selector: 'tw-test-form-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSelectModule, ErrorBanner],
  templateUrl: './test-form-page.html',
  styles: `
    :host {
      display: block;
      padding: 16px 24px;
      max-width: 960px;
    }
    .section {
      font: var(--mat-sys-title-medium);
      margin: 24px 0 8px;
    }
    .test-grid {
      display: grid;
      grid-template-columns: repeat(2, minmax(0, 1fr));
      gap: 8px 16px;
      align-items: start;
    }
    .wide {
      grid-column: 1 / -1;
    }
    .article {
      display: flex;
      gap: 8px;
      align-items: flex-start;
    }
    .article mat-form-field {
      flex: 1 1 auto;
    }
    .article button {
      margin-top: 8px;
    }
    .row {
      display: grid;
      grid-template-columns: minmax(160px, 1fr) minmax(240px, 2fr) auto;
      gap: 0 16px;
      align-items: flex-start;
      margin-bottom: 8px;
    }
    .row button {
      margin-top: 8px;
    }
    .form-error {
      color: var(--mat-sys-error);
      font: var(--mat-sys-body-small);
      margin: 0 0 8px;
    }
    .hint {
      font: var(--mat-sys-body-medium);
      color: var(--mat-sys-on-surface-variant);
    }
    .actions {
      display: flex;
      gap: 8px;
      justify-content: flex-end;
      margin-top: 24px;
    }
  `,
})
export class TestFormPage {
  /** Route parameter: the test being edited; absent when opening a new one. */
  readonly id = input<string>();
  /** Query parameters a booking passes when its test is opened from it: the customer organisation and the tunnel. */
  readonly organisation = input<string>();
  readonly tunnel = input<string>();

  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly api = inject(TestSetupApi);
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);

  protected readonly form = buildTestForm(this.fb);
  protected readonly states = testStateSchema.options;
  protected readonly stateLabels = testStateLabels;
  protected readonly defaultMinimum = defaultMinimumSamplesPerPoint;
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  protected readonly customers = rxResource({ stream: () => this.api.customers() });
  protected readonly tunnels = rxResource({ stream: () => this.api.tunnels() });
  protected readonly balances = rxResource({ stream: () => this.api.balances() });
  protected readonly existing = rxResource<Test | null, string | undefined>({ params: () => this.id(), stream: ({ params }) => (params ? this.api.test(params) : of(null)) });
  protected readonly organisationId = toSignal(this.form.controls.organisationId.valueChanges, { initialValue: '' });
  protected readonly articles = rxResource<Article[], string>({
    params: () => this.organisationId(),
    stream: ({ params }) => (params ? this.api.articles(params) : of([])),
  });
  protected readonly loadError = computed(() => {
    const failed = this.customers.error() ?? this.tunnels.error() ?? this.balances.error() ?? this.existing.error();
    return failed ? problemMessage(failed, 'What the form needs could not be loaded.') : null;
  });

  constructor() {
    // A test's article belongs to its customer: choosing another customer clears the article.
    this.form.controls.organisationId.valueChanges.subscribe(() => this.form.controls.articleId.setValue(''));
    effect(() => {
      const test = this.existing.value();
      if (test) fillTestForm(this.fb, this.form, test);
    });
    // A new test opened from a booking starts with the booking's customer and tunnel.
    effect(() => {
      const organisation = this.organisation();
      const tunnel = this.tunnel();
      if (this.id()) return;
      untracked(() => {
        if (organisation && this.form.controls.organisationId.value === '') this.form.controls.organisationId.setValue(organisation);
        if (tunnel && this.form.controls.tunnelId.value === '') this.form.controls.tunnelId.setValue(tunnel);
      });
    });
  }

  protected get configurations() {
    return this.form.controls.configurations;
  }

  protected addConfiguration(): void {
    this.configurations.push(configurationRow(this.fb));
  }

  protected removeConfiguration(index: number): void {
    this.configurations.removeAt(index);
  }

  /** Records an article for the chosen customer and selects it. */
  protected recordArticle(): void {
    const data: ArticleDialogData = { article: null, customers: this.customers.value() ?? [], organisationId: this.organisationId(), organisationFixed: true };
    this.dialog
      .open<ArticleDialog, ArticleDialogData, Article>(ArticleDialog, { data, width: '720px', maxHeight: '90vh' })
      .afterClosed()
      .subscribe((saved) => {
        if (!saved) return;
        this.articles.reload();
        this.form.controls.articleId.setValue(saved.id);
      });
  }

  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const test = this.existing.value() ?? undefined;
    const input = testInputFrom(this.form, test);
    this.busy.set(true);
    this.error.set(null);
    const request = test ? this.api.updateTest(test.id, input) : this.api.createTest(input);
    request.subscribe({
      next: (saved) => {
        this.busy.set(false);
        void this.router.navigate(['/tests', saved.id]);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        for (const field of problemFieldErrors(error)) {
          const control = this.form.get(testControlPath(field.field));
          control?.setErrors({ server: field.message });
          control?.markAsTouched();
        }
        this.error.set(problemMessage(error, 'The test could not be saved.'));
      },
    });
  }
}
