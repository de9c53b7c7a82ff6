package org.ampturn.console;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * The help topics: one Markdown page per topic in {@code lib-docs/}. The folder is taken from the
 * system property {@code ampturn.docs}, else {@code lib-docs} beside the project the jar was built
 * in (the launcher's case), else {@code lib-docs} in the working directory.
 */
final class HelpPages {
    private final Path dir;

    HelpPages(Path dir) {
        this.dir = dir;
    }

    static HelpPages find() {
        String prop = System.getProperty("ampturn.docs");
        if (prop != null) return new HelpPages(Path.of(prop));
        try {
            var cs = HelpPages.class.getProtectionDomain().getCodeSource();
            if (cs != null) {
                Path where = Path.of(cs.getLocation().toURI()); // target/ampturn.jar or target/classes
                Path candidate = where.getParent() == null ? null : where.getParent().getParent();
                if (candidate != null && Files.isDirectory(candidate.resolve("lib-docs"))) return new HelpPages(candidate.resolve("lib-docs"));
            }
        } catch (URISyntaxException | RuntimeException ignored) {
            // fall through to the working directory
        }
        return new HelpPages(Path.of("lib-docs"));
    }

    /** The topic names, sorted: the page file names without {@code .md}. */
    List<String> topics() {
        if (!Files.isDirectory(dir)) return List.of();
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".md"))
                    .map(n -> n.substring(0, n.length() - 3)).sorted().collect(Collectors.toList());
        } catch (IOException e) {
            return List.of();
        }
    }

    /** The page of a topic (exact name first, then the only topic that starts with the text). */
    Optional<List<String>> page(String topic) {
        String t = topic.toLowerCase(Locale.ROOT).strip();
        List<String> all = topics();
        List<String> hits = new ArrayList<>();
        for (String name : all) if (name.toLowerCase(Locale.ROOT).equals(t)) hits = List.of(name);
        if (hits.isEmpty()) for (String name : all) if (name.toLowerCase(Locale.ROOT).startsWith(t)) hits.add(name);
        if (hits.size() != 1) return Optional.empty();
        try {
            return Optional.of(Files.readAllLines(dir.resolve(hits.get(0) + ".md"), StandardCharsets.UTF_8));
        } catch (IOException e) {
            return Optional.empty();
        }
    }
}
