/**
 * Moves keyboard focus to the first invalid field inside `host`, so after a refused submit the user
 * lands where the first message is rather than having to look for it.
 */
export function focusFirstInvalid(host: HTMLElement): void {
  host.querySelector<HTMLElement>('input.ng-invalid, textarea.ng-invalid, mat-select.ng-invalid')?.focus();
}
