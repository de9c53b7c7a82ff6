package org.ampturn.chart;

import static org.ampturn.Ampturn.*;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.ampturn.coil.Coil;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.study.Axis;
import org.ampturn.study.Outputs;
import org.ampturn.study.Varied;

/**
 * Writes one figure of each kind (invented demo parts) to a directory, default target/gallery,
 * through the facade as a worksheet would; run by bench/chart gallery, for looking at.
 */
public final class FigureGallery {
    public static void main(String[] args) {
        Path dir = Path.of(args.length > 0 ? args[0] : "target/gallery");
        Figures.useDirectory(dir);
        Figures.useFormats("png", "svg");
        Figures.useWindows(false);
        var coil = Coil.lumped(mH(80), ohm(18));
        Transient diode = Drive.dc(V(24)).into(coil).offAt(ms(25), Clamp.diode()).simulate(ms(45));
        Transient zener = Drive.dc(V(24)).into(coil).offAt(ms(25), Clamp.tvs(V(60))).simulate(ms(45));
        long t0 = System.nanoTime();
        plot(diode);
        System.out.println("  (first figure in " + (System.nanoTime() - t0) / 1_000_000 + " ms)");
        overlay(diode, zener);
        plot(sweep("turns", 100, 1000, 10, n -> Outputs.of("L", mH(0.004 * n * n / 100), "R", ohm(0.02 * n))), "turns");
        plot(sweep(Axis.linear("turns", 200, 800, 13), Axis.linear("gap", mm(0.1), mm(1.0), 10),
                (n, g) -> Map.of("force", N(4e-7 * Math.PI * Math.pow(n * 0.3, 2) * 1e-4 / (2 * g.si() * g.si())))));
        plot(sweep("wire", List.of("AWG 26", "AWG 28", "AWG 30", "AWG 32"), w -> ohm(0.2 * Math.pow(1.26, Integer.parseInt(w.substring(4)) - 26))), "wire");
        histogram(tolerance(p -> Outputs.of("Ipull", p.get("i").times(1)))
                .vary(Varied.percent("i", mA(500), 8).normal()).limit("Ipull <= 540 mA")
                .monteCarlo(3000, 5), "Ipull");
        plotBH(MagneticMaterial.linear("demo iron", 1800, q("1.6 T")), q("1.2 T"));
        System.out.println(Figures.listing());
    }
}
