import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import type { ReductionView } from '@tunnelwright/contracts';
import { of } from 'rxjs';
import { AuthService } from '../core/auth-service';
import { problemMessage } from '../core/problem-message';
import { SafetyNotice } from '../core/safety-notice';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { CdYawChart } from './cd-yaw-chart';
import { IngestApi } from './ingest-api';
import { PointsTable } from './points-table';
import { ReReduceForm } from './re-reduce-form';
import { ReductionProgress } from './reduction-progress';
import { reductionStateLabels, runKindLabels, warningText } from './run-labels';
import { fileSizeText } from '../shared/file-size-text';
import { VersionComparison } from './version-comparison';

/** One run: its raw files with SHA-256 and download, its reduction versions, the chosen version's points and chart. */
@Component({
  selector: 'tw-run-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    FormsModule,
    RouterLink,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
    CdYawChart,
    EmptyState,
    ErrorBanner,
    PointsTable,
    ReReduceForm,
    ReductionProgress,
    SafetyNotice,
    VersionComparison,
  ],
  templateUrl: './run-page.html',
  styleUrl: './run-page.scss',
})
export class RunPage {
  /** Route parameter: the run's id. */
  readonly id = input.required<string>();

  private readonly api = inject(IngestApi);
  private readonly role = inject(AuthService).role;

  /** Whether the caller may reduce the run again. */
  protected readonly canReduceAgain = computed(() => this.role() === 'analyst' || this.role() === 'lab_manager');
  protected readonly run = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.run(params) });
  protected readonly reductions = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.reductions(params) });
  private readonly versions = computed(() => (this.reductions.hasValue() ? this.reductions.value() : []));
  /** The version shown; the newest until the analyst picks another. */
  protected readonly selectedId = linkedSignal(() => this.versions()[0]?.id ?? null);
  protected readonly selected = computed(() => this.versions().find((r) => r.id === this.selectedId()) ?? null);
  protected readonly points = rxResource({
    params: () => {
      const chosen = this.selected();
      return chosen?.state === 'done' ? chosen.id : undefined;
    },
    stream: ({ params }) => (params ? this.api.points(params) : of(undefined)),
  });
  protected readonly downloadError = signal('');
  protected readonly kindLabels = runKindLabels;
  protected readonly stateLabels = reductionStateLabels;
  protected readonly warningText = warningText;
  protected readonly sizeText = fileSizeText;
  protected readonly message = (error: unknown, what: string) => problemMessage(error, `The ${what} could not be loaded.`);

  /** A new version was queued: list it and show it while it reduces. */
  protected versionCreated(reduction: ReductionView): void {
    this.reductions.update((list) => [reduction, ...(list ?? [])]);
    this.selectedId.set(reduction.id);
  }

  /** The queued or running version finished: fetch the list again so state and point count are current. */
  protected refreshVersions(): void {
    this.reductions.reload();
  }

  /** Fetches the raw file through the signed-in session and hands it to the browser as a download. */
  protected download(fileId: string, name: string): void {
    this.downloadError.set('');
    this.api.rawFile(this.id(), fileId).subscribe({
      next: ({ blob }) => {
        const url = URL.createObjectURL(blob);
        const link = document.createElement('a');
        link.href = url;
        link.download = name;
        link.click();
        URL.revokeObjectURL(url);
      },
      error: (error: unknown) => this.downloadError.set(problemMessage(error, 'The file could not be downloaded.')),
    });
  }
}
