import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatTableModule } from '@angular/material/table';
import { MatTableHarness } from '@angular/material/table/testing';
import type { SigningRight } from '@tunnelwright/contracts';
import { SigningRightsTable } from './signing-rights-table';

const manager = { id: '0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d', name: 'Wilhelmina Carrow' };
const holder: SigningRight = {
  id: '00000000-0000-4000-8000-000000000001',
  user: { id: '00000000-0000-4000-9000-000000000001', name: 'Oskar Lindqvist', email: 'oskar@example.test', role: 'analyst' },
  grantedBy: manager,
  grantedAt: '2026-10-01T09:00:00.000Z',
  scopeNote: '',
  revokedAt: null,
  revokedBy: null,
  revokedReason: null,
};

/** A list of rights with one column of its own, between the shared ones. */
@Component({
  selector: 'tw-signing-rights-table-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, SigningRightsTable],
  template: `
    <tw-signing-rights-table label="Holders" [rights]="rights" [columns]="['name', 'role', 'scopeNote', 'granted']" [withEmail]="withEmail()">
      <ng-container matColumnDef="role">
        <th mat-header-cell *matHeaderCellDef>Role</th>
        <td mat-cell *matCellDef="let right">{{ right.user.role }}</td>
      </ng-container>
    </tw-signing-rights-table>
  `,
})
class SigningRightsTableHost {
  readonly withEmail = input(false);
  readonly rights = [holder];
}

describe('SigningRightsTable', () => {
  let fixture: ComponentFixture<SigningRightsTableHost>;

  async function render(withEmail: boolean) {
    fixture = TestBed.createComponent(SigningRightsTableHost);
    fixture.componentRef.setInput('withEmail', withEmail);
    await fixture.whenStable();
    return TestbedHarnessEnvironment.loader(fixture).getHarness(MatTableHarness.with({ selector: '[aria-label="Holders"]' }));
  }

  it('shows the shared columns around the projected one, in the order given', async () => {
    const table = await render(false);
    expect(await (await table.getHeaderRows())[0].getCellTextByIndex()).toEqual(['Name', 'Role', 'Scope note', 'Granted']);
    const cells = await table.getCellTextByColumnName();
    expect(cells['name'].text).toEqual(['Oskar Lindqvist']);
    expect(cells['role'].text).toEqual(['analyst']);
    // An empty scope note is drawn as a dash so the cell does not look unfilled.
    expect(cells['scopeNote'].text).toEqual(['—']);
    expect(cells['granted'].text[0]).toMatch(/2026 by Wilhelmina Carrow$/);
  });

  it('puts the holder’s e-mail address under the name when asked', async () => {
    const table = await render(true);
    expect((await table.getCellTextByColumnName())['name'].text).toEqual(['Oskar Lindqvistoskar@example.test']);
  });
});
