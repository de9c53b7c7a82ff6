package org.ampturn.chart;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Locale;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;
import javax.imageio.stream.MemoryCacheImageOutputStream;
import org.ampturn.units.AtomicFile;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Draws a chart to a PNG image or an SVG document, written atomically (temp file, then rename). */
final class Render {
    private Render() {}

    /** The format a path asks for by its extension: "png" or "svg". */
    static String formatOf(Path file) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".png")) return "png";
        if (n.endsWith(".svg")) return "svg";
        throw new IllegalArgumentException("cannot tell the image format of \"" + file + "\": end the name in .png or .svg");
    }

    static BufferedImage image(JFreeChart chart, int width, int height) {
        return image(chart, width, height, null);
    }

    /** Draws into an image; {@code info} (may be null) receives where the plot areas landed. */
    static BufferedImage image(JFreeChart chart, int width, int height, ChartRenderingInfo info) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            chart.draw(g, new Rectangle2D.Double(0, 0, width, height), info);
        } finally {
            g.dispose();
        }
        return img;
    }

    static String svg(JFreeChart chart, int width, int height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        // the library's default prefix of clip and gradient ids is made from the clock. Ids made from
        // the drawing itself instead: the same figure gives the same bytes (a saved SVG diffs
        // cleanly), and two different figures inlined in one HTML report do not share ids
        g.setDefsKeyPrefix(PLACEHOLDER);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        String doc = g.getSVGDocument();
        return doc.replace(PLACEHOLDER, SVG_ID_PREFIX + digest(doc) + "-");
    }

    private static final String PLACEHOLDER = "ampturnIdPrefixToBeReplaced";

    /** The first 12 hex digits of the SHA-256 of the text. */
    static String digest(String text) {
        try {
            byte[] h = java.security.MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < 6; i++) sb.append(String.format(Locale.ROOT, "%02x", h[i]));
            return sb.toString();
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException("this Java runtime has no SHA-256", e);
        }
    }

    /** Start of the ids in an SVG document's definitions (clip paths, gradients); a digest of the drawing follows. */
    static final String SVG_ID_PREFIX = "ampturn-";

    /**
     * Writes the chart to a file atomically with the user's normal permissions ({@link AtomicFile}),
     * creating missing folders.
     */
    static void write(JFreeChart chart, Path file, int width, int height) {
        checkSize(width, height);
        String format = formatOf(file);
        try {
            if (format.equals("png")) {
                BufferedImage img = image(chart, width, height);
                AtomicFile.write(file, out -> writePng(img, out));
            } else {
                AtomicFile.write(file, svg(chart, width, height).getBytes(StandardCharsets.UTF_8));
            }
        } catch (UncheckedIOException e) {
            throw new UncheckedIOException("cannot write the figure to " + file + ": " + e.getCause().getMessage(), e.getCause());
        }
    }

    /** PNG at a moderate deflate level: a chart is mostly flat colour, so it shrinks well and fast. */
    static void writePng(BufferedImage img, OutputStream out) throws IOException {
        Iterator<ImageWriter> it = ImageIO.getImageWritersByFormatName("png");
        if (!it.hasNext()) throw new IOException("no PNG writer in this Java runtime");
        ImageWriter w = it.next();
        try (ImageOutputStream ios = new MemoryCacheImageOutputStream(out)) { // no cache file in the temporary folder
            w.setOutput(ios);
            ImageWriteParam p = w.getDefaultWriteParam();
            if (p.canWriteCompressed()) {
                p.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
                p.setCompressionQuality(PNG_QUALITY);
            }
            w.write(null, new IIOImage(img, null, null), p);
        } finally {
            w.dispose();
        }
    }

    /** 0 = strongest deflate, 1 = none; measured in bench/chart. */
    static final float PNG_QUALITY = 0.75f;

    static final int MAX_SIDE = 20_000;

    /** Fails unless the size is a sane picture size, naming the value and the range. */
    static void checkSize(int width, int height) {
        if (width < 100 || width > MAX_SIDE) {
            throw new IllegalArgumentException("figure width must be between 100 and " + MAX_SIDE + " pixels, got " + width);
        }
        if (height < 80 || height > MAX_SIDE) {
            throw new IllegalArgumentException("figure height must be between 80 and " + MAX_SIDE + " pixels, got " + height);
        }
    }
}
