import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatChipsModule } from '@angular/material/chips';
import { MatIconModule } from '@angular/material/icon';
import type { PlanEvaluation, PlanFitCheck } from '@tunnelwright/contracts';
import { DragShareChart } from './drag-share-chart';
import { fitStatusLabels } from './fit-status-labels';
import { HeadTailChart } from './head-tail-chart';

/** An evaluated plan: build-up per part, contributions, tunnel-fit checks, full-scale power, tunnel hours, caution. */
@Component({
  selector: 'tw-plan-results',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, MatChipsModule, MatIconModule, DragShareChart, HeadTailChart],
  templateUrl: './plan-results.html',
  styleUrl: './plan-results.scss',
})
export class PlanResults {
  readonly evaluation = input.required<PlanEvaluation>();

  protected readonly statusLabels = fitStatusLabels;
  protected readonly checks = computed(() => this.evaluation().fit.checks);
  protected readonly counts = computed(() => {
    const counts = { pass: 0, warn: 0, fail: 0 };
    for (const check of this.checks()) counts[check.status] += 1;
    return counts;
  });

  protected checkTitle(check: PlanFitCheck): string {
    const [kind] = check.id.split('-');
    const titles: Record<string, string> = { blockage: 'Blockage', speed: 'Speed', load: 'Balance load', mach: 'Mach number', reynolds: 'Reynolds number' };
    return titles[kind ?? ''] ?? check.id;
  }

  protected exponent(value: number | null): string {
    return value === null ? '—' : value.toExponential(2);
  }
}
