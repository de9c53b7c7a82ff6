package org.ampturn.worksheet;

import java.io.Closeable;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.ampturn.chart.Figures;

/**
 * The worksheet being worked on, and its only owner: the entries typed or opened with their typed
 * results, the file it belongs to, whether there is unsaved work, the journal that protects that
 * work, and the trust rules for opening files. The console runs every entry through
 * {@link #enter} and every {@code #} worksheet command through the other methods; nothing else
 * keeps a copy of this state. Not thread-safe: one console thread uses it, except
 * {@link #stop()}.
 */
public final class Workspace implements Closeable {
    /** Asks the user a yes/no question; the console reads the answer, batch mode says no. */
    @FunctionalInterface
    public interface Confirm {
        boolean ask(String question);

        /**
         * Shows the review of a worksheet that is not trusted ({@link TrustReview#lines}), then asks
         * {@code question}. The console prints the review; without a terminal only the question counts.
         */
        default boolean review(List<String> review, String question) {
            return ask(question);
        }

        Confirm NO = q -> false;
    }

    /**
     * True when {@code bytes} (read from {@code f}) may run: trusted, or reviewed and confirmed
     * (which trusts them). The review shows these bytes, the ones that will run.
     */
    private boolean approved(Path f, byte[] bytes, String question, Confirm confirm) throws IOException {
        if (trust.isTrusted(f, bytes)) return true;
        String text = WorksheetFiles.decode(bytes, f.toString());
        if (!confirm.review(TrustReview.lines(f, text, trust.earlier(f)), question)) return false;
        trust.trust(f, bytes);
        return true;
    }

    private final Evaluator evaluator;
    private final Supplier<Evaluator> fresh;
    private final TrustStore trust;
    private final Journal journal;
    private final Path journalDir;
    private Worksheet sheet = Worksheet.titled("");
    private Path file;
    /** SHA-256 of the file as this worksheet last read or wrote it, or null when it has not. */
    private String diskHash;
    private boolean dirty;
    private int replaying;
    private int replayDone;
    private final List<String> journalTrouble = new ArrayList<>();
    /** Failed records whose entry left something in the session (a stopped study's partial result). */
    private final java.util.Set<Block> keptFailed = java.util.Collections.newSetFromMap(new java.util.IdentityHashMap<>());

    private Workspace(Evaluator evaluator, Supplier<Evaluator> fresh, TrustStore trust, Journal journal, Path journalDir) {
        this.evaluator = evaluator;
        this.fresh = fresh;
        this.trust = trust;
        this.journal = journal;
        this.journalDir = journalDir;
    }

    /**
     * A workspace on a new worksheet. {@code journalDir} null means no journal (batch use).
     * {@code fresh} makes new evaluators for {@code #verify FILE}.
     */
    public static Workspace of(Evaluator evaluator, Supplier<Evaluator> fresh, TrustStore trust, Path journalDir) throws IOException {
        Journal j = journalDir == null ? null : Journal.start(journalDir);
        Workspace w = new Workspace(evaluator, fresh, trust, j, journalDir);
        w.log(j2 -> j2.opened(null));
        return w;
    }

    /** A workspace without a journal (when none can be written). */
    public static Workspace unjournaled(Evaluator evaluator, Supplier<Evaluator> fresh, TrustStore trust) {
        return new Workspace(evaluator, fresh, trust, null, null);
    }

    /** A workspace with the user's trust store and journal directory ({@link AmpturnHome}). */
    public static Workspace forUser(Evaluator evaluator, Supplier<Evaluator> fresh) throws IOException {
        return of(evaluator, fresh, TrustStore.user(), AmpturnHome.journals());
    }

    public Worksheet worksheet() {
        return sheet;
    }

    /** The file the worksheet was opened from or saved to, or null. */
    public Path file() {
        return file;
    }

    /** Names the file a new worksheet will be saved to ({@code ampturn new.atw} on a file not yet written). */
    public void useFile(Path f) {
        setFile(f);
    }

    /** The worksheet's file changes: its charts now go to the folder beside it. */
    private void setFile(Path f) {
        file = f;
        if (f != null) Figures.useDirectory(WorksheetFiles.figuresFolder(f));
    }

    /** True when there is work that is not in the file. */
    public boolean isDirty() {
        return dirty;
    }

    /** The name for the prompt: the file name without {@code .atw}, or "untitled". */
    public String name() {
        if (file == null) return "untitled";
        String n = file.getFileName().toString();
        return n.endsWith(".atw") ? n.substring(0, n.length() - 4) : n;
    }

    /** The number the next entry will get (1 for the first). */
    public int nextEntryNumber() {
        // while a replay runs, the entry being run; as the batch verbs count, so that a chart
        // gets the same file name in the console, in run, in verify and in export
        return replaying > 0 ? replayDone + 1 : sheet.entries().size() + 1;
    }

    /** The evaluator's completeness analysis, for gathering typed lines into an entry. */
    public Completeness completeness() {
        return evaluator.completeness();
    }

    public Journal journal() {
        return journal;
    }

    /**
     * Runs a typed entry, adds it with its results to the worksheet and writes it to the journal,
     * forced to disk, before returning; so once the caller shows the result, a crash loses nothing.
     * An entry that failed or was stopped is added as a {@link Block.Failed} record: shown and
     * saved, never run again. It leaves nothing in the session (as on a replay, where it does not
     * run), except a stopped study's partial result, which stays usable until the next replay.
     */
    public Evaluation enter(String source) {
        Evaluation e = evaluator.eval(source);
        if (e.failed() || e.interrupted()) {
            boolean inSession = e.outcome().kept();
            if (inSession && e.failed()) {
                evaluator.undoLast();
                inSession = false;
            }
            Block.Failed f = new Block.Failed(source.strip().isEmpty() ? "?" : source, e.records());
            sheet = sheet.with(f);
            if (inSession) keptFailed.add(f);
            dirty = true;
            log(j -> j.failed(f));
            return e;
        }
        if (!e.outcome().kept()) return e;
        Block.Entry entry = new Block.Entry(source, e.records(), relativeFigures(e.figures()));
        sheet = sheet.with(entry);
        dirty = true;
        log(j -> j.entry(entry));
        return e;
    }

    /** Stops the entry that is running (Ctrl-C); a replay in progress stops after it. Safe from any thread. */
    public void stop() {
        evaluator.stop();
    }

    /** How many entries the worksheet holds. */
    public int entryCount() {
        return sheet.entries().size();
    }

    private List<String> relativeFigures(List<String> figures) {
        Path base = file == null ? null : file.toAbsolutePath().getParent();
        List<String> out = new ArrayList<>();
        for (String f : figures) {
            Path p = Path.of(f);
            out.add(base != null && p.isAbsolute() && p.startsWith(base) ? base.relativize(p).toString() : f);
        }
        return out;
    }

    /** Adds a prose note. */
    public void note(String text) {
        List<Block> b = sheet.blocks();
        if (!b.isEmpty() && b.get(b.size() - 1) instanceof Block.Entry) sheet = sheet.with(new Block.Blank());
        for (String line : text.split("\n")) {
            Block.Note n = new Block.Note(line.strip());
            sheet = sheet.with(n);
            log(j -> j.note(n.text()));
        }
        dirty = true;
    }

    /**
     * Takes the last entry, failed or not, out of the worksheet and (when it is there) the session;
     * returns its source, or null when there is none.
     */
    public String undo() {
        int i = sheet.lastEntryIndex();
        if (i < 0) return null;
        Block last = sheet.blocks().get(i);
        if (last instanceof Block.Entry || keptFailed.remove(last)) evaluator.undoLast();
        sheet = sheet.withoutLastEntry();
        dirty = true;
        log(Journal::undo);
        return last instanceof Block.Entry ? ((Block.Entry) last).source() : ((Block.Failed) last).source();
    }

    /** Messages about journal writes that failed (the console shows each once), then cleared. */
    public List<String> takeJournalTrouble() {
        List<String> out = List.copyOf(journalTrouble);
        journalTrouble.clear();
        return out;
    }

    /**
     * Saves to {@code target} (or the current file when null): atomic, and the saved content is
     * trusted on this machine. Returns the file written.
     */
    public Path save(Path target) throws IOException {
        Path t = target != null ? target : file;
        if (t == null) throw new IOException("this worksheet has no file yet: give a name, e.g. #save coil.atw");
        if (!t.getFileName().toString().contains(".")) t = t.resolveSibling(t.getFileName() + ".atw");
        refuseIfChangedOnDisk(t);
        Worksheet w = sheet.withHeader("tool", "ampturn " + org.ampturn.Ampturn.version());
        if (w.title().isEmpty()) {
            String n = t.getFileName().toString().replaceFirst("\\.atw$", "");
            w = Worksheet.of(titleFirst(n, w), w.blocks());
        }
        w = w.withBlocks(figuresBeside(w.blocks(), t));
        byte[] bytes = WorksheetFormat.print(w).getBytes(java.nio.charset.StandardCharsets.UTF_8);
        String hash = TrustStore.hash(bytes);
        Path saving = t;
        // journal first, then trust, then the rename: a kill at any point leaves either the old file
        // with the journal's work, or the new file, trusted, that the journal knows was written
        log(j -> j.saving(saving, hash));
        trust.trust(t, bytes);
        WorksheetFiles.saveText(WorksheetFormat.print(w), t, WorksheetFiles.Writer.PLAIN);
        sheet = w;
        setFile(t);
        diskHash = hash;
        dirty = false;
        log(j -> j.saved(saving));
        return t;
    }

    /**
     * Refuses to save over a file that changed on disk since this worksheet opened or last saved it
     * (another console, an editor), or over an existing file that is not this worksheet's: the work
     * stays unsaved and journalled, and a new name keeps it.
     */
    private void refuseIfChangedOnDisk(Path t) throws IOException {
        if (!Files.exists(t)) return;
        boolean ours = file != null && t.toAbsolutePath().normalize().equals(file.toAbsolutePath().normalize());
        if (!ours) {
            throw new IOException(t + " already exists and is not this worksheet's file; save under a new name, or #open it");
        }
        String now = TrustStore.hash(WorksheetFiles.readBytes(t));
        if (diskHash == null || !now.equals(diskHash)) {
            throw new IOException(t + " changed on disk since this console opened or saved it (another console or an editor wrote it);"
                    + " nothing was written and your work is kept: #save " + suggestion(t) + " saves it beside, or #open the file to see the other version");
        }
    }

    private static String suggestion(Path t) {
        String n = t.getFileName().toString().replaceFirst("\\.atw$", "");
        for (int k = 2; ; k++) {
            Path p = t.resolveSibling(n + "-" + k + ".atw");
            if (!Files.exists(p)) return p.toString();
        }
    }

    /**
     * The blocks with their figures beside {@code t}: a chart file recorded elsewhere (made before
     * the first save, or in another worksheet's folder) is moved (or, when an earlier file still
     * names it, copied) into {@code t}'s figures folder, and every figure path becomes relative to {@code t}.
     */
    private List<Block> figuresBeside(List<Block> blocks, Path t) throws IOException {
        Path folder = WorksheetFiles.figuresFolder(t);
        Path newBase = t.toAbsolutePath().getParent();
        Path oldBase = file == null ? Path.of("").toAbsolutePath() : file.toAbsolutePath().getParent();
        List<Block> out = new ArrayList<>();
        for (Block b : blocks) {
            if (!(b instanceof Block.Entry) || ((Block.Entry) b).figures().isEmpty()) {
                out.add(b);
                continue;
            }
            Block.Entry e = (Block.Entry) b;
            List<String> figs = new ArrayList<>();
            for (String f : e.figures()) {
                Path p = oldBase.resolve(f).normalize();
                if (Files.isRegularFile(p) && !p.startsWith(folder)) {
                    Files.createDirectories(folder);
                    Path dest = folder.resolve(p.getFileName().toString());
                    for (int k = 2; Files.exists(dest); k++) dest = folder.resolve(k + "-" + p.getFileName());
                    if (file == null) Files.move(p, dest);
                    else Files.copy(p, dest);
                    p = dest;
                }
                figs.add(p.startsWith(newBase) ? newBase.relativize(p).toString().replace(java.io.File.separatorChar, '/') : f);
            }
            out.add(e.withRecord(e.results(), figs));
        }
        return out;
    }    private static java.util.Map<String, String> titleFirst(String title, Worksheet w) {
        java.util.Map<String, String> h = new java.util.LinkedHashMap<>();
        h.put("title", title);
        h.putAll(w.header());
        return h;
    }

    /** What {@link #open} did. */
    public record Opened(Path file, Worksheet worksheet, boolean ran, List<Replay.Step> steps, List<Mismatch> differences) {}

    /**
     * Opens a worksheet. When it is trusted (or the user confirms, which trusts it) the session is
     * cleared and its entries run, each step passed to {@code onStep}; otherwise it is loaded for
     * reading only and not run. Fails with a clear message for a file that is not a worksheet.
     */
    public Opened open(Path f, Confirm confirm, Consumer<Replay.Step> onStep) throws IOException, WorksheetFormatException {
        byte[] bytes = WorksheetFiles.readBytes(f); // hashed and run: the same bytes
        Worksheet w = WorksheetFiles.parse(f, bytes, completeness());
        boolean ok = approved(f, bytes, f + " was not saved or trusted on this machine. A worksheet is code: run it?", confirm);
        if (!ok) return new Opened(f, w, false, List.of(), List.of());
        sheet = w;
        setFile(f);
        diskHash = TrustStore.hash(bytes);
        dirty = false;
        log(j -> j.opened(f));
        List<Replay.Step> steps = replay(w, f, confirm, onStep);
        return new Opened(f, w, true, steps, Verifier.compare(f, steps));
    }

    /** Loads {@code #use}d worksheets, refusing untrusted ones unless the user confirms. */
    public Replay.Loader loader(Confirm confirm) {
        return p -> {
            byte[] bytes = WorksheetFiles.readBytes(p);
            Worksheet w = WorksheetFiles.parse(p, bytes, completeness());
            if (!approved(p, bytes, p + " (used by this worksheet) is not trusted on this machine: run it?", confirm)) {
                throw new IOException(p + " is not trusted on this machine, so it was not run; #trust " + p + " to allow it");
            }
            return w;
        };
    }

    /** Clears the session and runs every entry again; the worksheet then records the fresh results. */
    public List<Replay.Step> replay(Confirm confirm, Consumer<Replay.Step> onStep) {
        List<Replay.Step> steps = replay(sheet, file, confirm, onStep);
        List<Block> blocks = new ArrayList<>(sheet.blocks());
        int k = 0;
        for (Replay.Step s : steps) {
            if (!s.isIn(file) || s.entry().source().startsWith("#use ")) continue;
            while (k < blocks.size() && !(blocks.get(k) instanceof Block.Entry)) k++;
            if (k >= blocks.size()) break;
            Block.Entry old = (Block.Entry) blocks.get(k);
            Block.Entry now = old.withRecord(s.result().records(), relativeFigures(s.result().figures()));
            if (!now.equals(old)) dirty = true;
            blocks.set(k++, now);
        }
        sheet = sheet.withBlocks(blocks);
        return steps;
    }

    /**
     * Verifies the current worksheet (file null: clears the session and replays it) or another
     * file (in a fresh evaluator, after its trust is settled), without changing any record.
     */
    public List<Mismatch> verify(Path other, Confirm confirm, Consumer<Replay.Step> onStep) throws IOException, WorksheetFormatException {
        if (other == null) return Verifier.compare(file, replay(sheet, file, confirm, onStep));
        byte[] bytes = WorksheetFiles.readBytes(other);
        Worksheet w = WorksheetFiles.parse(other, bytes, completeness());
        if (!approved(other, bytes, other + " was not saved or trusted on this machine. A worksheet is code: run it?", confirm)) {
            throw new IOException(other + " is not trusted on this machine, so it was not run; #trust " + other + " to allow it");
        }
        try (Evaluator ev = fresh.get()) {
            return Verifier.compare(other, Replay.run(w, other, ev, loader(confirm), onStep));
        }
    }

    /** Marks a file's current content as safe to run on this machine; returns its SHA-256. */
    public String trust(Path f) throws IOException {
        byte[] bytes = WorksheetFiles.readBytes(f);
        trust.trust(f, bytes);
        return TrustStore.hash(bytes);
    }

    public TrustStore trustStore() {
        return trust;
    }

    /** The charts recorded in the worksheet, as {@code line: path}. */
    public List<String> figures() {
        List<String> out = new ArrayList<>();
        for (int k = 0; k < sheet.blocks().size(); k++) {
            if (sheet.blocks().get(k) instanceof Block.Entry) {
                for (String f : ((Block.Entry) sheet.blocks().get(k)).figures()) out.add("line " + sheet.lineOf(k) + ": " + f);
            }
        }
        return out;
    }

    /** Unsaved work left by sessions that ended without saving, newest first. */
    public List<Recovery> recoverable() throws IOException {
        return journalDir == null ? List.of() : Journal.unfinished(journalDir);
    }

    /**
     * Brings back the work of an ended session: its worksheet file as saved, plus the entries and
     * notes made after that, all run again. Refused while this worksheet has unsaved work.
     */
    public List<Replay.Step> recover(Recovery r, Confirm confirm, Consumer<Replay.Step> onStep) throws IOException, WorksheetFormatException {
        if (dirty) throw new IOException("this worksheet has unsaved work; #save it first, then #recover");
        Worksheet base = Worksheet.titled("");
        if (r.worksheet() != null && Files.exists(r.worksheet())) {
            byte[] bytes = WorksheetFiles.readBytes(r.worksheet());
            if (!approved(r.worksheet(), bytes, r.worksheet() + " changed since that session and is not trusted: run it?", confirm)) {
                throw new IOException(r.worksheet() + " is not trusted on this machine; #trust it, then #recover");
            }
            base = WorksheetFiles.parse(r.worksheet(), bytes, completeness());
            diskHash = TrustStore.hash(bytes);
        }
        Worksheet w = r.applyTo(base);
        sheet = w;
        setFile(r.worksheet());
        dirty = true;
        log(j -> j.opened(r.worksheet()));
        for (int k = 0; k < r.undosPastBase(); k++) log(Journal::undo);
        for (Block b : r.blocks()) {
            if (b instanceof Block.Entry) log(j -> j.entry((Block.Entry) b));
            else if (b instanceof Block.Failed) log(j -> j.failed((Block.Failed) b));
            else if (b instanceof Block.Note) log(j -> j.note(((Block.Note) b).text()));
            else if (b instanceof Block.Use) log(j -> j.use(((Block.Use) b).path()));
        }
        r.discard();
        return replay(w, file, confirm, onStep);
    }

    /** Clears the session and runs {@code w}'s entries, without recording them again. */
    private List<Replay.Step> replay(Worksheet w, Path f, Confirm confirm, Consumer<Replay.Step> onStep) {
        if (replaying++ == 0) replayDone = 0;
        try {
            evaluator.clear();
            keptFailed.clear();
            return Replay.run(w, f, evaluator, loader(confirm), st -> {
                replayDone++;
                onStep.accept(st);
            });
        } finally {
            replaying--;
        }
    }

    /**
     * {@code #use FILE}: runs another worksheet's entries in this session (after its trust is
     * settled) and adds a {@code #use} line, relative to this worksheet's file, so a replay runs it too.
     */
    public List<Replay.Step> use(Path other, Confirm confirm, Consumer<Replay.Step> onStep) throws Exception {
        Path base = file == null ? Path.of("").toAbsolutePath() : file.toAbsolutePath().getParent();
        Path abs = other.isAbsolute() ? other : base.resolve(other);
        Worksheet w = loader(confirm).load(abs.normalize());
        String rel;
        try {
            rel = base.relativize(abs.normalize()).toString().replace(java.io.File.separatorChar, '/');
        } catch (IllegalArgumentException e) {
            rel = abs.toString();
        }
        List<Replay.Step> steps;
        replaying++;
        try {
            steps = Replay.run(w, abs.normalize(), evaluator, loader(confirm), onStep);
        } finally {
            replaying--;
        }
        Block.Use u = new Block.Use(rel);
        sheet = sheet.with(u);
        dirty = true;
        log(j -> j.use(u.path()));
        return steps;
    }

    /** Ends the session cleanly: the journal is deleted (call after saving, or when the user chose to drop the work). */
    @Override
    public void close() throws IOException {
        if (journal != null) journal.close();
    }

    private interface JournalWrite {
        void write(Journal j) throws IOException;
    }

    private boolean log(JournalWrite w) {
        if (journal == null) return true;
        try {
            w.write(journal);
            return true;
        } catch (IOException e) {
            journalTrouble.add("the journal " + journal.file() + " could not be written (" + e.getMessage()
                    + "): save soon, a crash now would lose this entry");
            return false;
        }
    }
}
