import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import type { Run } from '@tunnelwright/contracts';
import { from, mergeMap } from 'rxjs';
import { problemMessage, problemStatus } from '../core/problem-message';
import { SafetyNotice } from '../core/safety-notice';
import { ImportProfilesApi } from '../import-profiles/import-profiles-api';
import { ErrorBanner } from '../shared/error-banner';
import { FileDropZone } from '../shared/file-drop-zone';
import { IngestApi } from './ingest-api';
import { NewRunForm } from './new-run-form';
import { runKindLabels } from './run-labels';
import { isReadyToUpload, type UploadItem } from './upload-item';
import { UploadList } from './upload-list';

/** How many files are sent at the same time. */
const PARALLEL_UPLOADS = 2;

/** The 409 body of a file the run already holds. */
interface DuplicateProblem {
  readonly detail?: string;
  readonly existing?: { readonly runId: string };
}

/**
 * Uploading run files for a technician: choose or create the run, drop files, check each one through the preview
 * before anything is kept, then send them with a progress bar each and follow their reductions.
 */
@Component({
  selector: 'tw-upload-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    FormsModule,
    RouterLink,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
    ErrorBanner,
    FileDropZone,
    NewRunForm,
    SafetyNotice,
    UploadList,
  ],
  templateUrl: './upload-page.html',
  styles: `
    :host {
      display: block;
      padding: 16px 24px;
      max-width: 1100px;
    }
    section {
      margin-bottom: 24px;
    }
    .read-with {
      display: block;
      max-width: 420px;
    }
    .actions {
      display: flex;
      gap: 16px;
      align-items: center;
      margin-top: 8px;
    }
  `,
})
export class UploadPage {
  /** Route parameter: the test's id. */
  readonly id = input.required<string>();

  private readonly api = inject(IngestApi);
  private readonly profilesApi = inject(ImportProfilesApi);
  private nextKey = 1;

  protected readonly test = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.test(params) });
  protected readonly runs = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.runs(params) });
  protected readonly runId = signal<string | null>(null);
  /** The saved, unarchived import profiles a file may be read with. */
  protected readonly profiles = rxResource({ stream: () => this.profilesApi.list(false) });
  protected readonly profileChoices = computed(() => (this.profiles.hasValue() ? this.profiles.value() : []));
  /** The import profile the files are checked and uploaded with; null for the standard run-file format. */
  protected readonly profileId = signal<string | null>(null);
  protected readonly items = signal<readonly UploadItem[]>([]);
  protected readonly title = computed(() => (this.test.hasValue() ? this.test.value().title : 'Test'));
  protected readonly configurations = computed(() => (this.test.hasValue() ? this.test.value().configurations.map((c) => c.label) : []));
  protected readonly readyCount = computed(() => this.items().filter(isReadyToUpload).length);
  protected readonly busy = computed(() => this.items().some((item) => item.phase === 'uploading' || item.phase === 'checking'));
  protected readonly kindLabels = runKindLabels;
  protected readonly message = (error: unknown, what: string) => problemMessage(error, `The ${what} could not be loaded.`);

  /** Reads every file not yet sent again with the newly chosen profile, so what is uploaded is what was checked. */
  protected readWith(profileId: string | null): void {
    this.profileId.set(profileId);
    for (const item of this.items()) {
      if (item.phase === 'checked' || item.phase === 'check-failed') this.check(item.key, item.file);
    }
  }

  protected runCreated(run: Run): void {
    this.runs.update((runs) => [...(runs ?? []), run]);
    this.runId.set(run.id);
  }

  /** Adds files to the list and checks each through the preview; nothing is kept by the server yet. */
  protected addFiles(files: readonly File[]): void {
    for (const file of files) {
      const key = this.nextKey++;
      this.items.update((items) => [...items, { key, file, phase: 'checking', preview: null, progress: 0, message: '', reductionId: null, existingRunId: null }]);
      this.check(key, file);
    }
  }

  private check(key: number, file: File): void {
    this.patch(key, { phase: 'checking', preview: null, message: '' });
    this.api.preview(file, this.profileId() ?? undefined).subscribe({
      next: (preview) => this.patch(key, { phase: 'checked', preview, message: preview.valid ? '' : `${preview.issues.length} issue(s) found` }),
      error: (error: unknown) => this.patch(key, { phase: 'check-failed', message: problemMessage(error, 'The file could not be checked.') }),
    });
  }

  protected removeItem(key: number): void {
    this.items.update((items) => items.filter((item) => item.key !== key));
  }

  /** Sends every checked file to the chosen run, a few at a time. */
  protected uploadAll(): void {
    const runId = this.runId();
    if (!runId) return;
    const ready = this.items().filter(isReadyToUpload);
    for (const item of ready) this.patch(item.key, { phase: 'uploading', progress: 0, message: '' });
    from(ready)
      .pipe(mergeMap((item) => this.sendOne(runId, item), PARALLEL_UPLOADS))
      .subscribe();
  }

  private sendOne(runId: string, item: UploadItem) {
    return new Promise<void>((done) => {
      this.api.upload(runId, item.file, this.profileId() ?? undefined).subscribe({
        next: (event) => {
          if (event.kind === 'progress') {
            this.patch(item.key, { progress: event.fraction });
          } else {
            const reduction = event.result.reduction;
            this.patch(item.key, {
              phase: 'stored',
              progress: 1,
              reductionId: reduction?.id ?? null,
              message: `SHA-256 ${event.result.rawFile.sha256}${reduction ? '' : ' · this kind of run is not reduced'}`,
            });
          }
        },
        error: (error: unknown) => {
          if (problemStatus(error) === 409) {
            const problem = (error as { error?: DuplicateProblem }).error;
            this.patch(item.key, { phase: 'duplicate', message: problem?.detail ?? 'This exact file is already stored.', existingRunId: problem?.existing?.runId ?? runId });
          } else {
            this.patch(item.key, { phase: 'failed', message: problemMessage(error, 'The upload failed. Pick the file again to retry.') });
          }
          done();
        },
        complete: () => done(),
      });
    });
  }

  private patch(key: number, change: Partial<UploadItem>): void {
    this.items.update((items) => items.map((item) => (item.key === key ? { ...item, ...change } : item)));
  }
}
