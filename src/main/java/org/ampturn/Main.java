package org.ampturn;

import java.io.PrintStream;
import java.util.Arrays;
import java.util.List;
import java.util.OptionalInt;
import org.ampturn.console.BatchRun;
import org.ampturn.worksheet.SessionExtension;
import org.ampturn.worksheet.SessionExtensions;

/**
 * The command line (DESIGN.md): {@code ampturn [FILE.atw]}, {@code ampturn run [--trust] FILE|-},
 * {@code ampturn verify}, {@code ampturn export}, {@code --version}, {@code --help}.
 * A {@link SessionExtension} may take over a verb; {@code run} falls back to {@link BatchRun}.
 */
public final class Main {
    private Main() {}

    static final String HELP = String.join("\n",
            "ampturn " + Ampturn.version() + ": a scripting console for coil design",
            "",
            "usage:",
            "  ampturn                               interactive console, new worksheet",
            "  ampturn FILE.atw                      interactive console on that worksheet",
            "  ampturn run [--trust] FILE.atw|-      run without a terminal, print each entry and its result;",
            "                                        exit 1 when an entry fails (- reads standard input)",
            "  ampturn verify [--trust] FILE.atw...  replay and compare recorded results; exit 1 on a mismatch",
            "  ampturn export [--trust] FILE.atw --html OUT.html",
            "                                        write the worksheet as a report",
            "  ampturn --version | --help",
            "",
            "In the console, entries are Java; commands begin with # (type #help).");

    public static void main(String[] args) {
        int rc = run(Arrays.asList(args), System.out, System.err);
        if (rc >= 0) {
            System.out.flush();
            System.exit(rc);
        }
    }

    /**
     * Runs the command line. Returns the exit code, or -1 after the interactive console (which
     * has already ended its own way).
     */
    static int run(List<String> args, PrintStream out, PrintStream err) {
        if (args.isEmpty()) return Launch.console(null);
        String verb = args.get(0);
        List<String> rest = args.subList(1, args.size());
        switch (verb) {
            case "--version":
            case "-V":
                out.println("ampturn " + Ampturn.version() + " (Java " + Runtime.version() + ")");
                return 0;
            case "--help":
            case "-h":
            case "help":
                out.println(HELP);
                return 0;
            case "run":
            case "verify":
            case "export": {
                org.ampturn.worksheet.Session.prestart();
                OptionalInt handled = byExtension(verb, rest, out, err);
                if (handled.isPresent()) return handled.getAsInt();
                if (verb.equals("run")) return batch(rest, out, err);
                err.println("ampturn " + verb + ": not available yet in this build");
                return 2;
            }
            default:
                if (verb.startsWith("-")) {
                    err.println("ampturn: unknown option " + verb + " (try ampturn --help)");
                    return 2;
                }
                if (args.size() > 1) {
                    err.println("ampturn: one worksheet at a time (try ampturn --help)");
                    return 2;
                }
                return Launch.console(verb);
        }
    }

    private static OptionalInt byExtension(String verb, List<String> rest, PrintStream out, PrintStream err) {
        for (SessionExtension e : SessionExtensions.all()) {
            OptionalInt rc = e.verb(verb, rest, out, err);
            if (rc.isPresent()) return rc;
        }
        return OptionalInt.empty();
    }

    private static int batch(List<String> rest, PrintStream out, PrintStream err) {
        String file = null;
        for (String a : rest) {
            if (a.equals("--trust")) continue; // entries run as given; trust is settled by the worksheet layer
            if (a.startsWith("-") && !a.equals("-")) {
                err.println("ampturn run: unknown option " + a);
                return 2;
            }
            if (file != null) {
                err.println("ampturn run: one file at a time");
                return 2;
            }
            file = a;
        }
        if (file == null) {
            err.println("ampturn run: name a file, or - for standard input");
            return 2;
        }
        return BatchRun.run(file, System.in, out, err);
    }

    /** Keeps the console classes (and JLine) out of the batch path until they are needed. */
    private static final class Launch {
        static int console(String file) {
            return org.ampturn.console.Console.main(file);
        }
    }
}
