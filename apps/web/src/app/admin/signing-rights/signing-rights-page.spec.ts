import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import { provideRouter } from '@angular/router';
import type { SigningRight, UserSummary } from '@tunnelwright/contracts';
import { grantCandidates } from './grant-signing-right-dialog';
import { SigningRightsPage } from './signing-rights-page';

const manager = { id: '0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d', name: 'Wilhelmina Carrow' };

function right(index: number, overrides: Partial<SigningRight> = {}): SigningRight {
  return {
    id: `00000000-0000-4000-8000-${String(index).padStart(12, '0')}`,
    user: { id: `00000000-0000-4000-9000-${String(index).padStart(12, '0')}`, name: `Signer ${index}`, email: `signer${index}@example.test`, role: 'analyst' },
    grantedBy: manager,
    grantedAt: '2026-10-01T09:00:00.000Z',
    scopeNote: 'Road-vehicle force tests',
    revokedAt: null,
    revokedBy: null,
    revokedReason: null,
    ...overrides,
  };
}

function person(index: number, overrides: Partial<UserSummary> = {}): UserSummary {
  return {
    id: `00000000-0000-4000-9000-${String(index).padStart(12, '0')}`,
    email: `person${index}@example.test`,
    name: `Person ${index}`,
    role: 'analyst',
    organisationId: '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a',
    organisationName: 'Lab',
    active: true,
    activated: true,
    createdAt: '2026-01-15T09:00:00.000Z',
    ...overrides,
  };
}

describe('grantCandidates', () => {
  it('offers active people who hold no right now, by name', () => {
    const people = [person(3, { name: 'Zora' }), person(1, { name: 'Anselm' }), person(2, { active: false }), person(4)];
    expect(grantCandidates(people, new Set([person(4).id])).map((p) => p.name)).toEqual(['Anselm', 'Zora']);
  });
});

describe('SigningRightsPage', () => {
  let backend: HttpTestingController;
  let loader: HarnessLoader;
  let whenStable: () => Promise<unknown>;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [SigningRightsPage], providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    const fixture = TestBed.createComponent(SigningRightsPage);
    whenStable = () => fixture.whenStable();
    loader = TestbedHarnessEnvironment.documentRootLoader(fixture);
    backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    backend
      .expectOne('/api/signing-rights')
      .flush([right(1), right(2, { revokedAt: '2026-11-01T09:00:00.000Z', revokedBy: manager, revokedReason: 'Moved to the planning team' })]);
    await whenStable();
  });

  afterEach(() => backend.verify());

  it('lists current holders apart from removed rights, with who removed them and why', async () => {
    const current = await loader.getHarness(MatTableHarness.with({ selector: '[aria-label="Current holders"]' }));
    expect((await current.getCellTextByColumnName())['name'].text).toEqual(['Signer 1signer1@example.test']);
    const history = await loader.getHarness(MatTableHarness.with({ selector: '[aria-label="Removed rights"]' }));
    const cells = await history.getCellTextByColumnName();
    expect(cells['name'].text).toEqual(['Signer 2']);
    expect(cells['revoked'].text[0]).toContain('by Wilhelmina Carrow');
    expect(cells['reason'].text).toEqual(['Moved to the planning team']);
  });

  it('removes a right only with a reason of at least 10 characters, after asking', async () => {
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Remove' }))).click();
    const dialog = await loader.getHarness(MatDialogHarness);
    expect(await dialog.getTitleText()).toBe('Remove the signing right of Signer 1?');
    const confirm = await dialog.getHarness(MatButtonHarness.with({ text: 'Remove signing right' }));
    await confirm.click();
    expect(await dialog.getText()).toContain('Say why the right is removed');
    backend.expectNone(`/api/signing-rights/${right(1).id}/revoke`);

    const reason = document.querySelector<HTMLTextAreaElement>('mat-dialog-container textarea')!;
    reason.value = 'Left the laboratory';
    reason.dispatchEvent(new Event('input'));
    await confirm.click();
    const request = backend.expectOne(`/api/signing-rights/${right(1).id}/revoke`);
    expect(request.request.body).toEqual({ reason: 'Left the laboratory' });
    request.flush(right(1, { revokedAt: '2026-12-02T09:00:00.000Z', revokedBy: manager, revokedReason: 'Left the laboratory' }));
    // The list reloads once the dialog has finished closing.
    let reload = backend.match('/api/signing-rights');
    for (let tick = 0; tick < 100 && reload.length === 0; tick++) {
      await new Promise((resolve) => setTimeout(resolve, 10));
      reload = backend.match('/api/signing-rights');
    }
    expect(reload).toHaveLength(1);
    reload[0].flush([]);
    await whenStable();
    expect(document.body.textContent).toContain('Nobody holds a signing right');
  });
});
