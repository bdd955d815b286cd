import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import type { ReferenceAreaKind } from '@tunnelwright/contracts';
import { CatalogueApi } from '../core/catalogue-api';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { focusFirstInvalid } from '../shared/focus-first-invalid';
import { BookingApi } from './booking-api';
import { articleForm, bookingRequestForm, bookingRequestOf } from './booking-request-form';
import { userTimeZone } from './lab-time';
import { referenceAreaKindLabels } from './reference-area-kind-labels';
import { TunnelOccupancyWeek } from './tunnel-occupancy-week';

/** A customer asks for tunnel time: tunnel, service, period, articles and test plan. */
@Component({
  selector: 'tw-booking-request-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatIconModule, MatProgressBarModule, ErrorBanner, TunnelOccupancyWeek],
  templateUrl: './booking-request-page.html',
  styles: `
    form {
      display: flex;
      flex-direction: column;
      gap: 4px;
      max-width: 860px;
    }
    .row {
      display: flex;
      flex-wrap: wrap;
      gap: 12px;
      align-items: baseline;
    }
    .row > mat-form-field {
      flex: 1 1 220px;
    }
    fieldset {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: var(--mat-sys-corner-small);
      padding: 8px 16px;
      margin: 0 0 12px;
    }
    .zone {
      color: var(--mat-sys-on-surface-variant);
      margin: 0 0 8px;
    }
    .form-error {
      color: var(--mat-sys-error);
    }
  `,
})
export class BookingRequestPage {
  private readonly bookings = inject(BookingApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly form = bookingRequestForm();
  protected readonly areaKinds = Object.entries(referenceAreaKindLabels) as [ReferenceAreaKind, string][];
  protected readonly tunnels = rxResource({ stream: () => this.catalogue.tunnels() });
  protected readonly services = rxResource({ stream: () => this.catalogue.services() });
  protected readonly settings = rxResource({ stream: () => this.bookings.settings() });
  private readonly tunnelId = toSignal(this.form.controls.tunnelId.valueChanges, { initialValue: null });
  protected readonly servicesOnTunnel = computed(() => {
    const tunnelId = this.tunnelId();
    return (this.services.hasValue() ? this.services.value() : []).filter((service) => !service.tunnelId || service.tunnelId === tunnelId);
  });
  protected readonly chosenTunnel = computed(() => (this.tunnels.hasValue() ? this.tunnels.value() : []).find((tunnel) => tunnel.id === this.tunnelId()) ?? null);
  protected readonly labZone = computed(() => (this.settings.hasValue() ? this.settings.value().timeZone : null));
  protected readonly viewerZone = userTimeZone();
  protected readonly loadError = computed(() => {
    const error = this.tunnels.error() ?? this.settings.error() ?? this.services.error();
    return error ? problemMessage(error.cause ?? error, 'The tunnels and booking rules could not be loaded.') : null;
  });
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected get articles() {
    return this.form.controls.articles;
  }

  protected reload(): void {
    this.tunnels.reload();
    this.services.reload();
    this.settings.reload();
  }

  protected addArticle(): void {
    this.articles.push(articleForm());
  }

  protected removeArticle(index: number): void {
    this.articles.removeAt(index);
  }

  protected submit(): void {
    const zone = this.labZone();
    if (this.form.invalid || !zone) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    this.sending.set(true);
    this.sendError.set(null);
    this.bookings.request(bookingRequestOf(this.form, zone)).subscribe({
      next: (booking) => {
        this.sending.set(false);
        this.snackBar.open(`Request sent for ${booking.tunnelName}. The slot is held while the lab answers.`, undefined, { duration: 6000 });
        void this.router.navigate(['/bookings']);
      },
      error: (error: unknown) => {
        this.sending.set(false);
        const fields = problemFieldErrors(error).map((field) => field.message);
        this.sendError.set([problemMessage(error, 'The request could not be sent.'), ...fields].join(' '));
      },
    });
  }
}
