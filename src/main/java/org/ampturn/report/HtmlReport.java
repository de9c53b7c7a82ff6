package org.ampturn.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import org.ampturn.Ampturn;
import org.ampturn.worksheet.Block;
import org.ampturn.worksheet.Evaluation;
import org.ampturn.worksheet.Mismatch;
import org.ampturn.worksheet.Replay;
import org.ampturn.worksheet.Worksheet;
import org.ampturn.worksheet.WorksheetFiles;

/**
 * The report of a worksheet: one self-contained HTML file with inline CSS (screen and A4 print),
 * the title and header, notes as prose, each entry with its result, the charts embedded as
 * {@code data:} images (SVG too, so none of its scripts runs; nothing is fetched from a network), the cautions that apply
 * ({@link Cautions}), the tool and Java versions, and the statement that results defer to local
 * codes and licensed practice.
 */
public final class HtmlReport {
    private HtmlReport() {}

    /**
     * Renders the report. {@code steps} are the results of a fresh run (the worksheet's own entries
     * in order); when null the recorded results are shown. {@code file} locates figures (may be null).
     */
    public static String render(Worksheet w, Path file, List<Replay.Step> steps) {
        return render(w, file, steps, List.of());
    }

    /**
     * Renders the report with the differences between the fresh run and the records marked at
     * their entries and counted at the top.
     */
    public static String render(Worksheet w, Path file, List<Replay.Step> steps, List<Mismatch> differences) {
        return render(w, file, steps, differences, List.of());
    }

    /**
     * As above; charts are embedded from the worksheet's figures folder and from {@code drawnIn}
     * (where a fresh run drew them), and from nowhere else.
     */
    public static String render(Worksheet w, Path file, List<Replay.Step> steps, List<Mismatch> differences, List<Path> drawnIn) {
        List<Path> figureDirs = new ArrayList<>(drawnIn);
        if (file != null) figureDirs.add(WorksheetFiles.figuresFolder(file));
        java.util.Map<Integer, List<Mismatch>> differ = new java.util.HashMap<>();
        for (Mismatch m : differences) {
            if (file == null || m.file() == null || m.file().toAbsolutePath().normalize().equals(file.toAbsolutePath().normalize())) {
                differ.computeIfAbsent(m.line(), k -> new ArrayList<>()).add(m);
            }
        }
        List<Block.Entry> fresh = freshEntries(w, file, steps);
        List<Boolean> failed = failedEntries(w, file, steps);
        List<List<Object>> values = freshValues(w, file, steps);
        List<org.ampturn.session.Outcome> outcomes = freshOutcomes(w, file, steps);
        Path base = file == null || file.toAbsolutePath().getParent() == null ? Path.of(".") : file.toAbsolutePath().getParent();
        String title = w.title().isEmpty() ? (file == null ? "Worksheet" : file.getFileName().toString()) : w.title();

        List<Cautions.Seen> seen = new ArrayList<>();
        List<String> errors = new ArrayList<>();
        int ei = 0;
        for (int k = 0; k < w.blocks().size(); k++) {
            if (w.blocks().get(k) instanceof Block.Entry) {
                Block.Entry e = fresh.get(ei++);
                seen.add(new Cautions.Seen(w.lineOf(k), e.source(), e.results(), values.get(ei - 1)));
                if (failed.get(ei - 1)) errors.add("line " + w.lineOf(k));
            }
        }
        List<Cautions.Caution> cautions = Cautions.scan(seen);

        StringBuilder h = new StringBuilder(16_384);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<meta name=\"generator\" content=\"ampturn ").append(esc(Ampturn.version())).append("\">\n")
                .append("<title>").append(esc(title)).append("</title>\n<style>\n").append(CSS).append("</style>\n</head>\n<body>\n");
        h.append("<header>\n<h1>").append(esc(title)).append("</h1>\n<dl class=\"meta\">\n");
        // what a design file needs first: who, which revision, which exact text, which tool, checked or not
        for (String key : List.of("author", "checker", "revision", "date")) {
            h.append("<dt>").append(key).append("</dt><dd>").append(esc(w.header().getOrDefault(key, "(not given in the header)"))).append("</dd>\n");
        }
        for (Map.Entry<String, String> e : w.header().entrySet()) {
            if (List.of("title", "author", "checker", "revision", "date").contains(e.getKey())) continue;
            h.append("<dt>").append(esc(e.getKey())).append("</dt><dd>").append(esc(e.getValue())).append("</dd>\n");
        }
        if (file != null) {
            h.append("<dt>file</dt><dd>").append(esc(file.getFileName().toString())).append("</dd>\n");
            try {
                h.append("<dt>SHA-256</dt><dd><code>").append(org.ampturn.worksheet.TrustStore.hash(Files.readAllBytes(file)))
                        .append("</code> (the file as it is on disk)</dd>\n");
            } catch (IOException e) {
                h.append("<dt>SHA-256</dt><dd>(the file could not be read)</dd>\n");
            }
        }
        h.append("<dt>made with</dt><dd>Ampturn ").append(esc(Ampturn.version())).append(" on Java ")
                .append(esc(System.getProperty("java.version"))).append("</dd>\n");
        boolean anyFailed = failed.stream().anyMatch(b -> b);
        String verdict = steps == null ? "not verified: the results are as recorded in the worksheet"
                : anyFailed ? "NOT verified: entries failed when run on " + LocalDate.now()
                : differences.isEmpty() ? "verified: computed afresh on " + LocalDate.now() + ", every result as recorded"
                : "NOT verified: computed afresh on " + LocalDate.now() + "; " + differences.size() + " differ from the record (marked below)";
        h.append("<dt>results</dt><dd class=\"").append(verdict.startsWith("verified") ? "ok" : "notok").append("\">").append(esc(verdict))
                .append("</dd>\n</dl>\n</header>\n");
        h.append(summary(w, fresh));

        h.append("<section class=\"cautions\" id=\"cautions\">\n<h2>Cautions</h2>\n");
        if (cautions.isEmpty()) {
            h.append("<p>None of the common-practice caution thresholds (voltage above 60 V, mains-level voltage, "
                    + "stored energy above 1 J, surfaces above 60 °C) was reached by the values in this worksheet.</p>\n");
        }
        for (Cautions.Caution c : cautions) {
            h.append("<div class=\"caution\"><h3>").append(esc(c.heading())).append("</h3>\n<p>").append(esc(c.text()))
                    .append("</p>\n<p class=\"where\">Seen at ").append(esc(String.join("; ", c.where()))).append(".</p></div>\n");
        }
        h.append("<p class=\"defer\">").append(esc(Cautions.DEFER)).append("</p>\n</section>\n");
        if (!errors.isEmpty()) {
            h.append("<p class=\"failed\">Some entries failed when the worksheet was run for this report (")
                    .append(esc(String.join(", ", errors))).append("); their messages are shown in place.</p>\n");
        }

        h.append("<main>\n");
        StringBuilder para = new StringBuilder();
        ei = 0;
        for (int k = 0; k < w.blocks().size(); k++) {
            Block b = w.blocks().get(k);
            if (b instanceof Block.Note) {
                String t = ((Block.Note) b).text().strip();
                if (t.isEmpty()) flush(h, para);
                else para.append(para.length() == 0 ? "" : " ").append(t);
                continue;
            }
            flush(h, para);
            if (b instanceof Block.Failed) {
                Block.Failed f = (Block.Failed) b;
                h.append("<section class=\"entry notrun\" id=\"line-").append(w.lineOf(k)).append("\">\n<div class=\"line\">")
                        .append(w.lineOf(k)).append("</div>\n<pre class=\"src\"><code>").append(esc(f.source())).append("</code></pre>\n")
                        .append("<p class=\"failed-note\">This entry failed or was stopped when it was recorded; it is kept as a record and not run.</p>\n");
                if (!f.results().isEmpty()) {
                    h.append("<pre class=\"out\">");
                    for (String r : f.results()) {
                        String d = Evaluation.toDisplay(r).substring(2);
                        h.append(r.startsWith("! ") ? "<span class=\"err\">" + esc(d) + "</span>" : esc(d)).append('\n');
                    }
                    h.setLength(h.length() - 1);
                    h.append("</pre>\n");
                }
                h.append("</section>\n");
            } else if (b instanceof Block.Use) {
                h.append("<p class=\"use\">Uses the definitions of <code>").append(esc(((Block.Use) b).path())).append("</code>.</p>\n");
            } else if (b instanceof Block.Entry) {
                Block.Entry e = fresh.get(ei++);
                h.append("<section class=\"entry\" id=\"line-").append(w.lineOf(k)).append("\">\n<div class=\"line\">")
                        .append(w.lineOf(k)).append("</div>\n<pre class=\"src\"><code>").append(esc(e.source())).append("</code></pre>\n");
                org.ampturn.session.Outcome now = outcomes.get(ei - 1);
                if (now != null && !now.results().isEmpty()) {
                    // a fresh result: shown from its typed parts, as the console shows it
                    h.append("<pre class=\"out\">");
                    for (org.ampturn.session.Outcome.Result r : now.results()) {
                        List<String> shown = new org.ampturn.session.Outcome(now.source(), r.kind(), List.of(r), false, true).lines();
                        StringBuilder t = new StringBuilder();
                        for (String l : shown) t.append(l.substring(2)).append('\n');
                        t.setLength(t.length() - 1);
                        if (r.kind() == org.ampturn.session.Outcome.Kind.ERROR) h.append("<span class=\"err\">").append(esc(t.toString())).append("</span>\n");
                        else h.append(esc(t.toString())).append('\n');
                    }
                    h.setLength(h.length() - 1);
                    h.append("</pre>\n");
                } else if (now == null && !e.results().isEmpty()) {
                    // a recorded result: the file keeps text, marked "! " for an error
                    h.append("<pre class=\"out\">");
                    for (String r : e.results()) {
                        String d = Evaluation.toDisplay(r).substring(2);
                        if (r.startsWith("! ")) h.append("<span class=\"err\">").append(esc(d)).append("</span>\n");
                        else h.append(esc(d)).append('\n');
                    }
                    h.setLength(h.length() - 1);
                    h.append("</pre>\n");
                }
                for (Mismatch m : differ.getOrDefault(w.lineOf(k), List.of())) {
                    h.append("<p class=\"differs\">Differs from the record (").append(esc(m.reason())).append("): recorded <code>")
                            .append(esc(m.recorded() == null ? "(nothing)" : m.recorded())).append("</code>, now <code>")
                            .append(esc(m.fresh() == null ? "(nothing)" : m.fresh())).append("</code>.</p>\n");
                }
                for (String f : e.figures()) h.append(figure(base, f, figureDirs));
                h.append("</section>\n");
            }
        }
        flush(h, para);
        h.append("</main>\n<footer>\n<p>Made with Ampturn ").append(esc(Ampturn.version())).append(" on Java ")
                .append(esc(System.getProperty("java.version"))).append(" (").append(esc(System.getProperty("java.vendor", "")))
                .append(").</p>\n<p>").append(esc(Cautions.DEFER)).append("</p>\n</footer>\n</body>\n</html>\n");
        return h.toString();
    }

    /** Renders and writes the report atomically. */
    public static Path write(Worksheet w, Path file, List<Replay.Step> steps, Path out) throws IOException {
        return write(w, file, steps, List.of(), out);
    }

    /**
     * Renders the report with its differences marked and writes it atomically; refuses a target that
     * is the worksheet itself or another worksheet ({@link #clash}).
     */
    public static Path write(Worksheet w, Path file, List<Replay.Step> steps, List<Mismatch> differences, Path out) throws IOException {
        return write(w, file, steps, differences, List.of(), out);
    }

    /** As above, embedding charts the fresh run drew in {@code drawnIn} too. */
    public static Path write(Worksheet w, Path file, List<Replay.Step> steps, List<Mismatch> differences, List<Path> drawnIn, Path out)
            throws IOException {
        String clash = clash(file, out);
        if (clash != null) throw new IOException(clash);
        WorksheetFiles.saveText(render(w, file, steps, differences, drawnIn), out, WorksheetFiles.Writer.PLAIN);
        return out;
    }

    /**
     * Why {@code target} must not receive the report of {@code worksheet} (null when it may): it is
     * the worksheet's own file, or a worksheet file ({@code .atw}); a report is written only to an
     * {@code .html} or {@code .htm} file.
     */
    public static String clash(Path worksheet, Path target) {
        String name = target.getFileName() == null ? "" : target.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        if (worksheet != null) {
            boolean same = worksheet.toAbsolutePath().normalize().equals(target.toAbsolutePath().normalize());
            try {
                same |= Files.exists(target) && Files.isSameFile(worksheet, target);
            } catch (IOException ignored) {
                // not the same readable file
            }
            if (same) return "the report would replace the worksheet " + worksheet + " itself; name an .html file";
        }
        if (!(name.endsWith(".html") || name.endsWith(".htm"))) {
            return "a report is an .html file, got " + target + (name.endsWith(".atw") ? " (a worksheet name: it is never overwritten by a report)" : "");
        }
        return null;
    }

    /** The worksheet's entries with fresh results in place of the recorded ones, when there are any. */
    static List<Block.Entry> freshEntries(Worksheet w, Path file, List<Replay.Step> steps) {
        List<Block.Entry> recorded = w.entries();
        if (steps == null) return recorded;
        List<Block.Entry> out = new ArrayList<>();
        int k = 0;
        for (Replay.Step s : steps) {
            if (!s.isIn(file) || s.entry().source().startsWith("#use ")) continue;
            if (k >= recorded.size()) break;
            out.add(recorded.get(k++).withRecord(s.result().records(), s.result().figures()));
        }
        while (k < recorded.size()) out.add(recorded.get(k++));
        return out;
    }

    /** Per entry of the worksheet, the outcome of its fresh run, or null when it did not run now. */
    static List<org.ampturn.session.Outcome> freshOutcomes(Worksheet w, Path file, List<Replay.Step> steps) {
        List<org.ampturn.session.Outcome> out = new ArrayList<>();
        if (steps != null) {
            for (Replay.Step s : steps) {
                if (s.isIn(file) && !s.entry().source().startsWith("#use ")) out.add(s.result().outcome());
            }
        }
        int n = w.entries().size();
        while (out.size() < n) out.add(null);
        while (out.size() > n) out.remove(out.size() - 1);
        return out;
    }

    /** Per entry of the worksheet, the objects behind its fresh results (empty when it did not run now). */
    static List<List<Object>> freshValues(Worksheet w, Path file, List<Replay.Step> steps) {
        List<List<Object>> out = new ArrayList<>();
        if (steps != null) {
            for (Replay.Step s : steps) {
                if (s.isIn(file) && !s.entry().source().startsWith("#use ")) out.add(s.result().outcome().values());
            }
        }
        int n = w.entries().size();
        while (out.size() < n) out.add(List.of());
        while (out.size() > n) out.remove(out.size() - 1);
        return out;
    }

    /**
     * The summary at the top: the inputs (the worksheet's named values) and the key results (the
     * values its expressions gave), first line of each, at most a dozen of each.
     */
    private static String summary(Worksheet w, List<Block.Entry> entries) {
        List<String> inputs = new ArrayList<>(), results = new ArrayList<>();
        for (Block.Entry e : entries) {
            if (e.results().isEmpty()) continue;
            String r = e.results().get(0);
            if (r.startsWith("! ") || r.startsWith("| ") || r.startsWith("defined ") || r.startsWith("redefined ") || r.startsWith("imported ")) continue;
            if (r.matches("^[\\p{L}_$][\\p{L}\\p{N}_$]* = .*")) {
                if (inputs.size() < 12) inputs.add(r);
            } else if (results.size() < 12) {
                String src = e.source().lines().findFirst().orElse("");
                results.add(src + "  =  " + r);
            }
        }
        if (inputs.isEmpty() && results.isEmpty()) return "";
        StringBuilder h = new StringBuilder("<section class=\"summary\" id=\"summary\">\n<h2>Summary</h2>\n");
        if (!inputs.isEmpty()) {
            h.append("<h3>Inputs</h3>\n<ul>\n");
            for (String i : inputs) h.append("<li><code>").append(esc(i)).append("</code></li>\n");
            h.append("</ul>\n");
        }
        if (!results.isEmpty()) {
            h.append("<h3>Results</h3>\n<ul>\n");
            for (String r : results) h.append("<li><code>").append(esc(r)).append("</code></li>\n");
            h.append("</ul>\n");
        }
        return h.append("</section>\n").toString();
    }

    /**
     * Per entry of the worksheet, whether it failed: from the fresh run's typed outcome, or for a
     * report of the records alone, from the record's error mark ({@code //= ! ...}).
     */
    static List<Boolean> failedEntries(Worksheet w, Path file, List<Replay.Step> steps) {
        List<Boolean> out = new ArrayList<>();
        if (steps != null) {
            for (Replay.Step s : steps) {
                if (s.isIn(file) && !s.entry().source().startsWith("#use ")) out.add(s.result().failed());
            }
        }
        List<Block.Entry> recorded = w.entries();
        for (int k = out.size(); k < recorded.size(); k++) out.add(recorded.get(k).results().stream().anyMatch(r -> r.startsWith("! ")));
        while (out.size() > recorded.size()) out.remove(out.size() - 1);
        return out;
    }

    private static void flush(StringBuilder h, StringBuilder para) {
        if (para.length() == 0) return;
        h.append("<p class=\"note\">").append(esc(para.toString())).append("</p>\n");
        para.setLength(0);
    }

    /**
     * A chart embedded as an image, never as markup: an SVG goes in as a {@code data:} image, where a
     * browser runs none of its scripts or event handlers and fetches nothing. Only a file inside
     * one of {@code allowed} (the worksheet's figures folder, or the folder the fresh run drew in)
     * is embedded; a path that leads elsewhere ({@code ../}, an absolute path, a link) is named and
     * left out.
     */
    private static String figure(Path base, String name, List<Path> allowed) {
        Path f = base.resolve(name).normalize();
        String shownName = f.startsWith(base) ? base.relativize(f).toString() : name;
        String lower = shownName.toLowerCase(java.util.Locale.ROOT);
        String cap = "<figcaption>" + esc(shownName) + "</figcaption>";
        if (!Files.exists(f)) return "<p class=\"missing\">Figure " + esc(shownName) + " was not found next to the worksheet.</p>\n";
        if (!inside(f, allowed)) {
            return "<p class=\"missing\">Figure " + esc(shownName) + " is outside the worksheet's figures folder, so it is not embedded.</p>\n";
        }
        try {
            if (lower.endsWith(".svg")) {
                String svg = scalable(Files.readString(f, StandardCharsets.UTF_8));
                return "<figure class=\"chart\"><img alt=\"" + esc(shownName) + "\" src=\"data:image/svg+xml;base64,"
                        + Base64.getEncoder().encodeToString(svg.getBytes(StandardCharsets.UTF_8)) + "\">" + cap + "</figure>\n";
            }
            if (lower.endsWith(".png") || lower.endsWith(".jpg") || lower.endsWith(".jpeg")) {
                String type = lower.endsWith(".png") ? "image/png" : "image/jpeg";
                return "<figure class=\"chart\"><img alt=\"" + esc(shownName) + "\" src=\"data:" + type + ";base64,"
                        + Base64.getEncoder().encodeToString(Files.readAllBytes(f)) + "\">" + cap + "</figure>\n";
            }
            return "<p class=\"missing\">Figure " + esc(shownName) + " is not SVG or PNG, so it is not embedded.</p>\n";
        } catch (IOException e) {
            return "<p class=\"missing\">Figure " + esc(shownName) + " could not be read, so it is not embedded.</p>\n";
        }
    }

    /** True when the real location of {@code f} (links followed) lies in one of the folders. */
    private static boolean inside(Path f, List<Path> folders) {
        try {
            Path real = f.toRealPath();
            for (Path d : folders) {
                if (d != null && Files.isDirectory(d) && real.startsWith(d.toRealPath())) return true;
            }
        } catch (IOException e) {
            return false;
        }
        return false;
    }

    private static final java.util.regex.Pattern SVG_TAG = java.util.regex.Pattern.compile("<svg\\b[^>]*>");
    private static final java.util.regex.Pattern SIZE = java.util.regex.Pattern.compile("\\s(width|height)\\s*=\\s*(['\"])([0-9.]+)(?:px)?\\2");

    /**
     * An SVG that scales to the page: a drawing with a fixed width and height but no viewBox
     * (as chart libraries write it) would be cropped when shrunk, so it gets a viewBox of that size
     * and a width of 100%.
     */
    static String scalable(String svg) {
        java.util.regex.Matcher tag = SVG_TAG.matcher(svg);
        if (!tag.find() || tag.group().contains("viewBox")) return svg;
        String t = tag.group();
        java.util.regex.Matcher m = SIZE.matcher(t);
        String w = null, h = null;
        while (m.find()) {
            if (m.group(1).equals("width")) w = m.group(3);
            else h = m.group(3);
        }
        if (w == null || h == null) return svg;
        String fixed = SIZE.matcher(t).replaceAll("");
        fixed = fixed.substring(0, fixed.length() - 1).replaceFirst("/$", "") + " viewBox=\"0 0 " + w + " " + h + "\" width=\"100%\""
                + (t.endsWith("/>") ? "/>" : ">");
        return svg.substring(0, tag.start()) + fixed + svg.substring(tag.end());
    }

    static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<': b.append("&lt;"); break;
                case '>': b.append("&gt;"); break;
                case '&': b.append("&amp;"); break;
                case '"': b.append("&quot;"); break;
                default: b.append(c);
            }
        }
        return b.toString();
    }

    private static final String CSS = String.join("\n",
            ":root { --ink: #1d2329; --muted: #5a6672; --rule: #d5dbe1; --code: #f4f6f8; --warn: #8a4b00; --warnbg: #fff6e5; }",
            "* { box-sizing: border-box; }",
            "body { font: 15px/1.5 Georgia, 'Times New Roman', serif; color: var(--ink); max-width: 52rem; margin: 2rem auto; padding: 0 1.2rem; }",
            "h1 { font: 600 1.8rem/1.2 system-ui, sans-serif; margin: 0 0 .4rem; }",
            "h2 { font: 600 1.15rem system-ui, sans-serif; margin: 1.4rem 0 .5rem; }",
            "h3 { font: 600 1rem system-ui, sans-serif; margin: 0 0 .3rem; color: var(--warn); }",
            "header { border-bottom: 2px solid var(--ink); padding-bottom: .6rem; margin-bottom: 1rem; }",
            "dl.meta { display: grid; grid-template-columns: max-content 1fr; gap: .1rem 1rem; margin: 0; font: .85rem system-ui, sans-serif; color: var(--muted); }",
            "dl.meta dt { font-weight: 600; } dl.meta dd { margin: 0; }",
            ".caution { background: var(--warnbg); border-left: 4px solid var(--warn); padding: .5rem .8rem; margin: .5rem 0; break-inside: avoid; }",
            ".caution p { margin: .2rem 0; } .where { font: .8rem system-ui, sans-serif; color: var(--muted); }",
            "dd.ok { color: #1f6b2a; font-weight: 600; } dd.notok { color: #a00000; font-weight: 600; }",
            ".summary ul { margin: .2rem 0 .6rem; padding-left: 1.2rem; } .summary h3 { color: var(--ink); }",
            ".differs { color: #a00000; font: .85rem system-ui, sans-serif; margin: .1rem 0; }",
            ".defer { font-style: italic; } .failed { color: #a00000; font-weight: 600; }",
            ".entry.notrun pre.src { border-color: #d8a0a0; } .failed-note { font: .8rem system-ui, sans-serif; color: #a00000; margin: .1rem 0; }",
            "p.note { margin: 1rem 0 .4rem; }",
            ".entry { display: grid; grid-template-columns: 2.6rem 1fr; column-gap: .4rem; margin: .3rem 0; break-inside: avoid; }",
            ".entry > * { grid-column: 2; } .entry > .line { grid-column: 1; grid-row: 1; text-align: right; font: .75rem/1.9 ui-monospace, monospace; color: var(--muted); }",
            "pre { margin: 0; white-space: pre-wrap; overflow-wrap: anywhere; font: .85rem/1.45 ui-monospace, 'DejaVu Sans Mono', monospace; }",
            "pre.src { background: var(--code); border: 1px solid var(--rule); border-radius: 3px; padding: .35rem .6rem; }",
            "pre.out { padding: .2rem .6rem .3rem 1.2rem; color: #0b4f6c; } .err { color: #a00000; }",
            "figure.chart { margin: .5rem 0 .8rem; break-inside: avoid; } figure.chart svg, figure.chart img { max-width: 100%; height: auto; display: block; }",
            "figcaption { font: .75rem system-ui, sans-serif; color: var(--muted); }",
            ".missing { color: var(--warn); font: .85rem system-ui, sans-serif; } .use { font: .9rem system-ui, sans-serif; color: var(--muted); }",
            "footer { border-top: 1px solid var(--rule); margin-top: 2rem; padding-top: .5rem; font: .8rem system-ui, sans-serif; color: var(--muted); }",
            "@page { size: A4; margin: 16mm 15mm 18mm; }",
            "@media print { body { font-size: 10.5pt; max-width: none; margin: 0; padding: 0; } pre { font-size: 8.5pt; }",
            "  .caution { -webkit-print-color-adjust: exact; print-color-adjust: exact; } a { color: inherit; } h2 { break-after: avoid; } }",
            "");
}
