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
            case "export":
                Session.prestart();
                return WorksheetCli.forUser(System.in, out, err).verb(verb, rest);
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

    /** Keeps the console classes (and JLine) out of the batch path until they are needed. */
    private static final class Launch {
        static int console(String file) {
            return org.ampturn.console.Console.main(file);
        }
    }
}
