import { HttpClient } from '@angular/common/http';
import { Injectable, inject, signal } from '@angular/core';
import { catchError, map, of } from 'rxjs';

interface HealthAnswer {
  status: string;
  demoMode?: boolean;
}

/**
 * Whether the API runs in demo mode (which enables the dev mailbox). Read from the public health
 * answer; an older API without the flag is asked for the mailbox itself and a 404 means "off".
 */
@Injectable({ providedIn: 'root' })
export class DemoModeService {
  private readonly http = inject(HttpClient);
  private readonly enabledState = signal(false);
  private checked = false;

  /** Whether demo mode is on. False until `check()` has an answer. */
  readonly enabled = this.enabledState.asReadonly();

  /** Asks the API once per session; later calls do nothing. */
  check(): void {
    if (this.checked) {
      return;
    }
    this.checked = true;
    this.http
      .get<HealthAnswer>('/api/health')
      .pipe(catchError(() => of<HealthAnswer>({ status: 'unknown' })))
      .subscribe((health) => {
        if (typeof health.demoMode === 'boolean') {
          this.enabledState.set(health.demoMode);
          return;
        }
        this.http
          .get<unknown[]>('/api/dev/mailbox')
          .pipe(
            map(() => true),
            catchError(() => of(false)),
          )
          .subscribe((enabled) => this.enabledState.set(enabled));
      });
  }
}
