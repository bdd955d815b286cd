import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import type { SavedImportProfile } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ConfirmDialog, type ConfirmDialogData } from '../shared/confirm-dialog';
import { ErrorBanner } from '../shared/error-banner';
import { ImportProfilesApi } from './import-profiles-api';
import { profileChanges } from './profile-json';

/** The lab's import profiles: what each changes about a file, with editing and archiving. */
@Component({
  selector: 'tw-import-profiles-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule, MatSlideToggleModule, MatTableModule, ErrorBanner],
  templateUrl: './import-profiles-page.html',
  styleUrl: './import-profiles-page.scss',
})
export class ImportProfilesPage {
  private readonly api = inject(ImportProfilesApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly columns = ['name', 'description', 'changes', 'actions'];
  /** Whether archived profiles are listed too. */
  protected readonly showArchived = signal(false);
  protected readonly profiles = rxResource({ params: () => this.showArchived(), stream: ({ params }) => this.api.list(params) });
  protected readonly rows = computed(() => (this.profiles.hasValue() ? this.profiles.value() : []));
  protected readonly loadError = computed(() => {
    const error = this.profiles.error();
    return error ? problemMessage(error.cause ?? error, 'The import profiles could not be loaded.') : null;
  });
  /** The profile whose archiving is being saved. */
  protected readonly busyId = signal<string | null>(null);
  protected readonly changes = (profile: SavedImportProfile) => profileChanges(profile.profile).join(' · ');

  /** Asks, then archives the profile: it can no longer be chosen, and reductions that used it keep their copy. */
  protected archive(profile: SavedImportProfile): void {
    const data: ConfirmDialogData = {
      title: `Archive ${profile.name}?`,
      message: 'It can no longer be chosen to read files. Reductions that used it keep the copy they were read with. An archived profile cannot be edited or restored; save a new one instead.',
      confirmLabel: 'Archive',
      destructive: true,
    };
    this.dialog
      .open(ConfirmDialog, { data, width: '440px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (!confirmed) return;
        this.busyId.set(profile.id);
        this.api.archive(profile.id).subscribe({
          next: () => {
            this.busyId.set(null);
            this.snackBar.open(`${profile.name} archived.`, undefined, { duration: 4000 });
            this.profiles.reload();
          },
          error: (error: unknown) => {
            this.busyId.set(null);
            this.snackBar.open(problemMessage(error, 'The profile could not be archived.'), 'Dismiss', { duration: 8000 });
          },
        });
      });
  }
}
