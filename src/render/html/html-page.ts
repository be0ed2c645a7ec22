import { escapeHtml } from './html-escape.ts';

// The frame of every HTML file we write: self-contained, the style sheet
// inline, no script and nothing fetched (the Content-Security-Policy forbids
// both), the title as the page's heading.

export function htmlPage(title: string, css: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'">
<title>${escapeHtml(title)}</title>
<style>${css}</style>
</head>
<body>
<main>
<h1>${escapeHtml(title)}</h1>
${body}</main>
</body>
</html>
`;
}
