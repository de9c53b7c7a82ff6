package org.ampturn.chart;

import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;

/** Finds drawn curves in a rendered image by their colour. */
final class Pixels {
    private Pixels() {}

    /** True when the pixel is within {@code tol} of the colour in each channel. */
    static boolean near(int rgb, Color c, int tol) {
        int r = (rgb >> 16) & 0xff, g = (rgb >> 8) & 0xff, b = rgb & 0xff;
        return Math.abs(r - c.getRed()) <= tol && Math.abs(g - c.getGreen()) <= tol && Math.abs(b - c.getBlue()) <= tol;
    }

    /** Rows of the pixels of colour c in column x inside the area, or an empty array. */
    static int[] rowsIn(BufferedImage img, Rectangle2D area, int x, Color c) {
        java.util.List<Integer> rows = new java.util.ArrayList<>();
        for (int y = (int) area.getMinY(); y < (int) area.getMaxY(); y++) {
            if (near(img.getRGB(x, y), c, 40)) rows.add(y);
        }
        return rows.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Mean row of the colour in column x, NaN when absent. */
    static double meanRow(BufferedImage img, Rectangle2D area, int x, Color c) {
        int[] r = rowsIn(img, area, x, c);
        if (r.length == 0) return Double.NaN;
        double s = 0;
        for (int v : r) s += v;
        return s / r.length;
    }

    static int count(BufferedImage img, Color c, int tol) {
        int n = 0;
        for (int y = 0; y < img.getHeight(); y++) for (int x = 0; x < img.getWidth(); x++) if (near(img.getRGB(x, y), c, tol)) n++;
        return n;
    }

    static int distinctColours(BufferedImage img) {
        java.util.Set<Integer> s = new java.util.HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 2) for (int x = 0; x < img.getWidth(); x += 2) s.add(img.getRGB(x, y));
        return s.size();
    }
}
