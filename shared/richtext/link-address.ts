/**
 * A link's address as a person types it: web (http, https) and e-mail (mailto) addresses only,
 * the schemes the renderer keeps; a bare domain becomes https, a bare e-mail address mailto.
 */
export function checkLinkAddress(raw: string): { href: string } | { problem: string } {
  const value = raw.trim();
  if (!value) return { problem: 'Give the address the link goes to.' };
  if (/^[^\s@:/]+@[^\s@/]+\.[^\s@/]+$/.test(value)) return { href: `mailto:${value}` };
  if (/^mailto:[^\s@]+@[^\s@]+\.[^\s@]+$/i.test(value)) return { href: value };
  if (/^https?:\/\/[^\s/$.?#][^\s]*$/i.test(value)) return { href: value };
  if (/^[a-z][a-z0-9+.-]*:/i.test(value)) return { problem: 'Links may go only to web addresses (starting with https:// or http://) or e-mail addresses (mailto:).' };
  if (/^[^\s/]+\.[^\s]+$/.test(value)) return { href: `https://${value}` };
  return { problem: 'That is not a web or e-mail address. Start it with https:// (or mailto: for e-mail).' };
}
