/**
 * The one look of Saggar's e-mail: warm paper, ink, a celadon button; inline styles and layout
 * tables, since mail programs drop style sheets; and always a plain-text part saying the same.
 * A template beside this file is a function from its data to `{ subject, ...mailLayout(…) }`.
 */

export type MailLayoutInput = {
  heading: string;
  /** Plain text, one entry per paragraph; a line break inside one is kept. */
  paragraphs: readonly string[];
  /**
   * Things listed one by one after the paragraphs, each with a picture sent inside the message
   * (`cid:`) when it has one; the text part gives the words alone.
   */
  items?: readonly { text: string; imageCid: string | null; alt: string }[];
  /** The one thing to do next, as a button (and its address written out in the text part). */
  action?: { label: string; url: string };
  /** Why the reader got this, who sent it: small print under a rule. */
  footer: string;
};

export type RenderedMail = { html: string; text: string };

// The product's palette (constants/theme.ts), repeated here: mail cannot load the app's module.
const colours = {
  paper: '#F6F1E7',
  surface: '#FCFAF5',
  ink: '#2B2724',
  inkMuted: '#625A50',
  hairline: '#E2DACB',
  accent: '#2F6B5A',
  onAccent: '#FCFAF5',
};
const serif = "Georgia, 'Times New Roman', serif";
const sans = "-apple-system, 'Segoe UI', Helvetica, Arial, sans-serif";

const entities: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/** Text as HTML: every character that could open markup or an attribute is escaped. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => entities[c]!);
}

const paragraphHtml = (text: string) => escapeHtml(text).replace(/\r?\n/g, '<br>');

/** Only web addresses become buttons: never `javascript:` or `data:`. */
function checkedUrl(url: string): string {
  const parsed = new URL(url);
  if (parsed.protocol !== 'https:' && parsed.protocol !== 'http:') {
    throw new Error(`A mail’s action must be a web address, not ${parsed.protocol}`);
  }
  return parsed.href;
}

/** Wraps text at `width` columns on spaces, never inside a word (so addresses stay whole). */
export function wrapText(text: string, width = 76): string {
  return text
    .split(/\r?\n/)
    .map((line) => {
      const out: string[] = [];
      let current = '';
      for (const word of line.split(/ +/)) {
        if (current !== '' && current.length + 1 + word.length > width) {
          out.push(current);
          current = word;
        } else {
          current = current === '' ? word : `${current} ${word}`;
        }
      }
      out.push(current);
      return out.join('\n');
    })
    .join('\n');
}

function itemHtml(item: NonNullable<MailLayoutInput['items']>[number]) {
  const picture = item.imageCid
    ? `<td width="96" valign="top" style="padding:0 16px 0 0;"><img src="cid:${escapeHtml(item.imageCid)}" width="96" height="96" alt="${escapeHtml(item.alt)}" style="display:block;border-radius:6px;border:1px solid ${colours.hairline};"></td>`
    : '';
  return (
    `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="margin:0 0 16px;border-top:1px solid ${colours.hairline};"><tr>` +
    `${picture}<td valign="top" style="padding:12px 0 0;font-family:${sans};font-size:15px;line-height:22px;color:${colours.ink};">${paragraphHtml(item.text)}</td>` +
    `</tr></table>`
  );
}

function htmlPart(
  { heading, paragraphs, items = [], action, footer }: MailLayoutInput,
  url: string | null,
) {
  const p = (text: string) =>
    `<p style="margin:0 0 16px;font-family:${sans};font-size:16px;line-height:24px;color:${colours.ink};">${paragraphHtml(text)}</p>`;
  const button =
    action && url
      ? `<table role="presentation" cellpadding="0" cellspacing="0" border="0" style="margin:8px 0 24px;">` +
        `<tr><td style="border-radius:8px;background:${colours.accent};">` +
        `<a href="${escapeHtml(url)}" style="display:inline-block;padding:12px 22px;font-family:${sans};font-size:16px;line-height:24px;font-weight:600;color:${colours.onAccent};text-decoration:none;border-radius:8px;">${escapeHtml(action.label)}</a>` +
        `</td></tr></table>` +
        `<p style="margin:0 0 16px;font-family:${sans};font-size:14px;line-height:21px;color:${colours.inkMuted};">If the button does not open, copy this address into your browser:<br><a href="${escapeHtml(url)}" style="color:${colours.accent};word-break:break-all;">${escapeHtml(url)}</a></p>`
      : '';
  return [
    '<!doctype html>',
    '<html lang="en-GB">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<meta name="color-scheme" content="light">',
    `<title>${escapeHtml(heading)}</title>`,
    '</head>',
    `<body style="margin:0;padding:0;background:${colours.paper};">`,
    `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="background:${colours.paper};">`,
    '<tr><td align="center" style="padding:32px 16px;">',
    `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="max-width:560px;background:${colours.surface};border:1px solid ${colours.hairline};border-radius:12px;">`,
    `<tr><td style="padding:28px 32px 4px;font-family:${serif};font-size:13px;line-height:18px;letter-spacing:0.12em;text-transform:uppercase;color:${colours.inkMuted};">Saggar</td></tr>`,
    '<tr><td style="padding:8px 32px 8px;">',
    `<h1 style="margin:0 0 16px;font-family:${serif};font-size:24px;line-height:32px;font-weight:600;color:${colours.ink};">${escapeHtml(heading)}</h1>`,
    ...paragraphs.map(p),
    ...items.map(itemHtml),
    button,
    '</td></tr>',
    `<tr><td style="padding:16px 32px 28px;border-top:1px solid ${colours.hairline};font-family:${sans};font-size:13px;line-height:19px;color:${colours.inkMuted};">${paragraphHtml(footer)}</td></tr>`,
    '</table>',
    '</td></tr>',
    '</table>',
    '</body>',
    '</html>',
  ]
    .filter(Boolean)
    .join('\n');
}

function textPart(
  { heading, paragraphs, items = [], action, footer }: MailLayoutInput,
  url: string | null,
) {
  const parts = [
    `${heading}\n${'='.repeat(Math.min(heading.length, 76))}`,
    ...paragraphs.map((p) => wrapText(p)),
    ...items.map((item) => wrapText(item.text)),
  ];
  if (action && url) parts.push(`${action.label}:\n${url}`);
  // "-- " on a line of its own marks what follows as the signature (RFC 3676 §4.3).
  parts.push(`-- \n${wrapText(footer)}`);
  return `${parts.join('\n\n')}\n`;
}

/** The HTML and the plain-text parts of one message, from the same words. */
export function mailLayout(input: MailLayoutInput): RenderedMail {
  const url = input.action ? checkedUrl(input.action.url) : null;
  return { html: htmlPart(input, url), text: textPart(input, url) };
}
