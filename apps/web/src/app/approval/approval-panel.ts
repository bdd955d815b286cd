import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { ResultSheet, RunKind, Submission } from '@tunnelwright/contracts';
import { of } from 'rxjs';
import { AuthService } from '../core/auth-service';
import { problemMessage } from '../core/problem-message';
import { runKindLabels } from '../testing-runs/run-labels';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { ApprovalApi } from './approval-api';
import { submissionStateText } from './approval-labels';
import { decisionBlock, issueBlock, type Caller } from './approval-rules';
import { DecisionDialog, type DecisionDialogData } from './decision-dialog';
import { IssueDialog, type IssueDialogData } from './issue-dialog';
import { SheetList } from './sheet-list';
import { SubmitDialog } from './submit-dialog';
import { resourceCause } from './resource-error';

/**
 * A test's way to a certified sheet, for laboratory staff: submissions for approval with who decided what and why,
 * the decisions the caller may take (or why not), issue of the sheet, and the sheets issued so far.
 */
@Component({
  selector: 'tw-approval-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatButtonModule, MatCardModule, MatIconModule, MatProgressBarModule, EmptyState, ErrorBanner, SheetList],
  templateUrl: './approval-panel.html',
  styles: `
    :host {
      display: block;
    }
    .heading {
      display: flex;
      align-items: center;
      gap: 16px;
      flex-wrap: wrap;
    }
    .heading h2 {
      flex: 1 1 auto;
    }
    .submissions {
      display: grid;
      gap: 12px;
    }
    .state {
      font-weight: 500;
    }
    .state[data-state='awaiting_approval'] {
      color: var(--mat-sys-tertiary);
    }
    .state[data-state='sent_back'] {
      color: var(--mat-sys-error);
    }
    .state[data-state='approved'] {
      color: var(--mat-sys-primary);
    }
    dl {
      display: grid;
      grid-template-columns: max-content 1fr;
      gap: 4px 16px;
      margin: 8px 0;
    }
    dt {
      color: var(--mat-sys-on-surface-variant);
    }
    dd {
      margin: 0;
      white-space: pre-line;
    }
    .actions {
      display: flex;
      gap: 8px;
      flex-wrap: wrap;
      align-items: center;
    }
    .why {
      display: flex;
      gap: 8px;
      align-items: center;
      color: var(--mat-sys-on-surface-variant);
      margin: 4px 0;
    }
    .caution {
      font: var(--mat-sys-body-small);
      margin-top: 8px;
    }
  `,
})
export class ApprovalPanel {
  /** The test's id. */
  readonly testId = input.required<string>();
  /** Emitted after a submission, decision or issue, so the page can refresh where the test stands. */
  readonly changed = output<void>();

  private readonly api = inject(ApprovalApi);
  private readonly auth = inject(AuthService);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  private readonly role = this.auth.role;
  /** Technicians and analysts put results forward; the server checks again. */
  protected readonly maySubmit = computed(() => this.role() === 'technician' || this.role() === 'analyst');

  protected readonly submissions = rxResource({ params: () => this.testId(), stream: ({ params }) => this.api.submissions(params) });
  protected readonly sheets = rxResource({ params: () => this.testId(), stream: ({ params }) => this.api.sheets(params) });
  protected readonly signingRight = rxResource({
    params: () => this.role(),
    // Only analysts and lab managers can hold a signing right; nobody else needs to ask.
    stream: ({ params }) => (params === 'analyst' || params === 'lab_manager' ? this.api.mySigningRight() : of({ holds: false, right: null })),
  });

  protected readonly caller = computed<Caller | null>(() => {
    const user = this.auth.user();
    if (!user) return null;
    return { id: user.id, role: user.role, holdsSigningRight: this.signingRight.hasValue() && this.signingRight.value().holds };
  });
  protected readonly awaiting = computed(() => (this.submissions.hasValue() ? this.submissions.value() : []).some((s) => s.state === 'awaiting_approval'));
  protected readonly validSheet = computed(() => (this.sheets.hasValue() ? this.sheets.value() : []).find((sheet) => sheet.state === 'valid') ?? null);
  protected readonly caution = computed(() => (this.sheets.hasValue() ? (this.sheets.value()[0]?.caution ?? '') : ''));
  protected readonly stateText = submissionStateText;

  protected kindLabel(kind: string): string {
    return runKindLabels[kind as RunKind] ?? kind;
  }

  protected decisionBlock(submission: Submission): string | null {
    const caller = this.caller();
    return caller && this.signingRight.hasValue() ? decisionBlock(submission, caller) : null;
  }

  protected issueBlock(submission: Submission): string | null {
    const caller = this.caller();
    return caller && this.signingRight.hasValue() ? issueBlock(submission, caller, this.submissions.hasValue() ? this.submissions.value() : []) : null;
  }

  /** Whether the caller's rights are known, so the decision buttons or the reason they are missing can be shown. */
  protected readonly rightsKnown = computed(() => this.signingRight.hasValue());

  protected message(error: unknown, what: string): string {
    return problemMessage(resourceCause(error), `The ${what} could not be loaded.`);
  }

  protected submit(): void {
    this.dialog
      .open(SubmitDialog, { data: this.testId(), width: '560px', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((submission: Submission | undefined) => {
        if (submission) {
          this.snackBar.open(`Submission ${submission.sequence} is waiting for approval.`, undefined, { duration: 5000 });
          this.submissions.reload();
          this.changed.emit();
        }
      });
  }

  protected decide(submission: Submission, decision: DecisionDialogData['decision']): void {
    this.dialog
      .open(DecisionDialog, { data: { submission, decision } satisfies DecisionDialogData, width: '520px', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((decided: Submission | undefined) => {
        if (decided) {
          this.snackBar.open(decided.state === 'approved' ? `Submission ${decided.sequence} approved.` : `Submission ${decided.sequence} sent back.`, undefined, {
            duration: 5000,
          });
          this.submissions.reload();
          this.changed.emit();
        }
      });
  }

  protected issue(submission: Submission): void {
    const replaces = this.validSheet();
    this.dialog
      .open(IssueDialog, { data: { submission, replaces } satisfies IssueDialogData, width: '560px', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((sheet: ResultSheet | undefined) => {
        if (sheet) {
          this.snackBar.open(`${sheet.reportNumber} issued and sent to the customer.`, undefined, { duration: 6000 });
          this.submissions.reload();
          this.sheets.reload();
          this.changed.emit();
        }
      });
  }
}
