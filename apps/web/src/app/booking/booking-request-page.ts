import { ChangeDetectionStrategy, Component, ElementRef, computed, effect, inject, input, signal, untracked, type OnInit } from '@angular/core';
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
import type { Booking, ReferenceAreaKind } from '@tunnelwright/contracts';
import { of } from 'rxjs';
import { CatalogueApi } from '../core/catalogue-api';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { focusFirstInvalid } from '../shared/focus-first-invalid';
import { PlannerApi } from '../planner/planner-api';
import { AttachmentPicker } from './attachment-picker';
import { AttachmentQueue } from './attachment-queue';
import { BookingApi } from './booking-api';
import type { FreeSlot } from './calendar-grid';
import { articleForm, bookingRequestForm, bookingRequestOf } from './booking-request-form';
import { formatPeriod, localValueAfterHours, localValueOf, userTimeZone } from './lab-time';
import { referenceAreaKindLabels } from './reference-area-kind-labels';
import { TunnelOccupancyWeek } from './tunnel-occupancy-week';

/**
 * A customer asks for tunnel time: tunnel, service, period, articles, test plan, optionally one of their saved plans
 * (whose tunnel hours set the end from the start), and drawings or photos sent once the request exists.
 */
@Component({
  selector: 'tw-booking-request-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatIconModule, MatProgressBarModule, ErrorBanner, TunnelOccupancyWeek, AttachmentPicker],
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
    .plan-hint {
      color: var(--mat-sys-on-surface-variant);
      margin: 8px 0;
    }
  `,
})
export class BookingRequestPage implements OnInit {
  private readonly bookings = inject(BookingApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly planner = inject(PlannerApi);

  /** A saved plan to start from, from the page's `?planId=`. */
  readonly planId = input<string>();

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
  /** What choosing a free stretch did to the period, announced to screen readers. */
  protected readonly slotNote = signal('');
  protected readonly sending = signal(false);
  protected readonly sendError = signal<string | null>(null);

  protected readonly plans = rxResource({ stream: () => this.planner.plans() });
  protected readonly plansError = computed(() => {
    const error = this.plans.error();
    return error ? problemMessage(error.cause ?? error, 'Your saved plans could not be loaded.') : null;
  });
  private readonly chosenPlanId = toSignal(this.form.controls.planId.valueChanges, { initialValue: null });
  protected readonly chosenPlan = rxResource({
    params: () => this.chosenPlanId() ?? undefined,
    stream: ({ params }) => (params ? this.planner.plan(params) : of(undefined)),
  });
  protected readonly chosenPlanError = computed(() => {
    const error = this.chosenPlan.error();
    return error ? problemMessage(error.cause ?? error, 'The chosen plan could not be opened.') : null;
  });
  /** Tunnel hours the chosen plan's evaluation estimates. */
  protected readonly planHours = computed(() => (this.chosenPlan.hasValue() ? (this.chosenPlan.value()?.evaluation.duration.hours ?? null) : null));
  private readonly start = toSignal(this.form.controls.start.valueChanges, { initialValue: '' });

  private readonly queue = new AttachmentQueue(this.bookings);
  protected readonly uploads = this.queue.uploads;
  protected readonly refusals = this.queue.refusals;
  /** The request once the lab has it; files are attached to it, and a retry sends only what failed. */
  protected readonly created = signal<Booking | null>(null);
  protected readonly uploadError = computed(() => {
    const failed = this.queue.failed();
    if (!this.created() || this.queue.busy() || failed === 0) return null;
    return `The request was sent, but ${failed === 1 ? 'one file' : `${failed} files`} could not be attached.`;
  });

  constructor() {
    // The end follows from the start whenever a chosen plan says how long the test takes.
    effect(() => {
      const hours = this.planHours();
      const start = this.start();
      if (hours === null || !start) return;
      const end = localValueAfterHours(start, hours);
      if (end) untracked(() => this.form.controls.end.setValue(end));
    });
  }

  ngOnInit(): void {
    const planId = this.planId();
    if (planId) this.form.controls.planId.setValue(planId);
  }

  /** Makes a free stretch chosen on the tunnel's week the period; with a saved plan, the end then follows the plan. */
  protected useFreeSlot(slot: FreeSlot): void {
    const zone = this.labZone();
    if (!zone) return;
    const { start, end } = this.form.controls;
    start.setValue(localValueOf(slot.start, zone));
    end.setValue(localValueOf(slot.end, zone));
    start.markAsTouched();
    end.markAsTouched();
    const hours = this.planHours();
    const chosen = formatPeriod(slot, zone, zone);
    this.slotNote.set(hours === null ? `Period set to ${chosen}.` : `Start set from the free time ${chosen}; the end follows the plan’s ${hours} h.`);
  }

  protected planLabel(name: string, bookingId: string | null): string {
    return bookingId ? `${name} (attached to a booking)` : name;
  }

  protected addFiles(files: File[]): void {
    this.queue.add(files);
  }

  protected removeFile(key: number): void {
    this.queue.remove(key);
  }

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
    if (this.created()) {
      this.sendFiles();
      return;
    }
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
        this.created.set(booking);
        this.sendFiles();
      },
      error: (error: unknown) => {
        this.sending.set(false);
        const fields = problemFieldErrors(error).map((field) => field.message);
        this.sendError.set([problemMessage(error, 'The request could not be sent.'), ...fields].join(' '));
      },
    });
  }

  /** Sends every file not yet stored, each in its own call so each shows its own progress; then opens the list. */
  protected sendFiles(): void {
    const booking = this.created();
    if (booking) this.queue.send(booking.id, { allStored: () => this.finish(booking) });
  }

  private finish(booking: Booking): void {
    const files = this.uploads().length;
    const attached = files === 0 ? '' : ` with ${files === 1 ? 'one file' : `${files} files`}`;
    this.snackBar.open(`Request sent for ${booking.tunnelName}${attached}. The slot is held while the lab answers.`, undefined, { duration: 6000 });
    void this.router.navigate(['/bookings']);
  }
}
