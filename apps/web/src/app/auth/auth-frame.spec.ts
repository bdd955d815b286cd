import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { AuthFrame } from './auth-frame';

/** A page in the frame, narrow like the sign-in form or wide like the public check of a sheet. */
@Component({
  selector: 'tw-framed-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [AuthFrame],
  template: `<tw-auth-frame heading="Check a result sheet" [wide]="wide()"><p class="content">Enter the report number.</p></tw-auth-frame>`,
})
class FramedHost {
  readonly wide = input(false);
}

describe('AuthFrame', () => {
  let fixture: ComponentFixture<FramedHost>;
  let host: HTMLElement;

  async function render(wide: boolean): Promise<HTMLElement> {
    fixture = TestBed.createComponent(FramedHost);
    fixture.componentRef.setInput('wide', wide);
    await fixture.whenStable();
    host = fixture.nativeElement as HTMLElement;
    const card = host.querySelector<HTMLElement>('mat-card');
    if (!card) throw new Error('The frame drew no card');
    return card;
  }

  it('puts the heading, the page and the safety notice in one main landmark', async () => {
    await render(false);
    const main = host.querySelector('main');
    expect(main?.querySelector('h1')?.textContent?.trim()).toBe('Check a result sheet');
    expect(main?.querySelector('mat-card-content .content')?.textContent).toBe('Enter the report number.');
    expect(main?.querySelector('footer tw-safety-notice')?.textContent).toContain('Test data, not design values.');
  });

  it('keeps the card at 440px for a form and widens it to 680px when asked', async () => {
    expect(getComputedStyle(await render(false)).maxWidth).toBe('440px');
    expect(getComputedStyle(await render(true)).maxWidth).toBe('680px');
  });
});
