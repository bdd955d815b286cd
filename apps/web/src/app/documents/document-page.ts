import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { roleLabels, type Role } from '@tunnelwright/contracts';
import { ApprovalApi } from '../approval/approval-api';
import { issueDateText, sheetStateLabels } from '../approval/approval-labels';
import { SheetDownloads } from '../approval/sheet-downloads';
import { problemMessage, problemStatus } from '../core/problem-message';
import { SafetyNotice } from '../core/safety-notice';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { fileSizeText } from '../shared/file-size-text';
import { resourceCause } from '../approval/resource-error';

/** One issued result sheet: what it is, whether it is still valid, its files and its public check. The issue e-mail links here. */
@Component({
  selector: 'tw-document-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule, EmptyState, ErrorBanner, SafetyNotice, SheetDownloads],
  template: `
    <section class="tw-page">
      <p><a routerLink="/documents">All documents</a></p>
      @if (sheet.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the result sheet" />
      }
      @if (sheet.error(); as error) {
        @if (notFound()) {
          <h1>Result sheet not found</h1>
          <tw-empty-state icon="search_off" title="There is no result sheet here for you" hint="The link may be mistyped, or the sheet belongs to another organisation." />
        } @else {
          <h1>Result sheet</h1>
          <tw-error-banner [message]="message(error)" (retry)="sheet.reload()" />
        }
      } @else if (sheet.hasValue()) {
        @let current = sheet.value();
        <header class="tw-page-header">
          <h1>{{ current.reportNumber }}</h1>
          <tw-sheet-downloads [sheet]="current" />
        </header>
        @if (current.supersededBy; as successor) {
          <p class="superseded" role="status">
            <mat-icon class="material-icons" aria-hidden="true">warning</mat-icon>
            This sheet was superseded on {{ dateText(successor.issueDate) }} by
            <a [routerLink]="['/documents', successor.id]">{{ successor.reportNumber }}</a>. Use the newer sheet.
          </p>
        }
        <dl>
          <dt>State</dt>
          <dd>{{ stateLabels[current.state] }}</dd>
          <dt>Test</dt>
          <dd><a [routerLink]="['/tests', current.testId]">{{ current.testTitle }}</a></dd>
          <dt>Customer</dt>
          <dd>{{ current.organisationName }}</dd>
          <dt>Issued</dt>
          <dd>{{ dateText(current.issueDate) }}</dd>
          <dt>Revision</dt>
          <dd>{{ current.revision }}</dd>
          @if (current.supersedes; as previous) {
            <dt>Replaces</dt>
            <dd>
              <a [routerLink]="['/documents', previous.id]">{{ previous.reportNumber }}</a> of {{ dateText(previous.issueDate) }}
              @if (current.revisionReason) {
                — {{ current.revisionReason }}
              }
            </dd>
          }
          <dt>Authorised by</dt>
          <dd>{{ current.authorisedBy.name }}, {{ roleLabel(current.authorisedBy.role) }}</dd>
          <dt>File</dt>
          <dd>PDF, {{ current.pageCount }} page(s), {{ size(current.size) }}</dd>
          <dt>SHA-256</dt>
          <dd><code class="hash">{{ current.sha256 }}</code></dd>
          <dt>Public check</dt>
          <dd><a [routerLink]="['/verify', current.reportNumber]">Check a copy of {{ current.reportNumber }}</a></dd>
        </dl>
        <p class="caution" role="note">{{ current.caution }}</p>
      }
      <tw-safety-notice />
    </section>
  `,
  styles: `
    dl {
      display: grid;
      grid-template-columns: max-content 1fr;
      gap: 8px 24px;
      max-width: 900px;
    }
    dt {
      color: var(--mat-sys-on-surface-variant);
    }
    dd {
      margin: 0;
    }
    .hash {
      overflow-wrap: anywhere;
    }
    .superseded {
      display: flex;
      align-items: center;
      gap: 8px;
      padding: 8px 16px;
      border-radius: var(--mat-sys-corner-small);
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    .caution {
      font: var(--mat-sys-body-small);
      margin: 16px 0;
      max-width: 900px;
    }
    tw-safety-notice {
      display: block;
      margin-top: 24px;
    }
  `,
})
export class DocumentPage {
  /** Route parameter: the sheet's id. */
  readonly id = input.required<string>();

  private readonly api = inject(ApprovalApi);

  protected readonly sheet = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.sheet(params) });
  protected readonly notFound = computed(() => {
    const status = problemStatus(resourceCause(this.sheet.error()));
    // A malformed id is refused as 400; to the reader it is the same missing sheet.
    return status === 404 || status === 400;
  });
  protected readonly stateLabels = sheetStateLabels;
  protected readonly dateText = issueDateText;

  protected roleLabel(role: string): string {
    return roleLabels[role as Role] ?? role;
  }

  protected size(bytes: number): string {
    return fileSizeText(bytes);
  }

  protected message(error: unknown): string {
    return problemMessage(resourceCause(error), 'The result sheet could not be loaded.');
  }
}
