import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The standing caution that tunnel results are test data, never design values. */
@Component({
  selector: 'tw-safety-notice',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <p class="notice">
      <strong>Test data, not design values.</strong>
      Results shown here describe a model in a wind tunnel. Design loads for any structure or vehicle must be
      set by a licensed engineer under the local code. Tunnelwright · laboratory information system.
    </p>
  `,
  styles: `
    .notice {
      margin: 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
      max-width: 900px;
    }
  `,
})
export class SafetyNotice {}
