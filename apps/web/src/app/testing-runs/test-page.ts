import { ChangeDetectionStrategy, Component, computed, inject, input, viewChild } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import type { ReductionState, RunKind } from '@tunnelwright/contracts';
import { progressText } from '../approval/approval-labels';
import { ApprovalPanel } from '../approval/approval-panel';
import { TestAuditPanel } from '../approval/test-audit-panel';
import { AuthService } from '../core/auth-service';
import { problemMessage } from '../core/problem-message';
import { SafetyNotice } from '../core/safety-notice';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { CalibrationNotice } from './calibration-notice';
import { CdYawChart } from './cd-yaw-chart';
import { IngestApi } from './ingest-api';
import { loadRunOverviews } from './run-overview';
import { reductionStateLabels, runKindLabels, testStateLabels } from './run-labels';
import { TestDetailApi } from './test-detail-api';

/** One test: its runs with kind, newest reduction state, point count, warnings and a C_D-versus-yaw sketch. */
@Component({
  selector: 'tw-test-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatChipsModule, MatIconModule, MatProgressBarModule, MatTableModule, CdYawChart, EmptyState, ErrorBanner, SafetyNotice, ApprovalPanel, TestAuditPanel, CalibrationNotice],
  templateUrl: './test-page.html',
  styles: `
    :host {
      display: block;
      padding: 16px 24px;
    }
    table {
      width: 100%;
    }
    .caution {
      font: var(--mat-sys-body-small);
      margin-top: 16px;
    }
    .section {
      margin-top: 32px;
    }
  `,
})
export class TestPage {
  /** Route parameter: the test's id. */
  readonly id = input.required<string>();

  private readonly api = inject(IngestApi);
  private readonly detailApi = inject(TestDetailApi);
  private readonly role = inject(AuthService).role;

  /** Whether the caller is laboratory staff (customers see a run's points only once a signatory approved them). */
  protected readonly isStaff = computed(() => this.role() !== 'customer' && this.role() !== null);
  protected readonly isLabManager = computed(() => this.role() === 'lab_manager');
  protected readonly isTechnician = computed(() => this.role() === 'technician' || this.role() === 'lab_manager');
  protected readonly test = rxResource({ params: () => this.id(), stream: ({ params }) => this.detailApi.test(params) });
  /** Each run with its newest reduction: for staff any version, for customers the newest approved one (the API's rule). */
  protected readonly runs = rxResource({
    params: () => this.id(),
    stream: ({ params }) => loadRunOverviews(this.api, params, true),
  });
  protected readonly columns = computed(() =>
    this.isStaff() ? ['runNumber', 'kind', 'configuration', 'state', 'points', 'warnings', 'chart'] : ['runNumber', 'kind', 'configuration', 'files', 'approved', 'points', 'chart'],
  );
  protected readonly title = computed(() => (this.test.hasValue() ? this.test.value().title : 'Test'));
  protected readonly testState = computed(() => {
    if (!this.test.hasValue()) return '';
    const test = this.test.value();
    // Customers read the stage of their test; staff the test's state and where its approval stands.
    return this.isStaff() ? `${testStateLabels[test.state]} · ${progressText(test.progress, false)}` : progressText(test.progress, true);
  });
  /** The valid sheet of a certified test, for the customer's link to it. */
  protected readonly certifiedSheet = computed(() => {
    const approval = this.test.hasValue() ? this.test.value().progress?.approval : undefined;
    return approval?.sheetId && approval.reportNumber ? { id: approval.sheetId, reportNumber: approval.reportNumber } : null;
  });
  protected readonly caution = computed(() => (this.runs.hasValue() ? this.runs.value() : []).find((row) => row.latest)?.latest?.caution ?? '');
  protected readonly kindLabel = (kind: RunKind) => runKindLabels[kind];
  protected readonly stateLabel = (state: ReductionState) => reductionStateLabels[state];
  protected readonly message = (error: unknown, what: string) => problemMessage(error, `The ${what} could not be loaded.`);
  private readonly auditPanel = viewChild(TestAuditPanel);

  /** Staff's view of the test's balance calibration (the API sends none to customers). */
  protected readonly calibration = computed(() => (this.test.hasValue() ? (this.test.value().calibration ?? null) : null));

  /** After a submission, decision, issue or calibration override: where the test stands and its audit trail have changed. */
  protected approvalChanged(): void {
    this.test.reload();
    this.auditPanel()?.reload();
  }
}
