import { ChangeDetectionStrategy, Component, ElementRef, input, output, signal, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

/**
 * Where files are dropped, or picked with the file dialog. The zone itself is focusable: Enter or Space opens
 * the dialog, so the keyboard reaches everything the mouse does. Used for run files and for booking attachments.
 */
@Component({
  selector: 'tw-file-drop-zone',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButtonModule, MatIconModule],
  template: `
    <div
      class="zone"
      role="button"
      tabindex="0"
      [class.over]="over()"
      [class.disabled]="disabled()"
      [attr.aria-disabled]="disabled()"
      [attr.aria-label]="'Drop ' + what() + ' here, or press Enter to choose files'"
      (keydown.enter)="open($event)"
      (keydown.space)="open($event)"
      (click)="open($event)"
      (dragover)="dragOver($event)"
      (dragleave)="over.set(false)"
      (drop)="drop($event)"
    >
      <mat-icon class="material-icons" aria-hidden="true">{{ icon() }}</mat-icon>
      <span>Drop {{ what() }} here, or <u>choose files</u></span>
    </div>
    <input
      #picker
      class="picker"
      type="file"
      multiple
      [accept]="accept()"
      [attr.aria-label]="'Choose ' + what()"
      (change)="picked(picker)"
    />
  `,
  styles: `
    .zone {
      display: flex;
      align-items: center;
      justify-content: center;
      gap: 12px;
      min-height: 72px;
      border: 2px dashed var(--mat-sys-outline);
      border-radius: var(--mat-sys-corner-medium);
      cursor: pointer;
      padding: 16px;
    }
    .zone:focus-visible {
      outline: 3px solid var(--mat-sys-primary);
      outline-offset: 2px;
    }
    .zone.over {
      background: var(--mat-sys-secondary-container);
      border-color: var(--mat-sys-primary);
    }
    .zone.disabled {
      opacity: 0.5;
      cursor: not-allowed;
    }
    .picker {
      position: absolute;
      width: 1px;
      height: 1px;
      opacity: 0;
      pointer-events: none;
    }
  `,
})
export class FileDropZone {
  /** What the zone takes, in words, e.g. `run files`; used in its text and labels. */
  readonly what = input.required<string>();
  /** The file input's `accept` attribute. */
  readonly accept = input('');
  /** Material icon ligature shown in the zone. */
  readonly icon = input('upload_file');
  /** Whether files may not be added now. */
  readonly disabled = input(false);
  /** Emitted with the files dropped or picked. */
  readonly files = output<File[]>();

  protected readonly over = signal(false);
  private readonly picker = viewChild.required<ElementRef<HTMLInputElement>>('picker');

  protected open(event: Event): void {
    event.preventDefault();
    if (!this.disabled()) this.picker().nativeElement.click();
  }

  protected dragOver(event: DragEvent): void {
    event.preventDefault();
    this.over.set(!this.disabled());
  }

  protected drop(event: DragEvent): void {
    event.preventDefault();
    this.over.set(false);
    const dropped = Array.from(event.dataTransfer?.files ?? []);
    if (!this.disabled() && dropped.length > 0) this.files.emit(dropped);
  }

  protected picked(picker: HTMLInputElement): void {
    const chosen = Array.from(picker.files ?? []);
    // Cleared so the same file can be picked again after it was removed from the list.
    picker.value = '';
    if (chosen.length > 0) this.files.emit(chosen);
  }
}
