package org.rosetra.runtime.render.record;

/**
 * The record's style sheet, inline so the page needs nothing from outside: generic font
 * families only, sizes that read on paper, and page rules that keep tables and figures whole on
 * A4 and Letter alike (size auto lets the printer's paper decide).
 */
final class RecordStyle {

  static final String CSS =
      String.join(
          "\n",
          ":root { color: #1d232b; background: #ffffff; }",
          "body { font-family: sans-serif; font-size: 11pt; line-height: 1.4; margin: 0 auto;"
              + " max-width: 60em; padding: 1.5em; }",
          "h1 { font-size: 18pt; margin: 0 0 0.4em 0; }",
          "h2 { font-size: 14pt; margin: 1.6em 0 0.5em 0; border-bottom: 1px solid #c8cdd3;"
              + " padding-bottom: 0.15em; }",
          "h3 { font-size: 12pt; margin: 1.1em 0 0.4em 0; }",
          ".caution { border: 2px solid #b0572a; background: #fbf3ee; padding: 0.6em 0.9em;"
              + " margin: 0.8em 0 1.2em 0; }",
          "table { border-collapse: collapse; margin: 0.4em 0 1em 0; font-size: 10pt; }",
          "caption { text-align: left; font-weight: bold; padding: 0 0 0.3em 0; }",
          "th, td { border: 1px solid #c8cdd3; padding: 0.2em 0.5em; vertical-align: top; }",
          "thead th { background: #eef1f4; text-align: left; }",
          "tbody th { text-align: left; font-weight: normal; }",
          "td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }",
          "td.absent { color: #6b727c; }",
          ".unit { color: #4a525c; font-weight: normal; }",
          ".fail { color: #a3202e; font-weight: bold; }",
          "figure { margin: 1em 0 1.4em 0; }",
          "figure svg { display: block; width: 100%; height: auto; max-width: 100%; }",
          "figcaption { font-size: 10pt; margin-top: 0.3em; }",
          ".files, .digest { font-family: monospace; font-size: 9pt; color: #4a525c;"
              + " word-break: break-all; }",
          "pre.script { font-family: monospace; font-size: 9pt; line-height: 1.35;"
              + " background: #f6f7f9; border: 1px solid #dde1e6; padding: 0.6em; white-space: pre-wrap; }",
          ".ln { color: #8a919a; user-select: none; }",
          "footer { margin-top: 2em; font-size: 9pt; color: #4a525c; }",
          ".meta { margin: -0.4em 0 0.8em 0; color: #4a525c; font-size: 10pt; }",
          "@page { size: auto; margin: 16mm 14mm; }",
          "@media print {",
          "  body { max-width: none; padding: 0; font-size: 10pt; }",
          "  table, figure, .caution { break-inside: avoid; page-break-inside: avoid; }",
          "  h2, h3, caption, h2 + p, h3 + p { break-after: avoid; page-break-after: avoid; }",
          "  figure svg { max-height: 24cm; }",
          "}",
          "");

  private RecordStyle() {}
}
