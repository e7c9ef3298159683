const ESCAPES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/** Escapes text for use in HTML element content and quoted attribute values. */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (char) => ESCAPES[char] ?? char);
}

/**
 * Wraps a body in a complete page. The banner makes it obvious in a browser that this
 * is a local stand-in, so nobody mistakes it for the hosted service. `extraCss` holds one
 * page's own rules, after the shared ones.
 */
export function renderPage(title: string, body: string, banner: string, extraCss = ''): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>
  body { font-family: system-ui, sans-serif; margin: 0; color: #1d2b24; background: #f6f8f7; }
  main { max-width: 52rem; margin: 0 auto; padding: 1rem 1.25rem 3rem; }
  .banner { background: #7a4b00; color: #fff; padding: .5rem 1.25rem; font-weight: 600; }
  button { font: inherit; padding: .45rem .9rem; cursor: pointer; }
  input { font: inherit; padding: .35rem; }
  label { display: block; margin: .5rem 0 .2rem; }
  a { color: #0b5d44; }
  table { border-collapse: collapse; width: 100%; }
  th, td { text-align: left; padding: .4rem; border-bottom: 1px solid #cdd8d2; }
  pre { white-space: pre-wrap; background: #fff; padding: .75rem; border: 1px solid #cdd8d2; }
  .visually-hidden { position: absolute; width: 1px; height: 1px; overflow: hidden; clip-path: inset(50%); white-space: nowrap; }
  iframe { width: 100%; min-height: 24rem; border: 1px solid #cdd8d2; background: #fff; }
${extraCss}</style>
</head>
<body>
<p class="banner" role="note">${escapeHtml(banner)}</p>
<main>
${body}
</main>
</body>
</html>
`;
}
