import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

/** A failed call, shown where it happened, with a button to try again. */
@Component({
  selector: 'tw-error-banner',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule],
  template: `
    <div class="banner" role="alert">
      <mat-icon class="material-icons" aria-hidden="true">error_outline</mat-icon>
      <span class="text">{{ message() }}</span>
      @if (retryable()) {
        <button mat-button type="button" (click)="retry.emit()">Try again</button>
      }
    </div>
  `,
  styles: `
    .banner {
      display: flex;
      align-items: center;
      gap: 12px;
      padding: 8px 8px 8px 16px;
      margin: 8px 0 16px;
      border-radius: var(--mat-sys-corner-small);
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    mat-icon {
      flex: none;
    }
    .text {
      flex: 1 1 auto;
    }
    button {
      color: var(--mat-sys-on-error-container);
    }
  `,
})
export class ErrorBanner {
  /** What went wrong, in plain words. */
  readonly message = input.required<string>();
  /** Whether to offer the retry button. */
  readonly retryable = input(true);
  /** Emitted when the user asks to try again. */
  readonly retry = output<void>();
}
