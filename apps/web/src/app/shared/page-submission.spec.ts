import { HttpClient, provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { PageSubmission } from './page-submission';

interface Renamed {
  readonly name: string;
}

/** A page with a form of two fields that renames a wind-tunnel model, as the pages with one form do. */
@Component({
  selector: 'tw-rename-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule],
  template: `
    <form [formGroup]="form">
      <input formControlName="code" />
      <input formControlName="name" />
    </form>
  `,
})
class RenameHost {
  private readonly http = inject(HttpClient);
  readonly form = inject(NonNullableFormBuilder).group({ code: ['M-12'], name: ['', Validators.required] });
  readonly done: Renamed[] = [];
  readonly submission = new PageSubmission(this.form, (error) => `Not renamed (${String((error as { status?: number }).status)})`);

  rename(): void {
    this.submission.send(
      () => this.http.post<Renamed>('/api/models/m-12', this.form.getRawValue()),
      (answer) => this.done.push(answer),
    );
  }
}

describe('PageSubmission', () => {
  let fixture: ComponentFixture<RenameHost>;
  let page: RenameHost;
  let backend: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(RenameHost);
    page = fixture.componentInstance;
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  it('sends nothing while the form is invalid, shows every message and puts the focus on the first bad field', async () => {
    page.rename();
    await fixture.whenStable();
    backend.expectNone('/api/models/m-12');
    expect(page.form.controls.name.touched).toBe(true);
    const [, name] = (fixture.nativeElement as HTMLElement).querySelectorAll('input');
    expect(document.activeElement).toBe(name);
    expect(page.submission.busy()).toBe(false);
  });

  it('is busy while the request runs and hands the answer on once it is over', () => {
    page.form.controls.name.setValue('Estate car, 1:5');
    page.rename();
    expect(page.submission.busy()).toBe(true);
    const request = backend.expectOne('/api/models/m-12');
    expect(request.request.body).toEqual({ code: 'M-12', name: 'Estate car, 1:5' });
    request.flush({ name: 'Estate car, 1:5' });
    expect(page.submission.busy()).toBe(false);
    expect(page.submission.error()).toBeNull();
    expect(page.done).toEqual([{ name: 'Estate car, 1:5' }]);
  });

  it('says in the page’s words why it failed, and forgets that on the next try', () => {
    page.form.controls.name.setValue('Estate car, 1:5');
    page.rename();
    backend.expectOne('/api/models/m-12').flush({ title: 'Too many requests', status: 429 }, { status: 429, statusText: 'Too Many Requests' });
    expect(page.submission.error()).toBe('Not renamed (429)');
    expect(page.submission.busy()).toBe(false);
    expect(page.done).toEqual([]);

    page.rename();
    expect(page.submission.error()).toBeNull();
    backend.expectOne('/api/models/m-12').flush({ name: 'Estate car, 1:5' });
    expect(page.done).toHaveLength(1);
  });
});
