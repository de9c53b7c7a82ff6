package org.ampturn.study;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Path;
import java.util.List;
import org.ampturn.worksheet.Mismatch;
import org.ampturn.worksheet.Replay;
import org.ampturn.worksheet.ShellEvaluator;
import org.ampturn.worksheet.Verifier;
import org.ampturn.worksheet.Worksheet;
import org.ampturn.worksheet.WorksheetFiles;
import org.junit.jupiter.api.Test;

/**
 * The demo worksheet of the studies (a sweep, a solve, an optimisation, corners and a seeded Monte
 * Carlo run) replays in the console's session and gives the results it recorded, to the digits
 * shown: tables, margins and percentiles are reproducible.
 */
class StudyWorksheetTest {
    @Test
    void theHatchStudiesVerify() throws Exception {
        Path f = Path.of(StudyWorksheetTest.class.getResource("hatch-studies.atw").toURI());
        try (ShellEvaluator shell = ShellEvaluator.start()) {
            Worksheet w = WorksheetFiles.read(f, shell.completeness());
            assertEquals(7, w.entries().size());
            List<Mismatch> m = Verifier.compare(f, Replay.run(w, f, shell, p -> WorksheetFiles.read(p, shell.completeness()), s -> {}));
            assertEquals(List.of(), m);
        }
    }
}
