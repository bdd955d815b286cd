import { DatePipe, DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, input, output, signal } from '@angular/core';
import { rxResource, takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { PlanDetail } from '@tunnelwright/contracts';
import { switchMap } from 'rxjs';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ConfirmDialog, type ConfirmDialogData } from '../shared/confirm-dialog';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { PlannerApi } from './planner-api';

/**
 * A saved plan's certified result: the measured drag area linked from an issued sheet, compared with the saved
 * version's estimate, with the caution. Analysts and lab managers pick a valid sheet of the plan's customer and one
 * of its configurations to link, or unlink after confirming.
 */
@Component({
  selector: 'tw-certified-result-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, DecimalPipe, MatButtonModule, MatFormFieldModule, MatIconModule, MatProgressBarModule, MatSelectModule, EmptyState, ErrorBanner],
  templateUrl: './certified-result-panel.html',
  styleUrl: './certified-result-panel.scss',
})
export class CertifiedResultPanel {
  private readonly api = inject(PlannerApi);
  private readonly dialog = inject(MatDialog);
  private readonly destroyRef = inject(DestroyRef);

  readonly plan = input.required<PlanDetail>();
  /** Whether the caller may link and unlink (analysts and lab managers). */
  readonly canManage = input(false);
  /** The plan as it reads after a link or unlink. */
  readonly changed = output<PlanDetail>();

  protected readonly candidates = rxResource({
    params: () => (this.canManage() ? { id: this.plan().id } : undefined),
    stream: ({ params }) => this.api.certifiedCandidates(params.id),
  });
  protected readonly candidatesError = computed(() => {
    const error = this.candidates.error();
    return error ? problemMessage(error.cause ?? error, 'The result sheets could not be loaded.') : null;
  });
  protected readonly sheets = computed(() => (this.candidates.hasValue() ? this.candidates.value().items : []));

  protected readonly sheetId = signal('');
  protected readonly configurationCode = signal('');
  protected readonly chosenSheet = computed(() => this.sheets().find((sheet) => sheet.sheetId === this.sheetId()) ?? null);
  protected readonly chosenConfiguration = computed(() => this.chosenSheet()?.configurations.find((c) => c.code === this.configurationCode()) ?? null);

  protected readonly working = signal(false);
  protected readonly actionError = signal<string | null>(null);

  protected readonly measured = computed(() => this.plan().measured);
  protected readonly comparison = computed(() => this.plan().evaluation.measured);

  /** A sheet with a single configuration needs no second choice. */
  protected chooseSheet(id: string): void {
    this.actionError.set(null);
    this.sheetId.set(id);
    const configurations = this.sheets().find((sheet) => sheet.sheetId === id)?.configurations ?? [];
    this.configurationCode.set(configurations.length === 1 ? (configurations[0]?.code ?? '') : '');
  }

  protected link(): void {
    const sheetId = this.sheetId();
    const configurationCode = this.configurationCode();
    if (!sheetId || !configurationCode) {
      this.actionError.set(!sheetId ? 'Choose a result sheet.' : 'Choose a configuration of the sheet.');
      return;
    }
    this.working.set(true);
    this.actionError.set(null);
    this.api
      .linkCertified(this.plan().id, { sheetId, configurationCode })
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (plan) => {
          this.working.set(false);
          this.sheetId.set('');
          this.changed.emit(plan);
        },
        error: (error: unknown) => {
          this.working.set(false);
          const fields = problemFieldErrors(error);
          this.actionError.set(fields.length > 0 ? fields.map((f) => f.message).join(' · ') : problemMessage(error, 'The result could not be linked.'));
          this.candidates.reload();
        },
      });
  }

  protected unlink(): void {
    const link = this.measured();
    if (!link) return;
    const data: ConfirmDialogData = {
      title: 'Unlink the certified result?',
      message: `“${this.plan().name}” will no longer be compared with ${link.source}. Its customer stops seeing the comparison; the sheet itself is not changed.`,
      confirmLabel: 'Unlink',
      destructive: true,
    };
    this.dialog
      .open(ConfirmDialog, { data, width: '440px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (!confirmed) return;
        this.working.set(true);
        this.actionError.set(null);
        const id = this.plan().id;
        this.api
          .unlinkCertified(id)
          .pipe(
            switchMap(() => this.api.plan(id)),
            takeUntilDestroyed(this.destroyRef),
          )
          .subscribe({
            next: (plan) => {
              this.working.set(false);
              this.changed.emit(plan);
            },
            error: (error: unknown) => {
              this.working.set(false);
              this.actionError.set(problemMessage(error, 'The result could not be unlinked.'));
            },
          });
      });
  }

  protected magnitude(value: number): number {
    return value < 0 ? -value : value;
  }
}
