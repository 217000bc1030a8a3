// The mails below have the shape apps/api/src/modules/notifications/notification-templates.ts writes:
// a link per event ("Label: <url>" in the text part) and a footer link to the settings page.
import { describe, expect, it } from 'vitest';
import { linksInMail } from './mail-links';

const site = 'http://127.0.0.1:5321';

const commentMail = {
  text: [
    'Hello Tamsin Reyl,',
    '',
    'Oskar commented on your case "VSYS short".',
    '',
    '> Check C2 as well.',
    '',
    'Read the comment: http://127.0.0.1:5321/cases/7#comment-12',
    '',
    'You get these e-mails from Railyard because of your notification settings: http://127.0.0.1:5321/settings/notifications',
  ].join('\n'),
  html:
    '<!doctype html><html><body><p>Hello Tamsin Reyl,</p><p>Oskar commented.</p>' +
    '<p><a href="http://127.0.0.1:5321/cases/7#comment-12">Read the comment</a></p>' +
    '<p style="color:#666">You get these e-mails because of your ' +
    '<a href="http://127.0.0.1:5321/settings/notifications">notification settings</a>.</p></body></html>',
};

describe('links in a caught mail', () => {
  it('lists each link once, with the text the HTML part gives it, in the order of the mail', () => {
    expect(linksInMail(commentMail, site)).toEqual([
      {
        label: 'Read the comment',
        href: 'http://127.0.0.1:5321/cases/7#comment-12',
        path: '/cases/7#comment-12',
        otherOrigin: false,
      },
      {
        label: 'notification settings',
        href: 'http://127.0.0.1:5321/settings/notifications',
        path: '/settings/notifications',
        otherOrigin: false,
      },
    ]);
  });

  it('says when the mail points at another origin than the site it is read on', () => {
    const [first] = linksInMail(commentMail, 'http://localhost:5173');
    expect(first).toMatchObject({ path: '/cases/7#comment-12', otherOrigin: true });
  });

  it('finds the links of a text-only mail, labelled by the words before them on the line', () => {
    const links = linksInMail({ text: commentMail.text, html: null }, site);
    expect(links.map((link) => link.label)).toEqual([
      'Read the comment',
      // the footer's sentence is too long to be a label; the path stands in for it
      '/settings/notifications',
    ]);
  });

  it('decodes entities in addresses and labels, and leaves out what is not a web link', () => {
    const links = linksInMail(
      {
        text: 'Write to us: mailto:bench@example.com.',
        html:
          '<a href="http://127.0.0.1:5321/search?q=vsys&amp;board=ls-io">Search &#8220;<b>VSYS</b>&#x201D; &amp; more</a>' +
          '<a href="javascript:alert(1)">run</a><a href=\'mailto:bench@example.com\'>mail</a>',
      },
      site,
    );
    expect(links).toEqual([
      {
        label: 'Search “VSYS” & more',
        href: 'http://127.0.0.1:5321/search?q=vsys&board=ls-io',
        path: '/search?q=vsys&board=ls-io',
        otherOrigin: false,
      },
    ]);
  });

  it('drops the full stop that ends a sentence after a plain-text address', () => {
    const [link] = linksInMail({ text: 'See http://127.0.0.1:5321/cases/3.', html: null }, site);
    expect(link?.href).toBe('http://127.0.0.1:5321/cases/3');
  });
});
