package org.ampturn.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Which library packages an entry needs imported, and that a session imports them as entries name them. */
class SessionImportsTest {
    private static final SessionImports LIBRARY = SessionImports.of(List.of(
            "coil.Solenoid", "drive.Drive", "drive.Clamp", "units.Quantity", "study.Table", "chart.Table"));

    @Test
    void classNamesInCodeNeedTheirPackagesInOrderOfFirstUse() {
        assertEquals(List.of("import org.ampturn.drive.*;", "import org.ampturn.coil.*;"),
                LIBRARY.neededBy("Drive.dc(V(12)).into(Solenoid.singleLayer(400, mm(30), mm(10))).offAt(ms(20), Clamp.diode())"));
        assertEquals(List.of(), LIBRARY.neededBy("mm(25).times(2)"), "the facade's helpers need no package");
    }

    @Test
    void namesInCommentsStringsAndCharactersDoNotCount() {
        String src = "// Solenoid here\n/* Drive\n Clamp */ var s = \"Quantity \\\" Table\"; char c = 'D';\n"
                + "var t = \"\"\"\n  Solenoid \"\"\" + 1e3;";
        assertEquals(List.of(), LIBRARY.neededBy(src));
        assertEquals(Set.of(), SessionImports.identifiers("1e3 + 0xFF + 2.5e-3"), "letters inside numbers are not names");
    }

    @Test
    void aNameInTwoPackagesImportsBothSoItIsAsAmbiguousAsWithAllImported() {
        assertEquals(List.of("import org.ampturn.chart.*;", "import org.ampturn.study.*;"), LIBRARY.neededBy("Table t = null;"));
    }

    @Test
    void allListsTheFacadeThenUnitsThenTheRest() {
        assertEquals(List.of(SessionImports.FACADE, "import org.ampturn.units.*;", "import org.ampturn.chart.*;",
                "import org.ampturn.coil.*;", "import org.ampturn.drive.*;", "import org.ampturn.study.*;"), LIBRARY.all());
    }

    @Test
    void theShippedLibraryIndexesItsClassesButNotTheConsoleOrWorksheetMachinery() {
        SessionImports lib = SessionImports.ofLibrary();
        assertEquals(List.of("import org.ampturn.coil.*;"), lib.neededBy("Solenoid s;"));
        assertEquals(List.of("import org.ampturn.units.*;"), lib.neededBy("Quantity q;"));
        assertEquals(List.of(), lib.neededBy("Session s; Console c;"));
        assertTrue(lib.all().contains("import org.ampturn.thermal.*;"), lib.all().toString());
        assertFalse(lib.all().contains("import org.ampturn.worksheet.*;"), lib.all().toString());
    }

    @Test
    void aSessionImportsAPackageBeforeTheFirstEntryThatNamesIt() {
        try (Session s = Session.start()) {
            assertEquals(List.of(SessionImports.FACADE), s.imports(), "only the facade at the start");
            assertEquals(List.of("  = true"), s.eval("InsulationClass.values().length > 3").lines());
            assertEquals(List.of(SessionImports.FACADE, "import org.ampturn.thermal.*;"), s.imports());
            s.clear();
            assertEquals(List.of("  = true"), s.eval("InsulationClass.values().length > 3").lines(), "a replay keeps the imports");
            assertEquals(List.of("  ! cannot find symbol: class Solenoidd", "    Solenoidd.class", "    ^"),
                    s.eval("Solenoidd.class").lines(), "a misspelt name is still the compiler's error");
            s.eval("var len = m(2);");
            assertFalse(s.imports().contains("import org.ampturn.units.*;"));
            assertEquals(List.of(new Session.Name("variable", "len", "Quantity", "2.000 m")), s.names(),
                    "#names shows a library type by its simple name even before its package is imported");
            s.importAll();
            assertTrue(s.imports().containsAll(SessionImports.ofLibrary().all()), s.imports().toString());
        }
    }
}
