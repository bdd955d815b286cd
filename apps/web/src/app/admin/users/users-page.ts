import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatMenuModule } from '@angular/material/menu';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { roleLabels, type UserSummary } from '@tunnelwright/contracts';
import { debounceTime, distinctUntilChanged, filter } from 'rxjs';
import { AuthService } from '../../core/auth-service';
import { problemMessage } from '../../core/problem-message';
import { ConfirmDialog, ConfirmDialogData } from '../../shared/confirm-dialog';
import { EmptyState } from '../../shared/empty-state';
import { ErrorBanner } from '../../shared/error-banner';
import { ChangeRoleDialog } from './change-role-dialog';
import { InviteDialog } from './invite-dialog';
import { UserQuery, UserSortField, UsersApi } from './users-api';

const sortable: readonly UserSortField[] = ['name', 'email', 'role', 'createdAt'];

/** Lab managers' list of accounts: search, sort and page on the server; invite, change role, (de)activate. */
@Component({
  selector: 'tw-users-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    ReactiveFormsModule,
    MatTableModule,
    MatSortModule,
    MatPaginatorModule,
    MatFormFieldModule,
    MatInputModule,
    MatButtonModule,
    MatIconModule,
    MatMenuModule,
    MatProgressBarModule,
    EmptyState,
    ErrorBanner,
  ],
  templateUrl: './users-page.html',
  styleUrl: './users-page.scss',
})
export class UsersPage {
  private readonly api = inject(UsersApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly auth = inject(AuthService);

  protected readonly columns = ['name', 'email', 'organisation', 'role', 'status', 'createdAt', 'actions'];
  protected readonly pageSizes = [10, 25, 50];
  protected readonly search = new FormControl('', { nonNullable: true });
  protected readonly query = signal<UserQuery>({ q: '', sort: 'name', order: 'asc', page: 1, pageSize: 10 });
  protected readonly users = rxResource({ params: () => this.query(), stream: ({ params }) => this.api.list(params) });

  protected readonly rows = computed(() => (this.users.hasValue() ? this.users.value().items : []));
  protected readonly total = computed(() => (this.users.hasValue() ? this.users.value().total : 0));
  protected readonly loadError = computed(() => {
    const error = this.users.error();
    return error ? problemMessage(error.cause ?? error, 'The users could not be loaded.') : null;
  });
  protected readonly busyUserId = signal<string | null>(null);
  protected readonly myId = computed(() => this.auth.user()?.id ?? null);

  constructor() {
    this.search.valueChanges
      .pipe(
        debounceTime(300),
        filter(() => this.search.valid),
        distinctUntilChanged(),
        takeUntilDestroyed(),
      )
      .subscribe((q) => this.query.update((current) => ({ ...current, q: q.trim(), page: 1 })));
  }

  protected sortBy(sort: Sort): void {
    const field = sortable.find((name) => name === sort.active) ?? 'name';
    const order = sort.direction === 'desc' ? 'desc' : 'asc';
    this.query.update((current) => ({ ...current, sort: sort.direction ? field : 'name', order, page: 1 }));
  }

  protected turnPage(event: PageEvent): void {
    this.query.update((current) => ({ ...current, page: event.pageIndex + 1, pageSize: event.pageSize }));
  }

  protected roleLabel(user: UserSummary): string {
    return roleLabels[user.role];
  }

  protected status(user: UserSummary): string {
    if (!user.active) {
      return 'Deactivated';
    }
    return user.activated ? 'Active' : 'Invited';
  }

  protected invite(): void {
    this.dialog
      .open(InviteDialog, { width: '520px', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((email: string | undefined) => {
        if (email) {
          this.snackBar.open(`Invitation sent to ${email}.`, undefined, { duration: 5000 });
          this.users.reload();
        }
      });
  }

  protected changeRole(user: UserSummary): void {
    this.dialog
      .open(ChangeRoleDialog, { data: user, width: '420px' })
      .afterClosed()
      .subscribe((updated: UserSummary | undefined) => {
        if (updated) {
          this.snackBar.open(`${updated.name} is now ${roleLabels[updated.role]}.`, undefined, { duration: 4000 });
          this.users.reload();
        }
      });
  }

  protected setActive(user: UserSummary, active: boolean): void {
    const data: ConfirmDialogData = active
      ? {
          title: `Reactivate ${user.name}?`,
          message: `${user.name} will be able to sign in again with their existing password.`,
          confirmLabel: 'Reactivate',
        }
      : {
          title: `Deactivate ${user.name}?`,
          message: `${user.name} will be signed out and cannot sign in until reactivated. Their records stay.`,
          confirmLabel: 'Deactivate',
          destructive: true,
        };
    this.dialog
      .open(ConfirmDialog, { data, width: '420px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (!confirmed) {
          return;
        }
        this.busyUserId.set(user.id);
        this.api.update(user.id, { active }).subscribe({
          next: () => {
            this.busyUserId.set(null);
            this.snackBar.open(`${user.name} ${active ? 'reactivated' : 'deactivated'}.`, undefined, { duration: 4000 });
            this.users.reload();
          },
          error: (error: unknown) => {
            this.busyUserId.set(null);
            this.snackBar.open(problemMessage(error, 'The change could not be saved.'), 'Dismiss', { duration: 8000 });
          },
        });
      });
  }
}
