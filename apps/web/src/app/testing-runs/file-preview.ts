import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { Preview } from '@tunnelwright/contracts';

/** How many sample rows of a preview are shown. */
const SHOWN_ROWS = 5;

/** What the reader understood of a file before it is kept: columns with units, the first rows, or each issue with its place. */
@Component({
  selector: 'tw-file-preview',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    @let p = preview();
    @if (p.valid) {
      <p class="summary">{{ p.sampleCount }} samples in {{ p.pointCount }} points · {{ p.header?.loadKind === 'bridges' ? 'bridge outputs' : 'loads' }}</p>
    } @else {
      <p class="summary bad">This file cannot be used as it is. Fix these and pick it again:</p>
    }
    @if (p.issues.length > 0) {
      <ul class="issues" aria-label="Issues found">
        @for (issue of p.issues; track $index) {
          <li>Line {{ issue.line }}, column {{ issue.column }}: {{ issue.message }}</li>
        }
      </ul>
    }
    @if (p.header; as header) {
      <p class="detected" aria-label="Detected columns">
        Columns:
        @for (column of header.columns; track column.name; let last = $last) {
          <span class="column">{{ column.name }} ({{ column.unit || 'no unit' }}{{ column.siUnit && column.siUnit !== column.unit ? ' → ' + column.siUnit : '' }})</span>{{ last ? '' : ', ' }}
        }
      </p>
    }
    @if (rows().length > 0) {
      <div class="scroll">
        <table aria-label="First rows, in SI units">
          <thead>
            <tr>
              @for (heading of headings(); track heading) {
                <th scope="col">{{ heading }}</th>
              }
            </tr>
          </thead>
          <tbody>
            @for (row of rows(); track $index) {
              <tr>
                @for (value of row; track $index) {
                  <td>{{ value }}</td>
                }
              </tr>
            }
          </tbody>
        </table>
      </div>
    }
  `,
  styles: `
    .summary {
      margin: 0;
    }
    .bad {
      color: var(--mat-sys-error);
    }
    .issues {
      margin: 0;
      color: var(--mat-sys-error);
    }
    .scroll {
      overflow-x: auto;
    }
    table {
      border-collapse: collapse;
      font: var(--mat-sys-body-small);
    }
    .detected {
      margin: 0;
      font: var(--mat-sys-body-small);
    }
    th,
    td {
      padding: 2px 8px;
      text-align: right;
      white-space: nowrap;
    }
  `,
})
export class FilePreview {
  readonly preview = input.required<Preview>();

  private readonly bridges = computed(() => this.preview().header?.loadKind === 'bridges');

  protected readonly headings = computed(() => [
    'Line',
    'Point',
    'Yaw (°)',
    'q (Pa)',
    'p (Pa)',
    'T (K)',
    ...(this.bridges() ? ['R1', 'R2', 'R3', 'R4', 'R5', 'R6'].map((r) => `${r} (mV/V)`) : ['Fx (N)', 'Fy (N)', 'Fz (N)', 'Mx (N·m)', 'My (N·m)', 'Mz (N·m)']),
  ]);

  /** The first samples as the reader converted them to SI, angles back in degrees. */
  protected readonly rows = computed(() =>
    this.preview()
      .firstSamples.slice(0, SHOWN_ROWS)
      .map((sample) => {
        const channels = (this.bridges() ? sample['bridges'] : sample['loads']) as readonly number[] | undefined;
        return [
          text(sample['line'], 0),
          text(sample['point'], 0),
          text(typeof sample['yaw'] === 'number' ? (sample['yaw'] * 180) / Math.PI : null, 2),
          text(sample['dynamicPressure'], 1),
          text(sample['barometricPressure'], 0),
          text(sample['temperature'], 2),
          ...(channels ?? []).map((value) => text(value, 3)),
        ];
      }),
  );
}

function text(value: unknown, digits: number): string {
  return typeof value === 'number' && Number.isFinite(value) ? value.toFixed(digits) : '—';
}
