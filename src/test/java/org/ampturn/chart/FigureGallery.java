package org.ampturn.chart;

import java.nio.file.Path;

/** Writes one figure of each kind to a directory (default target/gallery), for looking at; run by bench/chart gallery. */
public final class FigureGallery {
    public static void main(String[] args) {
        Path dir = Path.of(args.length > 0 ? args[0] : "target/gallery");
        Figures.useDirectory(dir);
        Figures.useFormats("png", "svg");
        long t0 = System.nanoTime();
        Figure f = Plots.plot(new RlRun(100_001));
        System.out.println("first: " + (System.nanoTime() - t0) / 1e6 + " ms");
        t0 = System.nanoTime();
        f.save(dir.resolve("big.png").toString(), 1600, 1000);
        System.out.println("again: " + (System.nanoTime() - t0) / 1e6 + " ms");
        Plots.overlay("current", new RlRun(2001, 1.0), new RlRun(2001, 0.8), new RlRun(2001, 1.2));
        Plots.bh(org.ampturn.material.MagneticMaterial.linear("demo steel", 1500, org.ampturn.units.Quantity.parse("1.5 T")),
                org.ampturn.units.Quantity.parse("1.1 T"));
        java.util.Random r = new java.util.Random(7);
        double[] v = new double[1000];
        for (int i = 0; i < v.length; i++) v[i] = 0.5 + 0.02 * r.nextGaussian();
        Plots.histogram("coil current", org.ampturn.units.Dimension.CURRENT, v,
                org.ampturn.units.Quantity.parse("460 mA"), org.ampturn.units.Quantity.parse("540 mA"));
        System.out.println(Figures.listing());
    }
}
