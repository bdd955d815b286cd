import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

/** Shown when a signed-in user opens a section their role does not include. */
@Component({
  selector: 'tw-not-allowed-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatButtonModule, MatIconModule],
  template: `
    <section class="tw-page message">
      <mat-icon class="material-icons big" aria-hidden="true">lock</mat-icon>
      <h1>This part of Tunnelwright is for laboratory staff</h1>
      <p class="tw-muted">
        Your account does not include this section. If you think it should, ask the lab manager who invited you.
      </p>
      <a mat-flat-button routerLink="/catalogue">Back to the catalogue</a>
    </section>
  `,
  styles: `
    .message {
      text-align: center;
      padding-top: 64px;
    }
    .big {
      font-size: 48px;
      width: 48px;
      height: 48px;
      color: var(--mat-sys-primary);
    }
    h1 {
      font: var(--mat-sys-headline-small);
    }
  `,
})
export class NotAllowedPage {}
