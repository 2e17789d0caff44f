/** The token a link carries after `#`; the fragment never reaches the server's logs. */
export function linkToken(): string {
  return decodeURIComponent(window.location.hash.replace(/^#/, '')).trim();
}
