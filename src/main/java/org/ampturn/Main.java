package org.ampturn;

import java.io.PrintStream;
import java.util.Arrays;
import java.util.List;
import org.ampturn.console.WorksheetCli;
import org.ampturn.session.Session;

/**
 * The command line (DESIGN.md): {@code ampturn [FILE.atw]}, {@code ampturn run [--trust] FILE|-},
 * {@code ampturn verify}, {@code ampturn export} ({@link WorksheetCli}), {@code --version}, {@code --help}.
 */
public final class Main {
    private Main() {}

    static final String HELP = String.join("\n",
            "ampturn " + Ampturn.version() + ": a scripting console for coil design",
            "",
            "usage:",
            "  ampturn                               interactive console, new worksheet",
            "  ampturn FILE.atw                      interactive console on that worksheet",
            "  ampturn run [--trust] FILE.atw|-      run without a terminal, print each entry and its result",
            "                                        (- reads entries from standard input)",
            "  ampturn verify [--trust] FILE.atw...  replay and compare each result with its record",
            "  ampturn export [--trust] FILE.atw --html OUT.html",
            "                                        run, compare with the records, write the report",
            "  ampturn --version | --help",
            "",
            "options of run, verify and export:",
            "  --trust                 run the worksheets named here although this machine has not trusted",
            "                          them (this run only; a worksheet they #use must be trusted or named too)",
            "  --entry-limit DURATION  stop an entry that runs longer (30s, 5m, 1h; default "
                    + WorksheetCli.DEFAULT_LIMIT.toMinutes() + "m) and report it",
            "",
            "exit codes of run, verify and export (with several worksheets, the highest applies):",
            "  " + WorksheetCli.HOLD + "  every entry ran and every result holds",
            "  " + WorksheetCli.DIFFER + "  a result differs from its record",
            "  " + WorksheetCli.USAGE + "  a usage error, or a file that could not be read",
            "  " + WorksheetCli.NOT_TRUSTED + "  not run: the worksheet is not trusted on this machine",
            "  " + WorksheetCli.FAILED + "  an entry failed or ran over its limit",
            "",
            "environment:",
            "  AMPTURN_JAVA_OPTS       extra options for the Java virtual machine (bin/ampturn)",
            "  AMPTURN_CDS=0           start without the class-data archive or cache (bin/ampturn)",
            "  ~/.ampturn/             per-user folder: trusted worksheets, journals of unsaved work, history;",
            "                          -Dampturn.home=DIR (in AMPTURN_JAVA_OPTS) moves it",
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
            case "export":
                Session.prestart();
                return WorksheetCli.forUser(System.in, out, err).verb(verb, rest);
            default:
                if (verb.startsWith("-")) {
                    err.println("ampturn: unknown option " + verb + " (try ampturn --help)");
                    return WorksheetCli.USAGE;
                }
                if (args.size() > 1) {
                    err.println("ampturn: one worksheet at a time, or a verb: run, verify, export (try ampturn --help)");
                    return WorksheetCli.USAGE;
                }
                if (!verb.toLowerCase(java.util.Locale.ROOT).endsWith(".atw") && !java.nio.file.Files.exists(java.nio.file.Path.of(verb))) {
                    String near = nearestVerb(verb);
                    err.println("ampturn: \"" + verb + "\" is neither a verb nor a worksheet" + (near == null ? "" : " (did you mean " + near + "?)")
                            + "; a new worksheet's name ends in .atw (try ampturn --help)");
                    return WorksheetCli.USAGE;
                }
                return Launch.console(verb);
        }
    }

    /** The verb one or two letters away from {@code word} (a typo), or null. */
    static String nearestVerb(String word) {
        String best = null;
        int bestDistance = 3;
        for (String v : List.of("run", "verify", "export", "help")) {
            int d = distance(word.toLowerCase(java.util.Locale.ROOT), v);
            if (d < bestDistance) {
                bestDistance = d;
                best = v;
            }
        }
        return best;
    }

    /** Edit distance with transpositions (optimal string alignment). */
    private static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) d[i][0] = i;
        for (int j = 0; j <= b.length(); j++) d[0][j] = j;
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }

    /** Keeps the console classes (and JLine) out of the batch path until they are needed. */
    private static final class Launch {
        static int console(String file) {
            return org.ampturn.console.Console.main(file);
        }
    }
}
