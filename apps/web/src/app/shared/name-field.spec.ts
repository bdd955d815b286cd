import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { FormControl, Validators } from '@angular/forms';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { NameField } from './name-field';

@Component({
  selector: 'tw-name-field-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [NameField],
  template: `<tw-name-field [control]="name" />`,
})
class NameFieldHost {
  readonly name = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(120)] });
}

describe('NameField', () => {
  let fixture: ComponentFixture<NameFieldHost>;

  beforeEach(async () => {
    fixture = TestBed.createComponent(NameFieldHost);
    await fixture.whenStable();
  });

  const field = () => TestbedHarnessEnvironment.loader(fixture).getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Name' }));
  const control = () => fixture.componentInstance.name;

  it('writes what is typed into the control, and asks for a name once touched and empty', async () => {
    const input = await (await field()).getControl(MatInputHarness);
    await input?.setValue('Low-speed loop');
    expect(control().value).toBe('Low-speed loop');
    await input?.setValue('');
    await input?.blur();
    expect(await (await field()).getTextErrors()).toEqual(['Enter a name']);
  });

  it('says how long a name may be', async () => {
    control().setValue('x'.repeat(121));
    control().markAsTouched();
    await fixture.whenStable();
    expect(await (await field()).getTextErrors()).toEqual(['Use at most 120 characters']);
  });

  it('shows what the server said about the name', async () => {
    control().setValue('Low-speed loop');
    control().setErrors({ server: 'A tunnel of this name already exists' });
    control().markAsTouched();
    await fixture.whenStable();
    expect(await (await field()).getTextErrors()).toEqual(['A tunnel of this name already exists']);
  });
});
