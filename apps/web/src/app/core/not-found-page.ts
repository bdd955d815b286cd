import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { Wordmark } from '../shared/wordmark';

/** Shown for an address that matches no page. */
@Component({
  selector: 'tw-not-found-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, Wordmark],
  template: `
    <main class="tw-page message">
      <tw-wordmark [height]="36" />
      <h1>We could not find that page</h1>
      <p class="tw-muted">The address may be mistyped, or the page may have moved.</p>
      <a mat-flat-button routerLink="/">Go to the start page</a>
    </main>
  `,
  styles: `
    .message {
      text-align: center;
      padding-top: 80px;
      color: var(--mat-sys-primary);
    }
    h1 {
      font: var(--mat-sys-headline-small);
      color: var(--mat-sys-on-surface);
    }
  `,
})
export class NotFoundPage {}
