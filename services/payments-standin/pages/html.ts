const CSS = `
*{box-sizing:border-box}
body{margin:0;font:16px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,sans-serif;background:#f4f4f2;color:#1c1c1a}
.banner{background:#fff4cc;border-bottom:1px solid #d9c36a;padding:.6rem 1rem;text-align:center;font-size:.95rem}
main{max-width:30rem;margin:2rem auto;padding:0 1rem}
.panel{background:#fff;border:1px solid #d6d6d0;border-radius:6px;padding:1.5rem}
h1{font-size:1.35rem;margin:0 0 1rem}
h2{font-size:1rem;margin:0 0 .5rem}
.items{list-style:none;margin:0 0 .75rem;padding:0}
.items li{display:flex;justify-content:space-between;gap:1rem;padding:.25rem 0}
.total{display:flex;justify-content:space-between;border-top:1px solid #e4e4de;padding-top:.75rem;margin:0 0 1.25rem;font-weight:600}
.field{margin-bottom:1rem}
.row{display:flex;gap:1rem}.row .field{flex:1}
label{display:block;font-weight:600;margin-bottom:.25rem}
input{width:100%;font:inherit;padding:.55rem .65rem;border:1px solid #8a8a84;border-radius:4px;background:#fff;color:inherit}
input[aria-invalid=true]{border-color:#b3261e;border-width:2px}
:focus-visible{outline:3px solid #2456a6;outline-offset:2px}
.hint{font-size:.875rem;color:#4a4a46;margin:.25rem 0 0}
.field-error{font-size:.875rem;color:#b3261e;margin:.25rem 0 0}
.alert{border:2px solid #b3261e;background:#fdf0ef;color:#7a1912;border-radius:4px;padding:.6rem .75rem;margin-bottom:1rem;font-weight:600}
.actions{display:flex;gap:.75rem;flex-wrap:wrap;margin-top:1.25rem}
button,.button{font:inherit;font-weight:600;padding:.6rem 1.1rem;border-radius:4px;cursor:pointer;text-decoration:none;display:inline-block}
.primary{background:#2b2b28;color:#fff;border:1px solid #2b2b28}
.secondary{background:#fff;color:#2b2b28;border:1px solid #8a8a84}
.muted{color:#4a4a46}
`;

export function esc(value: string | number | null | undefined): string {
  return String(value ?? "")
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

export function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${esc(title)} · Gradeline local payment stand-in</title>
<style>${CSS}</style>
</head>
<body>
<div class="banner" role="note"><strong>Local payment stand-in — no real money</strong> · Gradeline development and tests only</div>
<main>${body}</main>
</body>
</html>`;
}

export function messagePage(title: string, message: string, link?: { href: string; label: string }): string {
  const action = link ? `<p class="actions"><a class="button secondary" href="${esc(link.href)}">${esc(link.label)}</a></p>` : "";
  return page(title, `<div class="panel"><h1>${esc(title)}</h1><p>${esc(message)}</p>${action}</div>`);
}
