package org.clearance.report;

/** The report's style sheet (this project's own design). */
final class HtmlStyle {

  private HtmlStyle() {}

  static final String CSS = String.join("\n",
      ":root{--ink:#1c2024;--muted:#5d6670;--paper:#fbfaf7;--rule:#d9d4c7;--na:"
          + Palette.NOT_ASSESSED + ";--inc:#8a6d1f;--clear:#3d6b4f;--found:#4b1466}",
      "*{box-sizing:border-box}",
      "body{margin:0 auto;max-width:1040px;padding:24px 28px 48px;background:var(--paper);"
          + "color:var(--ink);font:15px/1.45 system-ui,-apple-system,'Segoe UI',sans-serif}",
      "header{border-bottom:3px double var(--rule);padding-bottom:12px}",
      ".kicker{margin:0;letter-spacing:.14em;text-transform:uppercase;font-size:12px;"
          + "color:var(--muted)}",
      "h1{margin:4px 0 10px;font-size:26px;font-weight:650}",
      "h2{font-size:19px;margin:28px 0 10px;padding-bottom:3px;border-bottom:1px solid "
          + "var(--rule)}",
      "h2 small{font-weight:400;color:var(--muted);font-size:14px}",
      ".meta{display:grid;grid-template-columns:repeat(3,1fr);gap:4px 18px;margin:0}",
      ".meta dt{font-size:11px;text-transform:uppercase;letter-spacing:.08em;color:var(--muted)}",
      ".meta dd{margin:0 0 4px}",
      ".cautions{margin-top:18px;background:#fff;border:1px solid var(--rule);border-top:4px solid"
          + " var(--ink);padding:4px 18px 8px}",
      ".cautions h2{border:0;margin-top:10px}",
      ".cautions li{margin:3px 0}",
      ".tiles{display:flex;flex-wrap:wrap;gap:10px}",
      ".tile{flex:1 1 140px;background:#fff;border:1px solid var(--rule);padding:8px 12px}",
      ".tile b{display:block;font-size:24px}",
      ".tile span{font-size:12px;color:var(--muted)}",
      ".tile.na{border-left:6px solid var(--na)}.tile.inc{border-left:6px solid var(--inc)}",
      ".tile.found{border-left:6px solid var(--found)}.tile.clear{border-left:6px solid "
          + "var(--clear)}",
      ".attention{border:2px solid var(--na);background:repeating-linear-gradient(135deg,"
          + "#eef0f3 0 10px,#f7f8fa 10px 20px);padding:2px 18px 10px}",
      ".attention h2{border:0;color:var(--na)}",
      "table{border-collapse:collapse;width:100%;margin:8px 0;background:#fff;font-size:13px}",
      "th{text-align:left;font-weight:600;border-bottom:2px solid var(--ink);padding:4px 6px}",
      "td{border-bottom:1px solid #ebe7dd;padding:3px 6px;vertical-align:top}",
      "table.sites td:first-child,table.sites td:nth-child(2),table.spans td:nth-child(2)"
          + "{white-space:nowrap}",
      "td.num{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}",
      "tr.na td{background:#eceef2}tr.inc td{background:#f6f0df}",
      ".badge{display:inline-block;font-size:11px;font-weight:700;letter-spacing:.05em;"
          + "padding:1px 6px;border-radius:2px;color:#fff;vertical-align:middle}",
      ".badge.na{background:var(--na)}.badge.inc{background:var(--inc)}",
      ".badge.clear{background:var(--clear)}.badge.found{background:var(--found)}",
      ".sw{display:inline-block;width:10px;height:10px;margin-right:5px;border-radius:50%}",
      ".reason{border-left:4px solid var(--na);padding:4px 10px;background:#fff}",
      ".note{color:var(--muted);font-size:13px}",
      "figure{margin:10px 0 2px}figcaption{font-size:12px;color:var(--muted)}",
      "svg.view{width:100%;height:auto;background:#fff;border:1px solid var(--rule)}",
      "svg .plot{fill:#fff;stroke:#c9c3b4}svg .grid{stroke:#eee9de}",
      "svg text{font:11px system-ui,sans-serif;fill:#555}svg .lbl{font-weight:700;fill:#111}",
      "svg .site{font-weight:700;font-size:12px}svg .axis{fill:#333}",
      ".legend{list-style:none;padding:0;display:flex;flex-wrap:wrap;gap:4px 16px;"
          + "font-size:12px}",
      ".key{display:inline-block;width:22px;height:10px;margin-right:5px;vertical-align:middle}",
      ".key.line{border-top:2px solid var(--c);height:0}",
      ".key.dash{border-top:2px dashed var(--c);height:0}",
      ".key.band{background:var(--c);opacity:.35}",
      ".key.dot{width:9px;height:9px;border-radius:50%;background:var(--c)}",
      ".facts{display:grid;grid-template-columns:max-content 1fr;gap:2px 14px}",
      ".facts dt{color:var(--muted)}.facts dd{margin:0;word-break:break-all}",
      "section.span{margin-top:34px}",
      "footer{margin-top:36px;font-size:12px;color:var(--muted);border-top:1px solid "
          + "var(--rule);padding-top:8px}",
      "h3{font-size:16px;margin:18px 0 6px}h3 small{font-weight:400;color:var(--muted)}",
      ".sub{margin:0 0 10px;color:var(--muted)}",
      "td.hash{font-family:ui-monospace,monospace;font-size:11px;word-break:break-all}",
      "figure,.figblock{break-inside:avoid;page-break-inside:avoid}",
      "h2,h3{break-after:avoid;page-break-after:avoid}",
      "tr{break-inside:avoid}",
      "td.verdict{min-width:15em}",
      // printed, a site table of a dozen columns must fit the A4 width: smaller type, tighter
      // cells, and the verdict allowed to wrap in a wide enough column
      "@media print{body{background:#fff;max-width:none;padding:0;font-size:12px}"
          + ".attention{background:#fff}section.span{break-before:page}"
          + "table{font-size:10px}table.sites{font-size:8.5px}"
          + "table.sites th,table.sites td{padding:2px 3px}td.verdict{min-width:13em}}");

  /**
   * Rules for printed pages: A4 with margins, and in the page margins the line and run (top) and
   * the page number of the total (bottom), through CSS Paged Media margin boxes.
   *
   * @param running the text at the top of every page
   */
  static String print(String running) {
    String quoted = running.replace("\\", "\\\\").replace("\"", "\\\"")
        .replace("<", "\\3c ").replace("\n", " ");
    return "@page{size:A4;margin:18mm 14mm 16mm;"
        + "@top-left{content:\"" + quoted + "\";font:9px system-ui,sans-serif;color:#555}"
        + "@bottom-right{content:\"page \" counter(page) \" of \" counter(pages);"
        + "font:9px system-ui,sans-serif;color:#555}"
        + "@bottom-left{content:\"Clearance screening report \\2014  a screening aid\";"
        + "font:9px system-ui,sans-serif;color:#555}}";
  }
}
