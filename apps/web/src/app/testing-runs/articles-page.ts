import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import type { Article } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ConfirmDialog, type ConfirmDialogData } from '../shared/confirm-dialog';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { ArticleDialog, type ArticleDialogData } from './article-dialog';
import { articleKindLabels } from './article-form';
import { TestSetupApi } from './test-setup-api';

/** Staff's list of the articles customers sent for testing: record, edit and remove, one organisation at a time or all. */
@Component({
  selector: 'tw-articles-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, MatButtonModule, MatFormFieldModule, MatIconModule, MatProgressBarModule, MatSelectModule, MatTableModule, EmptyState, ErrorBanner],
  template: `
    <div class="tw-page-header">
      <h1>Test articles</h1>
      <button mat-flat-button type="button" (click)="edit(null)" [disabled]="!customers.hasValue()"><mat-icon>add</mat-icon> Record a test article</button>
    </div>
    @if (customers.error(); as error) {
      <tw-error-banner [message]="message(error, 'organisations')" (retry)="customers.reload()" />
    }
    <mat-form-field class="filter">
      <mat-label>Organisation</mat-label>
      <mat-select [value]="organisationId()" (valueChange)="organisationId.set($event)">
        <mat-option value="">All customers</mat-option>
        @for (customer of customers.value() ?? []; track customer.id) {
          <mat-option [value]="customer.id">{{ customer.name }}</mat-option>
        }
      </mat-select>
    </mat-form-field>
    @if (articles.isLoading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading test articles" />
    }
    @if (articles.error(); as error) {
      <tw-error-banner [message]="message(error, 'test articles')" (retry)="articles.reload()" />
    } @else if (articles.hasValue()) {
      @if (articles.value().length === 0) {
        <tw-empty-state icon="inventory_2" title="No test articles" hint="Record an article when a customer's model arrives at the laboratory." />
      } @else {
        <table mat-table [dataSource]="articles.value()" aria-label="Test articles">
          <ng-container matColumnDef="name">
            <th mat-header-cell *matHeaderCellDef>Name</th>
            <td mat-cell *matCellDef="let article">{{ article.name }}</td>
          </ng-container>
          <ng-container matColumnDef="organisation">
            <th mat-header-cell *matHeaderCellDef>Organisation</th>
            <td mat-cell *matCellDef="let article">{{ organisationName(article) }}</td>
          </ng-container>
          <ng-container matColumnDef="kind">
            <th mat-header-cell *matHeaderCellDef>Kind</th>
            <td mat-cell *matCellDef="let article">{{ kindLabel(article) }}</td>
          </ng-container>
          <ng-container matColumnDef="area">
            <th mat-header-cell *matHeaderCellDef>Reference area (m²)</th>
            <td mat-cell *matCellDef="let article" class="numeric">{{ article.referenceArea | number: '1.0-4' }}</td>
          </ng-container>
          <ng-container matColumnDef="length">
            <th mat-header-cell *matHeaderCellDef>Reference length (m)</th>
            <td mat-cell *matCellDef="let article" class="numeric">{{ article.referenceLength | number: '1.0-4' }}</td>
          </ng-container>
          <ng-container matColumnDef="scale">
            <th mat-header-cell *matHeaderCellDef>Scale</th>
            <td mat-cell *matCellDef="let article" class="numeric">{{ article.scale | number: '1.0-3' }}</td>
          </ng-container>
          <ng-container matColumnDef="actions">
            <th mat-header-cell *matHeaderCellDef><span class="cdk-visually-hidden">Actions</span></th>
            <td mat-cell *matCellDef="let article" class="actions">
              <button mat-icon-button type="button" [attr.aria-label]="'Edit ' + article.name" (click)="edit(article)"><mat-icon>edit</mat-icon></button>
              <button mat-icon-button type="button" [attr.aria-label]="'Remove ' + article.name" (click)="remove(article)"><mat-icon>delete</mat-icon></button>
            </td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="columns"></tr>
          <tr mat-row *matRowDef="let row; columns: columns"></tr>
        </table>
      }
    }
  `,
  styles: `
    :host {
      display: block;
      padding: 16px 24px;
    }
    .filter {
      min-width: 280px;
    }
    table {
      width: 100%;
    }
    .numeric {
      text-align: right;
      font-variant-numeric: tabular-nums;
    }
    .actions {
      text-align: right;
      white-space: nowrap;
    }
  `,
})
export class ArticlesPage {
  private readonly api = inject(TestSetupApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly columns = ['name', 'organisation', 'kind', 'area', 'length', 'scale', 'actions'];
  protected readonly kindLabels = articleKindLabels;
  /** The organisation filter; '' shows every customer's articles. */
  protected readonly organisationId = signal('');
  protected readonly customers = rxResource({ stream: () => this.api.customers() });
  protected readonly articles = rxResource({ params: () => this.organisationId(), stream: ({ params }) => this.api.articles(params || undefined) });
  private readonly customerNames = computed(() => new Map((this.customers.value() ?? []).map((customer) => [customer.id, customer.name])));
  protected readonly message = (error: unknown, what: string) => problemMessage(error, `The ${what} could not be loaded.`);

  protected kindLabel(article: Article): string {
    return this.kindLabels[article.kind];
  }

  protected organisationName(article: Article): string {
    return this.customerNames().get(article.organisationId) ?? '—';
  }

  protected edit(article: Article | null): void {
    const data: ArticleDialogData = { article, customers: this.customers.value() ?? [], organisationId: article?.organisationId ?? this.organisationId() };
    this.dialog
      .open<ArticleDialog, ArticleDialogData, Article>(ArticleDialog, { data, width: '720px', maxHeight: '90vh' })
      .afterClosed()
      .subscribe((saved) => {
        if (saved) {
          this.snackBar.open(`${saved.name} saved.`, undefined, { duration: 4000 });
          this.articles.reload();
        }
      });
  }

  /** Asks first; the API keeps an article a test uses (409) and says so. */
  protected remove(article: Article): void {
    const data: ConfirmDialogData = {
      title: `Remove ${article.name}?`,
      message: 'The article and its reference quantities are deleted. An article that a test uses cannot be removed.',
      confirmLabel: 'Remove',
      destructive: true,
    };
    this.dialog
      .open(ConfirmDialog, { data, width: '420px' })
      .afterClosed()
      .subscribe((confirmed) => {
        if (!confirmed) return;
        this.api.deleteArticle(article.id).subscribe({
          next: () => {
            this.snackBar.open(`${article.name} removed.`, undefined, { duration: 4000 });
            this.articles.reload();
          },
          error: (error: unknown) => this.snackBar.open(problemMessage(error, 'The test article could not be removed.'), 'Dismiss', { duration: 8000 }),
        });
      });
  }
}
