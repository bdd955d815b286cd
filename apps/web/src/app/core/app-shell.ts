import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, effect, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDividerModule } from '@angular/material/divider';
import { MatIconModule } from '@angular/material/icon';
import { MatListModule } from '@angular/material/list';
import { MatMenuModule } from '@angular/material/menu';
import { MatSidenavModule } from '@angular/material/sidenav';
import { MatToolbarModule } from '@angular/material/toolbar';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { roleLabels } from '@tunnelwright/contracts';
import { map } from 'rxjs';
import { Wordmark } from '../shared/wordmark';
import { AuthService } from './auth-service';
import { DemoModeService } from './demo-mode-service';
import { navItemsFor } from './nav-items';
import { SafetyNotice } from './safety-notice';

/** The signed-in frame: toolbar with wordmark and user menu, role-based side navigation, footer. */
@Component({
  selector: 'tw-app-shell',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterOutlet,
    RouterLink,
    RouterLinkActive,
    MatToolbarModule,
    MatSidenavModule,
    MatListModule,
    MatIconModule,
    MatButtonModule,
    MatMenuModule,
    MatDividerModule,
    Wordmark,
    SafetyNotice,
  ],
  templateUrl: './app-shell.html',
  styleUrl: './app-shell.scss',
})
export class AppShell {
  private readonly auth = inject(AuthService);
  private readonly demoMode = inject(DemoModeService);
  private readonly router = inject(Router);

  protected readonly user = this.auth.user;
  protected readonly roleLabel = computed(() => {
    const role = this.auth.role();
    return role ? roleLabels[role] : '';
  });
  protected readonly navItems = computed(() => navItemsFor(this.auth.role(), this.demoMode.enabled()));
  /** Whether the screen is narrow enough that the navigation slides over the content. */
  protected readonly compact = toSignal(
    inject(BreakpointObserver)
      .observe('(max-width: 840px)')
      .pipe(map((state) => state.matches)),
    { initialValue: false },
  );

  constructor() {
    effect(() => {
      if (this.auth.role() === 'lab_manager') {
        this.demoMode.check();
      }
    });
  }

  protected signOut(): void {
    this.auth.signOut().subscribe(() => void this.router.navigate(['/sign-in']));
  }
}
