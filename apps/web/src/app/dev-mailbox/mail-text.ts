import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

/** A piece of a mail body: plain text or a link. */
interface TextPart {
  readonly text: string;
  readonly href: string | null;
}

const urlPattern = /(https?:\/\/[^\s<>"')]+)/g;

/** Splits text into plain runs and http(s) links, so links can be rendered without HTML injection. */
export function splitLinks(text: string): TextPart[] {
  return text
    .split(urlPattern)
    .filter((part) => part.length > 0)
    .map((part) => ({ text: part, href: /^https?:\/\//.test(part) ? part : null }));
}

/** The plain-text body of a mail, with web addresses turned into links. */
@Component({
  selector: 'tw-mail-text',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `<pre class="body">@for (part of parts(); track $index) {@if (part.href) {<a [href]="part.href">{{ part.text }}</a>} @else {{{ part.text }}}}</pre>`,
  styles: `
    .body {
      white-space: pre-wrap;
      word-break: break-word;
      font-family: inherit;
      margin: 0;
      padding: 12px 16px;
      border-radius: var(--mat-sys-corner-small);
      background: var(--mat-sys-surface-container-low);
    }
  `,
})
export class MailText {
  readonly text = input.required<string>();
  protected readonly parts = computed(() => splitLinks(this.text()));
}
