import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MAT_DIALOG_DATA } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { Article, ArticleKind, Organisation, ReferenceAreaKind } from '@tunnelwright/contracts';
import { FormDialogLayout } from '../shared/form-dialog-layout';
import { FormSubmission } from '../shared/form-submission';
import { NameField } from '../shared/name-field';
import { numberErrorText } from '../shared/number-error-text';
import { articleControlName, articleInputFrom, articleKindLabels, buildArticleForm, referenceAreaKindLabels } from './article-form';
import { TestSetupApi } from './test-setup-api';

/** What the article dialog edits: an existing article, or a new one for the given organisation. */
export interface ArticleDialogData {
  readonly article: Article | null;
  /** The customer organisations to choose from. */
  readonly customers: readonly Organisation[];
  /** The organisation a new article starts with ('' to let staff choose). */
  readonly organisationId: string;
  /** Whether the organisation is fixed, e.g. when recording an article while opening a test for that customer. */
  readonly organisationFixed?: boolean;
}

/** Records a test article received from a customer, or edits one. Closes with the saved article. */
@Component({
  selector: 'tw-article-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, FormDialogLayout, NameField],
  templateUrl: './article-dialog.html',
  styles: `
    .section {
      font: var(--mat-sys-title-small);
      margin: 8px 0 4px;
    }
    .tw-form-grid {
      padding-top: 8px;
      align-items: start;
    }
    .wide {
      grid-column: 1 / -1;
    }
  `,
})
export class ArticleDialog {
  private readonly api = inject(TestSetupApi);

  protected readonly data = inject<ArticleDialogData>(MAT_DIALOG_DATA);
  protected readonly article = this.data.article;
  protected readonly form = buildArticleForm(inject(NonNullableFormBuilder), this.article, this.data.organisationId);
  protected readonly kinds = Object.entries(articleKindLabels) as [ArticleKind, string][];
  protected readonly areaKinds = Object.entries(referenceAreaKindLabels) as [ReferenceAreaKind, string][];
  protected readonly numberError = numberErrorText;
  protected readonly submission = new FormSubmission(this.form, { failure: 'The test article could not be saved.', controlPath: articleControlName });

  constructor() {
    if (this.data.organisationFixed) this.form.controls.organisationId.disable();
  }

  protected save(): void {
    if (!this.submission.checkValid()) return;
    const input = articleInputFrom(this.form);
    this.submission.send(this.article ? this.api.updateArticle(this.article.id, input) : this.api.createArticle(input));
  }
}
