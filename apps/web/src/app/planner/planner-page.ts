import { DatePipe } from '@angular/common';
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, Injector, computed, inject, signal } from '@angular/core';
import { rxResource, takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatListModule } from '@angular/material/list';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { Router } from '@angular/router';
import type { FieldError, InstalledBalance, Organisation, PlanDetail, PlanEvaluation, PlanInputDraft, PlanVersion } from '@tunnelwright/contracts';
import { Subject, catchError, debounceTime, distinctUntilChanged, map, merge, of, startWith, switchMap } from 'rxjs';
import { AuthService } from '../core/auth-service';
import { CatalogueApi } from '../core/catalogue-api';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { EmptyState } from '../shared/empty-state';
import { ErrorBanner } from '../shared/error-banner';
import { focusFirstInvalid } from '../shared/focus-first-invalid';
import { numberErrorText } from '../shared/number-error-text';
import { CertifiedResultPanel } from './certified-result-panel';
import { PartsEditor } from './parts-editor';
import { PlanResults } from './plan-results';
import { buildPlanForm, fillPlanForm, planDraftFrom, resetPlanForm } from './plan-form';
import { PlannerApi } from './planner-api';

/** What the results panel shows while the editor changes. */
type EvaluationState =
  | { kind: 'incomplete' }
  | { kind: 'loading' }
  | { kind: 'ready'; evaluation: PlanEvaluation }
  | { kind: 'error'; message: string; fields: readonly FieldError[] };

/** Milliseconds of quiet typing before the plan is evaluated again. */
const EVALUATE_AFTER_MS = 400;

/**
 * The test planner: saved plans of the caller's organisation (all of them for staff), and an editor whose plan is
 * evaluated as it changes. Saving adds a version; older versions are kept.
 */
@Component({
  selector: 'tw-planner-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    ReactiveFormsModule,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatListModule,
    MatProgressBarModule,
    MatSelectModule,
    EmptyState,
    ErrorBanner,
    CertifiedResultPanel,
    PartsEditor,
    PlanResults,
  ],
  templateUrl: './planner-page.html',
  styleUrl: './planner-page.scss',
})
export class PlannerPage {
  private readonly api = inject(PlannerApi);
  private readonly http = inject(HttpClient);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly destroyRef = inject(DestroyRef);
  private readonly role = inject(AuthService).role;
  private readonly catalogue = inject(CatalogueApi);

  protected readonly form = buildPlanForm();
  protected readonly numberError = numberErrorText;
  protected readonly plans = rxResource({ stream: () => this.api.plans() });
  protected readonly shapes = rxResource({ stream: () => this.api.shapes() });
  protected readonly tunnels = rxResource({ stream: () => this.catalogue.tunnels() });
  /** Lab managers save new plans for a customer organisation they pick; customers save for their own. */
  protected readonly isLabManager = computed(() => this.role() === 'lab_manager');
  protected readonly isAnalyst = computed(() => this.role() === 'analyst');
  protected readonly isCustomer = computed(() => this.role() === 'customer');
  private readonly injector = inject(Injector);

  /** Opens the booking request with this plan chosen; the router is looked up only when the link is used. */
  protected useForBooking(event: MouseEvent, planId: string): void {
    if (event.ctrlKey || event.metaKey || event.shiftKey) return;
    event.preventDefault();
    void this.injector.get(Router).navigate(['/bookings/new'], { queryParams: { planId } });
  }
  protected readonly organisations = rxResource({
    params: () => (this.isLabManager() ? true : undefined),
    stream: () => this.http.get<Organisation[]>('/api/organisations').pipe(map((list) => list.filter((org) => org.kind === 'customer'))),
  });
  protected readonly organisationId = signal('');
  /**
   * The lab's balances, for analysts and lab managers only: customers cannot list lab equipment, so they type the
   * capacity the lab gives them (a plan whose balance the lab chose keeps it).
   */
  protected readonly balances = rxResource({
    params: () => (this.isLabManager() || this.isAnalyst() ? true : undefined),
    stream: () => this.api.balances(),
  });
  protected readonly balanceItems = computed(() =>
    (this.balances.hasValue() ? this.balances.value() : []).filter((balance) => (balance.capacities[0] ?? 0) > 0),
  );
  protected readonly balancesError = computed(() => {
    const error = this.balances.error();
    return error ? problemMessage(error.cause ?? error, 'The balances could not be loaded.') : null;
  });
  private readonly balanceId = toSignal(this.form.controls.balanceId.valueChanges, { initialValue: this.form.controls.balanceId.value });
  private readonly tunnelId = toSignal(this.form.controls.tunnelId.valueChanges, { initialValue: this.form.controls.tunnelId.value });
  /** The balances the catalogue lists as installed in the chosen tunnel, whose drag capacity can be taken over. */
  protected readonly tunnelBalances = computed(() => (this.tunnels.value() ?? []).find((tunnel) => tunnel.id === this.tunnelId())?.balances.filter((b) => (b.capacities[0] ?? 0) > 0) ?? []);
  /** The balance a customer's plan uses, as its evaluation names it. */
  protected readonly chosenBalanceName = computed(() => {
    if (!this.balanceId()) return null;
    const state = this.evaluation();
    const named = state.kind === 'ready' ? state.evaluation.tunnel.balanceIdentifier : this.selected()?.evaluation.tunnel.balanceIdentifier;
    return named ?? 'chosen by the lab';
  });

  protected readonly selected = signal<PlanDetail | null>(null);
  /** Every saved version of the open plan, newest first; reloaded after each save. */
  protected readonly versions = rxResource({
    params: () => {
      const plan = this.selected();
      return plan ? { id: plan.id, version: plan.currentVersion } : undefined;
    },
    stream: ({ params }) => this.api.versions(params.id),
  });
  protected readonly versionsError = computed(() => {
    const error = this.versions.error();
    return error ? problemMessage(error.cause ?? error, 'The versions could not be loaded.') : null;
  });
  protected readonly opening = signal(false);
  protected readonly saving = signal(false);
  protected readonly saveError = signal<string | null>(null);
  protected readonly openError = signal<string | null>(null);
  protected readonly savedMessage = signal<string | null>(null);

  protected readonly shapeItems = computed(() => (this.shapes.hasValue() ? this.shapes.value().items : []));
  protected readonly planItems = computed(() => (this.plans.hasValue() ? this.plans.value().items : []));
  protected readonly plansError = computed(() => {
    const error = this.plans.error();
    return error ? problemMessage(error.cause ?? error, 'Your plans could not be loaded.') : null;
  });
  protected readonly shapesError = computed(() => {
    const error = this.shapes.error();
    return error ? problemMessage(error.cause ?? error, 'The shape library could not be loaded.') : null;
  });
  protected readonly tunnelsError = computed(() => {
    const error = this.tunnels.error();
    return error ? problemMessage(error.cause ?? error, 'The tunnels could not be loaded.') : null;
  });

  private readonly retryEvaluation = new Subject<void>();

  protected readonly evaluation = toSignal(
    merge(this.form.valueChanges.pipe(debounceTime(EVALUATE_AFTER_MS)), this.retryEvaluation.pipe(map(() => 'retry'))).pipe(
      startWith(null),
      map((trigger) => ({ draft: this.form.valid || this.onlyNameMissing() ? planDraftFrom(this.form) : null, retry: trigger === 'retry' })),
      distinctUntilChanged((a, b) => !b.retry && JSON.stringify(a.draft) === JSON.stringify(b.draft)),
      switchMap(({ draft }) => (draft ? this.evaluate(draft) : of<EvaluationState>({ kind: 'incomplete' }))),
    ),
    { initialValue: { kind: 'incomplete' } as EvaluationState },
  );

  constructor() {
    this.form.controls.parts.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe(() => this.savedMessage.set(null));
  }

  /** The plan may be evaluated before it has a name. */
  private onlyNameMissing(): boolean {
    const { name, ...rest } = this.form.controls;
    return name.invalid && Object.values(rest).every((control) => control.valid);
  }

  private evaluate(draft: PlanInputDraft) {
    return this.api.evaluate(draft).pipe(
      map((evaluation): EvaluationState => ({ kind: 'ready', evaluation })),
      catchError((error: unknown) =>
        of<EvaluationState>({ kind: 'error', message: problemMessage(error, 'The plan could not be evaluated.'), fields: problemFieldErrors(error) }),
      ),
      startWith<EvaluationState>({ kind: 'loading' }),
    );
  }

  /** Takes the drag capacity (Fx) of a balance installed in the chosen tunnel into the typed field. */
  protected useCapacity(balance: InstalledBalance): void {
    this.form.controls.dragCapacity.setValue(balance.capacities[0] ?? null);
    this.form.controls.dragCapacity.markAsDirty();
  }

  protected retry(): void {
    this.retryEvaluation.next();
  }

  protected newPlan(): void {
    this.selected.set(null);
    this.savedMessage.set(null);
    this.saveError.set(null);
    resetPlanForm(this.form);
    this.form.markAsPristine();
    this.form.markAsUntouched();
  }

  protected open(id: string): void {
    this.opening.set(true);
    this.openError.set(null);
    this.api
      .plan(id)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (plan) => {
          this.opening.set(false);
          this.selected.set(plan);
          this.savedMessage.set(null);
          fillPlanForm(this.form, plan.name, plan.latest.input, this.shapeItems());
        },
        error: (error: unknown) => {
          this.opening.set(false);
          this.openError.set(problemMessage(error, 'The plan could not be opened.'));
        },
      });
  }

  /** Puts an older version into the editor; saving it then adds it again as the newest version. */
  protected loadVersion(version: PlanVersion): void {
    const plan = this.selected();
    if (!plan) return;
    fillPlanForm(this.form, plan.name, version.input, this.shapeItems());
    this.savedMessage.set(`Version ${version.version} is in the editor; save to make it the newest version.`);
  }

  protected readonly canSave = computed(() => !(this.isAnalyst() && this.selected() === null));
  /** Analysts and lab managers link certified results to a plan and pick balances. */
  protected readonly isResultLinker = computed(() => this.isLabManager() || this.isAnalyst());

  /** After a link or unlink: the open plan as it now reads, and the list's summary with it. */
  protected certifiedChanged(plan: PlanDetail): void {
    this.selected.set(plan);
    this.plans.reload();
  }

  protected save(): void {
    this.saveError.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const current = this.selected();
    if (!current && this.isLabManager() && !this.organisationId()) {
      this.saveError.set('Choose the customer organisation the plan is for.');
      return;
    }
    const body = {
      name: this.form.controls.name.value.trim(),
      input: planDraftFrom(this.form),
      ...(current || !this.isLabManager() ? {} : { organisationId: this.organisationId() }),
    };
    this.saving.set(true);
    (current ? this.api.update(current.id, body) : this.api.create(body)).pipe(takeUntilDestroyed(this.destroyRef)).subscribe({
      next: (plan) => {
        this.saving.set(false);
        this.selected.set(plan);
        this.savedMessage.set(`Saved “${plan.name}” as version ${plan.currentVersion}.`);
        this.plans.reload();
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const fields = problemFieldErrors(error);
        this.saveError.set(fields.length > 0 ? fields.map((field) => field.message).join(' · ') : problemMessage(error, 'The plan could not be saved.'));
      },
    });
  }
}
