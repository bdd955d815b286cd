import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/**
 * The Tunnelwright wordmark: a contraction-and-test-section outline with one streamline
 * running through it, followed by the name. Colours come from the surrounding text colour
 * and the theme's tertiary (accent) colour.
 */
@Component({
  selector: 'tw-wordmark',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <svg
      [attr.height]="height()"
      viewBox="0 0 236 40"
      role="img"
      aria-label="Tunnelwright"
      xmlns="http://www.w3.org/2000/svg"
    >
      <g fill="none" stroke-linecap="round" stroke-linejoin="round">
        <path d="M2 6 L16 13 H28 L40 8 M2 34 L16 27 H28 L40 32" stroke="currentColor" stroke-width="2.6" opacity="0.85" />
        <path d="M1 20 C10 20 12 18 22 18 S33 22 41 20" class="flow" stroke-width="3" />
      </g>
      <text x="50" y="28" fill="currentColor" font-family="Roboto, sans-serif" font-size="22" font-weight="500" letter-spacing="0.4">
        Tunnel<tspan font-weight="700" class="accent">wright</tspan>
      </text>
    </svg>
  `,
  styles: `
    :host {
      display: inline-flex;
      align-items: center;
    }
    .flow {
      stroke: var(--tw-wordmark-accent, var(--mat-sys-tertiary));
    }
    .accent {
      fill: var(--tw-wordmark-accent, var(--mat-sys-tertiary));
    }
  `,
})
export class Wordmark {
  /** Rendered height in CSS pixels; the width follows. */
  readonly height = input(32);
}
