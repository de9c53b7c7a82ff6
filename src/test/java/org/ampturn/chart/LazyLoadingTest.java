package org.ampturn.chart;

import static org.junit.jupiter.api.Assertions.*;

import java.io.File;
import java.net.URL;
import java.net.URLClassLoader;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The console preloads the facade; the chart library must load only when something is plotted.
 * A fresh, child-first class loader loads the facade and calls unit helpers, then is asked which
 * chart classes it has loaded.
 */
class LazyLoadingTest {
    static final class Fresh extends URLClassLoader {
        Fresh(URL[] urls) { super(urls, ClassLoader.getPlatformClassLoader()); }
        boolean loaded(String name) { return findLoadedClass(name) != null; }
    }

    private static Fresh fresh() throws Exception {
        List<URL> urls = new ArrayList<>();
        for (String p : System.getProperty("java.class.path").split(File.pathSeparator)) urls.add(new File(p).toURI().toURL());
        return new Fresh(urls.toArray(new URL[0]));
    }

    @Test
    void theFacadeDoesNotLoadTheChartLibrary() throws Exception {
        try (Fresh loader = fresh()) {
            Class<?> facade = Class.forName("org.ampturn.Ampturn", true, loader);
            Object mm = facade.getMethod("mm", double.class).invoke(null, 25.0);
            assertEquals("25.00 mm", mm.toString());
            facade.getMethod("q", String.class).invoke(null, "4.7 mH");
            assertSame(loader, facade.getClassLoader());
            assertFalse(loader.loaded("org.jfree.chart.JFreeChart"), "JFreeChart loaded with the facade");
            assertFalse(loader.loaded("org.ampturn.chart.Build"), "chart builder loaded with the facade");
            assertFalse(loader.loaded("org.ampturn.chart.Figures"), "figure registry loaded with the facade");
            // the check can fail: a chart class, once loaded, shows up in this loader
            Class.forName("org.jfree.chart.JFreeChart", false, loader);
            assertTrue(loader.loaded("org.jfree.chart.JFreeChart"));
        }
    }
}
