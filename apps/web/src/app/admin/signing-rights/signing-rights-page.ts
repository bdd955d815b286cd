import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { roleLabels, type Role, type SigningRight } from '@tunnelwright/contracts';
import { ApprovalApi } from '../../approval/approval-api';
import { problemMessage } from '../../core/problem-message';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { openReasonDialog } from '../../shared/reason-dialog';
import { GrantSigningRightDialog } from './grant-signing-right-dialog';
import { SigningRightsTable } from './signing-rights-table';

/** Lab managers' list of who may approve results and sign sheets, the rights removed before, and grant and removal. */
@Component({
  selector: 'tw-signing-rights-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatButtonModule, MatIconModule, MatProgressBarModule, MatTableModule, EmptyState, ErrorBanner, SigningRightsTable],
  templateUrl: './signing-rights-page.html',
  styles: `
    h2 {
      margin-top: 24px;
    }
    .why {
      white-space: pre-line;
    }
  `,
})
export class SigningRightsPage {
  private readonly api = inject(ApprovalApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly currentColumns = ['name', 'role', 'scopeNote', 'granted', 'actions'];
  protected readonly historyColumns = ['name', 'scopeNote', 'granted', 'revoked', 'reason'];
  protected readonly rights = rxResource({ stream: () => this.api.signingRights() });
  protected readonly current = computed(() => (this.rights.hasValue() ? this.rights.value().filter((right) => right.revokedAt === null) : []));
  protected readonly history = computed(() => (this.rights.hasValue() ? this.rights.value().filter((right) => right.revokedAt !== null) : []));
  protected readonly loadError = computed(() => {
    const error = this.rights.error();
    return error ? problemMessage(error.cause ?? error, 'The signing rights could not be loaded.') : null;
  });

  protected roleLabel(role: string): string {
    return roleLabels[role as Role] ?? role;
  }

  protected grant(): void {
    const holders = new Set(this.current().map((right) => right.user.id));
    this.dialog
      .open(GrantSigningRightDialog, { data: holders, width: '520px', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((right: SigningRight | undefined) => {
        if (right) {
          this.snackBar.open(`${right.user.name} now holds a signing right.`, undefined, { duration: 5000 });
          this.rights.reload();
        }
      });
  }

  protected revoke(right: SigningRight): void {
    openReasonDialog(this.dialog, {
      title: `Remove the signing right of ${right.user.name}?`,
      message: `${right.user.name} will no longer approve results or issue sheets. Sheets they signed stay valid, and the history keeps the right and the reason.`,
      missingReason: 'Say why the right is removed',
      cancelLabel: 'Keep the right',
      confirmLabel: 'Remove signing right',
      destructive: true,
      send: (reason) => this.api.revokeSigningRight(right.id, reason),
      failure: 'The signing right could not be removed.',
    }).subscribe((removed) => {
      if (removed) {
        this.snackBar.open(`The signing right of ${removed.user.name} was removed.`, undefined, { duration: 5000 });
        this.rights.reload();
      }
    });
  }
}
