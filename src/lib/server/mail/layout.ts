/** Shared plain-text and HTML frame for Phosforge notices. */
export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

export function frame(title: string, paragraphs: string[], link?: { href: string; label: string }): { text: string; html: string } {
  const text = [title, '', ...paragraphs, ...(link ? ['', `${link.label}: ${link.href}`] : []), '', '— Phosforge'].join('\n');
  const html = `<!doctype html><html><body style="font-family:'IBM Plex Sans',Arial,sans-serif;color:#171c27">
<h2 style="color:#9c4309">${escapeHtml(title)}</h2>
${paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n')}
${link ? `<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p>` : ''}
<p style="color:#58657d;font-size:12px">— Phosforge</p></body></html>`;
  return { text, html };
}
