import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import type { ReviewRun, RunKind } from '@tunnelwright/contracts';
import { runKindLabels } from '../testing-runs/run-labels';

/** Which version a run should show. */
export interface VersionChoice {
  readonly runId: string;
  readonly reductionId: string;
}

/**
 * The test's runs as a checklist: tick a run to overlay it on the charts, pick which finished version it shows, and
 * follow the link to the run page to reduce it again or compare versions.
 */
@Component({
  selector: 'tw-run-picker',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatIconModule, MatSelectModule],
  template: `
    <ul class="runs" aria-label="Runs to overlay">
      @for (run of runs(); track run.id) {
        <li>
          <mat-checkbox [checked]="shown().has(run.id)" [disabled]="run.selected === null" (change)="toggled.emit(run.id)">
            Run {{ run.runNumber }} · {{ kindLabel(run.kind) }}{{ run.configurationLabel ? ' · ' + run.configurationLabel : '' }}
          </mat-checkbox>
          @if (run.versions.length > 0) {
            <mat-form-field class="version" subscriptSizing="dynamic">
              <mat-label>Version</mat-label>
              <mat-select [value]="run.selected?.reductionId" (selectionChange)="versionChosen.emit({ runId: run.id, reductionId: $event.value })" [attr.aria-label]="'Version of run ' + run.runNumber">
                @for (v of run.versions; track v.id) {
                  <mat-option [value]="v.id">v{{ v.version }} · {{ v.pointCount }} points{{ v.frozen ? ' · approved' : '' }}</mat-option>
                }
              </mat-select>
            </mat-form-field>
          } @else {
            <span class="none">No finished reduction</span>
          }
          <a mat-button [routerLink]="['/runs', run.id]" [attr.aria-label]="'Reduce again or compare versions of run ' + run.runNumber">
            <mat-icon>tune</mat-icon> Reduce again / compare
          </a>
        </li>
      }
    </ul>
  `,
  styles: `
    .runs {
      list-style: none;
      padding: 0;
      margin: 0;
    }
    li {
      display: flex;
      align-items: center;
      flex-wrap: wrap;
      gap: 12px;
      padding: 4px 0;
    }
    mat-checkbox {
      min-width: 260px;
    }
    .version {
      width: 220px;
    }
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class RunPicker {
  readonly runs = input.required<readonly ReviewRun[]>();
  /** Ids of the runs overlaid on the charts. */
  readonly shown = input.required<ReadonlySet<string>>();
  readonly toggled = output<string>();
  readonly versionChosen = output<VersionChoice>();

  protected readonly kindLabel = (kind: string) => runKindLabels[kind as RunKind] ?? kind;
}
