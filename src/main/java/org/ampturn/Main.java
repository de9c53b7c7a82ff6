package org.ampturn;

/** The command line; see DESIGN.md. The console issue fills in the verbs. */
public final class Main {
    private Main() {}

    public static void main(String[] args) {
        if (args.length == 1 && args[0].equals("--version")) {
            System.out.println("ampturn " + Ampturn.version());
            return;
        }
        System.err.println("ampturn: the console is not built yet");
        System.exit(2);
    }
}
