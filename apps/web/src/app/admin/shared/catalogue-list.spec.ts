import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatSlideToggleHarness } from '@angular/material/slide-toggle/testing';
import { MatTableModule } from '@angular/material/table';
import { MatTableHarness } from '@angular/material/table/testing';
import { Observable, of, throwError } from 'rxjs';
import { ArchivableList } from './archivable-list';
import { CatalogueList } from './catalogue-list';

interface Balance {
  readonly id: string;
  readonly name: string;
  readonly archived: boolean;
  readonly components: number;
}

const sixComponent: Balance = { id: 'b1', name: 'Six-component balance', archived: false, components: 6 };
const oldSting: Balance = { id: 'b2', name: 'Sting balance S2', archived: true, components: 3 };

/** A page as the tunnels and services pages are: one projected column, the list's state, and an editor it opens. */
@Component({
  selector: 'tw-catalogue-list-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, CatalogueList],
  template: `
    <tw-catalogue-list
      [list]="list"
      title="Balances"
      newLabel="New balance"
      [columns]="['components']"
      emptyIcon="scale"
      emptyTitle="No balances yet"
      emptyHint="Add the first balance."
      (edit)="edited.push($event)"
    >
      <ng-container matColumnDef="components">
        <th mat-header-cell *matHeaderCellDef>Components</th>
        <td mat-cell *matCellDef="let balance">{{ balance.components }}</td>
      </ng-container>
    </tw-catalogue-list>
  `,
})
class CatalogueListHost {
  readonly loads: boolean[] = [];
  readonly archiveCalls: [string, boolean][] = [];
  readonly edited: (Balance | null)[] = [];
  answer: (includeArchived: boolean) => Observable<Balance[]> = (includeArchived) =>
    of(includeArchived ? [sixComponent, oldSting] : [sixComponent]);
  readonly list = new ArchivableList<Balance>({
    load: (includeArchived) => {
      this.loads.push(includeArchived);
      return this.answer(includeArchived);
    },
    loadFailure: 'The balances could not be loaded.',
    setArchived: (id, archived) => {
      this.archiveCalls.push([id, archived]);
      return of(null);
    },
    archiveConsequence: 'It can no longer be fitted.',
  });
}

describe('CatalogueList', () => {
  let fixture: ComponentFixture<CatalogueListHost>;
  let host: CatalogueListHost;
  let loader: HarnessLoader;

  async function render(answer?: CatalogueListHost['answer']) {
    fixture = TestBed.createComponent(CatalogueListHost);
    host = fixture.componentInstance;
    if (answer) {
      host.answer = answer;
    }
    await fixture.whenStable();
    loader = TestbedHarnessEnvironment.documentRootLoader(fixture);
  }

  const table = () => loader.getHarness(MatTableHarness.with({ selector: '[aria-label="Balances"]' }));
  const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';

  it('puts the page’s own columns between the name and the row actions', async () => {
    await render();
    expect((fixture.nativeElement as HTMLElement).querySelector('h1')?.textContent).toBe('Balances');
    const headers = await (await (await table()).getHeaderRows())[0].getCellTextByIndex();
    expect(headers).toEqual(['Name', 'Components', 'Actions']);
    const cells = await (await table()).getCellTextByColumnName();
    expect(cells['name'].text).toEqual(['Six-component balance']);
    expect(cells['components'].text).toEqual(['6']);
    expect(await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Edit Six-component balance"]' }))).toBeTruthy();
  });

  it('lists archived records, marked, only once "Show archived" is on', async () => {
    await render();
    expect(host.loads).toEqual([false]);
    await (await loader.getHarness(MatSlideToggleHarness.with({ label: 'Show archived' }))).toggle();
    await fixture.whenStable();
    expect(host.loads).toEqual([false, true]);
    const cells = await (await table()).getCellTextByColumnName();
    expect(cells['name'].text).toEqual(['Six-component balance', 'Sting balance S2 (archived)']);
    expect(await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Restore Sting balance S2"]' }))).toBeTruthy();
  });

  it('asks the page to open the editor for a record, and for a new one from the header', async () => {
    await render();
    await (await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Edit Six-component balance"]' }))).click();
    await (await loader.getHarness(MatButtonHarness.with({ text: /New balance/ }))).click();
    expect(host.edited).toEqual([sixComponent, null]);
  });

  it('archives a record only after the confirmation, then reloads', async () => {
    await render();
    await (await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Archive Six-component balance"]' }))).click();
    const dialog = await loader.getHarness(MatDialogHarness);
    expect(await dialog.getTitleText()).toBe('Archive Six-component balance?');
    expect(await dialog.getText()).toContain('It can no longer be fitted. You can restore it later.');
    expect(host.archiveCalls).toEqual([]);
    const archive = await dialog.getHarness(MatButtonHarness.with({ text: 'Archive' }));
    // Archiving takes the record out of the catalogue, so the button is drawn as a destructive act.
    expect(await (await archive.host()).hasClass('tw-destructive')).toBe(true);
    await archive.click();
    for (let tick = 0; tick < 100 && host.archiveCalls.length === 0; tick++) {
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
    expect(host.archiveCalls).toEqual([['b1', true]]);
    await fixture.whenStable();
    expect(host.loads).toEqual([false, false]);
  });

  it('offers the first record when the list is empty', async () => {
    await render(() => of([]));
    expect(text()).toContain('No balances yet');
    expect(text()).toContain('Add the first balance.');
    const buttons = await loader.getAllHarnesses(MatButtonHarness.with({ text: /New balance/ }));
    expect(buttons).toHaveLength(2);
    await buttons[1].click();
    expect(host.edited).toEqual([null]);
  });

  it('says why the records could not be loaded and loads again on request', async () => {
    await render(() => throwError(() => new Error('offline')));
    expect(text()).toContain('The balances could not be loaded.');
    expect(text()).not.toContain('No balances yet');
    host.answer = () => of([sixComponent]);
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Try again' }))).click();
    await fixture.whenStable();
    expect(host.loads).toEqual([false, false]);
    expect(text()).not.toContain('The balances could not be loaded.');
    expect((await (await table()).getCellTextByColumnName())['name'].text).toEqual(['Six-component balance']);
  });
});
