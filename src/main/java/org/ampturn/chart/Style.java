package org.ampturn.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;

/**
 * The figures' own look: warm off-white plot area, fine cool-grey grid, dark slate text in the
 * platform's sans-serif face, and a palette picked to stay apart for colour-blind readers in the
 * usual pairs (blue against red, green against violet) and to print legibly in grey.
 */
final class Style {
    private Style() {}

    static final Color PAGE = Color.WHITE;
    static final Color AREA = new Color(0xFB, 0xFA, 0xF6);
    static final Color GRID = new Color(0xDD, 0xE1, 0xE6);
    static final Color INK = new Color(0x26, 0x2B, 0x33);
    static final Color INK_SOFT = new Color(0x5E, 0x66, 0x70);
    static final Color MARK = new Color(0x55, 0x5D, 0x68);
    static final Color LIMIT = new Color(0xC2, 0x2F, 0x45);
    static final Color BAR = new Color(0x2A, 0x6F, 0xA8);

    /** Series colours, in order of use. */
    static final Color[] PALETTE = {
        new Color(0x1F, 0x6F, 0xB2), // cobalt
        new Color(0xD0, 0x4A, 0x38), // brick
        new Color(0x2F, 0x8F, 0x4E), // moss
        new Color(0x8A, 0x4F, 0xB8), // violet
        new Color(0xD8, 0x9A, 0x12), // ochre
        new Color(0x14, 0x9C, 0xA0), // teal
        new Color(0x8C, 0x5B, 0x33), // umber
        new Color(0x4B, 0x55, 0x63), // slate
    };

    /**
     * The colour of the {@code i}-th curve of a figure: the palette in order, again for each further
     * round with another dash ({@link #line(int)}), so no two curves of a figure share both.
     */
    static Color series(int i) {
        return PALETTE[Math.floorMod(i, PALETTE.length)];
    }

    /**
     * The line of the {@code i}-th curve of a figure: solid for the first round of the palette, then
     * dashed, dotted, dash-dot, and longer dashes for each further round, so the pair (colour, line)
     * of every curve differs from every other.
     */
    static Stroke line(int i) {
        int round = Math.floorDiv(Math.max(i, 0), PALETTE.length);
        float[] dash = dash(round);
        if (dash == null) return LINE;
        return new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /** The dash pattern of a round of the palette; null for a solid line. Each round's pattern differs from all others. */
    static float[] dash(int round) {
        switch (round) {
            case 0: return null;
            case 1: return new float[] {7f, 4f};
            case 2: return new float[] {2f, 3f};
            case 3: return new float[] {9f, 3f, 2f, 3f};
            default: return new float[] {4f + 3f * round, 4f};
        }
    }

    static final String FACE = Font.SANS_SERIF;
    static final Font TITLE = new Font(FACE, Font.BOLD, 15);
    static final Font SUBTITLE = new Font(FACE, Font.PLAIN, 12);
    static final Font AXIS = new Font(FACE, Font.PLAIN, 13);
    static final Font TICKS = new Font(FACE, Font.PLAIN, 11);
    static final Font LEGEND = new Font(FACE, Font.PLAIN, 11);
    static final Font NOTE = new Font(FACE, Font.PLAIN, 11);

    static final Stroke LINE = new BasicStroke(1.6f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke GRID_LINE = new BasicStroke(0.8f);
    static final Stroke MARK_LINE = new BasicStroke(1.1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {5f, 4f}, 0f);
    static final Stroke LIMIT_LINE = new BasicStroke(2.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {8f, 4f}, 0f);

    /** Lines over a heat map: region outlines and contours, each a light line on a dark under-stroke. */
    static final Color OUTLINE = new Color(0xFF, 0x9E, 0x3D);
    static final Color OUTLINE_EDGE = new Color(0x26, 0x2B, 0x33, 200);
    static final Color CONTOUR = new Color(0xFF, 0xFF, 0xFF, 230);
    static final Color CONTOUR_HALO = new Color(0x26, 0x2B, 0x33, 90);
    static final Stroke OUTLINE_LINE = new BasicStroke(1.6f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke OUTLINE_EDGE_LINE = new BasicStroke(3.4f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke CONTOUR_LINE = new BasicStroke(0.9f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke CONTOUR_HALO_LINE = new BasicStroke(1.9f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);

    /** The heat-map ramp: deep ink blue through sea green to pale straw (our own stops). */
    private static final Color[] RAMP = {
        new Color(0x1A, 0x23, 0x4E), new Color(0x22, 0x5E, 0x96), new Color(0x2E, 0x9A, 0x9A),
        new Color(0x8C, 0xC0, 0x6A), new Color(0xF2, 0xE2, 0x8C),
    };

    /** A colour of the ramp for {@code f} in [0, 1]. */
    static Paint ramp(double f) {
        if (Double.isNaN(f)) return new Color(0, 0, 0, 0);
        f = Math.max(0, Math.min(1, f));
        double pos = f * (RAMP.length - 1);
        int i = Math.min((int) pos, RAMP.length - 2);
        double t = pos - i;
        Color a = RAMP[i], b = RAMP[i + 1];
        return new Color((int) Math.round(a.getRed() + t * (b.getRed() - a.getRed())),
                (int) Math.round(a.getGreen() + t * (b.getGreen() - a.getGreen())),
                (int) Math.round(a.getBlue() + t * (b.getBlue() - a.getBlue())));
    }
}
