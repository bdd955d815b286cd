import { booleanAttribute, ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { SafetyNotice } from '../core/safety-notice';
import { Wordmark } from '../shared/wordmark';

/** The frame of the pages open without signing in: wordmark, one card with the page's content, the safety notice. */
@Component({
  selector: 'tw-auth-frame',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatCardModule, Wordmark, SafetyNotice],
  template: `
    <main class="frame">
      <div class="brand"><tw-wordmark [height]="40" /></div>
      <mat-card appearance="outlined" class="card" [class.wide]="wide()">
        <mat-card-header>
          <mat-card-title><h1>{{ heading() }}</h1></mat-card-title>
        </mat-card-header>
        <mat-card-content>
          <ng-content />
        </mat-card-content>
      </mat-card>
      <footer class="footer"><tw-safety-notice /></footer>
    </main>
  `,
  styles: `
    .frame {
      min-height: 100vh;
      box-sizing: border-box;
      display: flex;
      flex-direction: column;
      align-items: center;
      padding: 48px 16px 24px;
      background: linear-gradient(160deg, var(--mat-sys-primary-container) 0%, var(--mat-sys-surface-container-lowest) 55%);
    }
    .brand {
      color: var(--mat-sys-primary);
      margin-bottom: 24px;
    }
    .card {
      width: 100%;
      max-width: 440px;
      background: var(--mat-sys-surface);
    }
    .card.wide {
      max-width: 680px;
    }
    h1 {
      font: var(--mat-sys-headline-small);
      margin: 0 0 12px;
    }
    .footer {
      margin-top: auto;
      padding-top: 32px;
      max-width: 640px;
      text-align: center;
    }
  `,
})
export class AuthFrame {
  readonly heading = input.required<string>();
  /** Whether the card is wide enough for a table of facts, as on the public check of a sheet, not just a short form. */
  readonly wide = input(false, { transform: booleanAttribute });
}
