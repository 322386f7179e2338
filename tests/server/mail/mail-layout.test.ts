import { simpleParser } from 'mailparser';
import nodemailer from 'nodemailer';

import { escapeHtml, mailLayout, wrapText } from '@/server/mail/templates/layout';

const input = {
  heading: 'Twelve pieces are on their way to <The Lanthorn>',
  paragraphs: [
    'Saltmarsh Kiln has sent you 12 pieces for “Winter Salt”, insured at £4,210.00 in transit.',
    'The consignment sheet is attached.\nSign it when they arrive.',
  ],
  action: { label: 'See the pieces', url: 'https://saggar.example/venue?c=7&v=2' },
  footer: 'You get this because The Lanthorn takes work from Saltmarsh Kiln on sale or return.',
};

describe('mailLayout', () => {
  it('says the same in HTML and in plain text, escaped', () => {
    const { html, text } = mailLayout(input);
    expect(html).toContain('Twelve pieces are on their way to &lt;The Lanthorn&gt;');
    expect(html).not.toContain('<The Lanthorn>');
    expect(html).toContain('href="https://saggar.example/venue?c=7&amp;v=2"');
    expect(html).toContain('The consignment sheet is attached.<br>Sign it when they arrive.');
    expect(html).toMatch(/^<!doctype html>\n<html lang="en-GB">/);
    // Inline styles only: mail programs drop <style> blocks.
    expect(html).not.toMatch(/<style|<link|<script/i);

    expect(text).toBe(
      [
        'Twelve pieces are on their way to <The Lanthorn>',
        '='.repeat(48),
        '',
        'Saltmarsh Kiln has sent you 12 pieces for “Winter Salt”, insured at',
        '£4,210.00 in transit.',
        '',
        'The consignment sheet is attached.',
        'Sign it when they arrive.',
        '',
        'See the pieces:',
        'https://saggar.example/venue?c=7&v=2',
        '',
        '-- ',
        'You get this because The Lanthorn takes work from Saltmarsh Kiln on sale or',
        'return.',
        '',
      ].join('\n'),
    );
  });

  it('reads back, through nodemailer and mailparser, as the words it was given', async () => {
    const { html, text } = mailLayout(input);
    const transport = nodemailer.createTransport({ streamTransport: true, buffer: true });
    const { message } = await transport.sendMail({
      from: 'a@example.test',
      to: 'b@example.test',
      subject: 's',
      html,
      text,
    });
    const parsed = await simpleParser(message as Buffer);
    expect(parsed.text).toBe(text);
    expect(parsed.html).toBe(html);
  });

  it('leaves the action out of both parts when there is none', () => {
    const { html, text } = mailLayout({ ...input, action: undefined });
    expect(html).not.toContain('<a ');
    expect(text).not.toContain('https://');
  });

  it('refuses an action that is not a web address', () => {
    expect(() =>
      mailLayout({ ...input, action: { label: 'Open', url: 'javascript:alert(1)' } }),
    ).toThrow('A mail’s action must be a web address, not javascript:');
  });
});

describe('wrapText', () => {
  it('never breaks an address, however long', () => {
    const url = `https://saggar.example/${'a'.repeat(100)}`;
    expect(wrapText(`Open ${url} today`, 20)).toBe(`Open\n${url}\ntoday`);
  });
});

describe('escapeHtml', () => {
  it('escapes what could open markup or an attribute', () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe(
      '&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;',
    );
  });
});
