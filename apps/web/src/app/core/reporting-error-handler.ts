import { ErrorHandler, Injectable, inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';

/**
 * Reports errors nobody expected. Failed HTTP calls are shown where they are made; anything that
 * reaches this handler is a fault in the client, so it is logged and the user is told plainly.
 */
@Injectable()
export class ReportingErrorHandler implements ErrorHandler {
  private readonly snackBar = inject(MatSnackBar);

  handleError(error: unknown): void {
    console.error('Unexpected error', error);
    this.snackBar.open('Something unexpected went wrong. Reload the page if it keeps happening.', 'Dismiss', {
      duration: 8000,
    });
  }
}
