/**
 * Turns the function reference (docs/functions/*.md, readable in the repository) into the help pages
 * Excel opens from each function's helpUrl (dist/help/<id>.html), with an index page.
 * Used by webpack.config.js as a plugin; also runnable alone: node scripts/help-pages.js OUT_DIR
 */
const fs = require("fs");
const path = require("path");

const DOCS = path.join(__dirname, "..", "docs", "functions");

function escapeHtml(text) {
  return text.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]);
}

function page(title, body) {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src 'self' data:">
<title>${escapeHtml(title)} — Protolyte</title>
<style>
  body { font: 15px/1.55 system-ui, -apple-system, "Segoe UI", sans-serif; max-width: 52rem; margin: 2rem auto; padding: 0 1rem; color: #1d2a30; }
  h1, h2, h3 { color: #124e66; line-height: 1.25; }
  code, pre { font-family: ui-monospace, "Cascadia Mono", Consolas, monospace; background: #eef4f6; border-radius: 3px; }
  code { padding: 0 .2em; } pre { padding: .7em; overflow-x: auto; }
  table { border-collapse: collapse; margin: 1em 0; } th, td { border: 1px solid #c9d7dc; padding: .3em .6em; text-align: left; vertical-align: top; }
  th { background: #eef4f6; }
  nav { font-size: .9em; margin-bottom: 1.5em; } a { color: #0b6b8a; }
  .caution { border-left: 4px solid #c8553d; padding: .2em .8em; background: #fbf1ee; }
</style>
</head>
<body>
<nav><a href="index.html">Protolyte function reference</a></nav>
${body}
<p class="caution">A calculated pH is an estimate: confirm it with a calibrated pH meter. Strong acids and bases are corrosive.
Validated procedures, pharmacopoeial methods and local regulations govern product and release decisions.</p>
</body>
</html>
`;
}

function build(outDir) {
  const { marked } = require("marked");
  if (!fs.existsSync(DOCS)) return [];
  fs.mkdirSync(outDir, { recursive: true });
  const files = fs.readdirSync(DOCS).filter((f) => f.endsWith(".md")).sort();
  const written = [];
  for (const file of files) {
    const md = fs.readFileSync(path.join(DOCS, file), "utf8");
    const title = (md.match(/^#\s+(.+)$/m) || [null, file])[1];
    // Links between pages are written as ./name.md in the repository and become name.html here.
    const html = marked.parse(md).replace(/href="\.\/([\w-]+)\.md"/g, 'href="$1.html"').replace(/href="README\.md"/g, 'href="index.html"');
    const name = file === "README.md" ? "index.html" : file.replace(/\.md$/, ".html");
    fs.writeFileSync(path.join(outDir, name), page(title, html));
    written.push(name);
  }
  return written;
}

class HelpPagesPlugin {
  apply(compiler) {
    compiler.hooks.afterEmit.tap("HelpPagesPlugin", () => {
      build(path.join(compiler.options.output.path, "help"));
    });
  }
}

module.exports = { HelpPagesPlugin, buildHelpPages: build };

if (require.main === module) {
  const out = process.argv[2] || path.join(__dirname, "..", "dist", "help");
  console.log(`wrote ${build(out).length} help pages to ${out}`);
}
