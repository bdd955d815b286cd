import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

/** What a list shows when it has nothing in it; projected content can offer a first action. */
@Component({
  selector: 'tw-empty-state',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIconModule],
  template: `
    <div class="empty">
      <mat-icon class="material-icons" aria-hidden="true">{{ icon() }}</mat-icon>
      <p class="title">{{ title() }}</p>
      <p class="hint">{{ hint() }}</p>
      <ng-content />
    </div>
  `,
  styles: `
    .empty {
      text-align: center;
      padding: 40px 16px;
      color: var(--mat-sys-on-surface-variant);
    }
    mat-icon {
      font-size: 40px;
      width: 40px;
      height: 40px;
    }
    .title {
      font: var(--mat-sys-title-medium);
      color: var(--mat-sys-on-surface);
      margin: 8px 0 4px;
    }
    .hint {
      margin: 0 0 12px;
    }
  `,
})
export class EmptyState {
  readonly icon = input('inbox');
  readonly title = input.required<string>();
  readonly hint = input('');
}
