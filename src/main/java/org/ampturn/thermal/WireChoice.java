package org.ampturn.thermal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.ampturn.material.Conductor;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ampturn.wire.Bobbin;
import org.ampturn.wire.Wire;
import org.ampturn.wire.WireSeries;

/**
 * Choosing the wire and turns for a voltage-driven coil from its requirements. Immutable; each
 * {@code with…} copy sets one requirement; {@link #choose()} runs every wire of the series.
 *
 * <p>For each wire the bobbin is filled: turns per layer ⌊w/d⌋ (d the overall diameter, layer-wound),
 * layers ⌊f·h/(k·d + t)⌋ with the usable fraction f of the depth h (fill limit), the build factor k
 * (bulge: a real layer takes more than the lattice's d) and an inter-layer tape t over each layer; the
 * build is layers·(k·d + t), the mean turn the turn at half the build, R20 = ρ20·N·MLT/A. For a voltage
 * drive a full bobbin gives, for a given wire, the most turns and the least power at the same
 * ampere-turns (NI = V·A/(ρ·MLT) does not depend on N), so the wires are compared full.
 *
 * <p>Corners (the coil must work at all of them): the temperature is the steady state
 * ({@link Heating}, its cooling rule on the winding's outside surface) at the highest supply, the
 * hottest ambient and the bottom of the resistance tolerance; current and ampere-turns at the lowest
 * supply, that temperature and the top of the tolerance; power at the highest supply, the coldest
 * ambient and the bottom of the tolerance. Requirements: minimum ampere-turns or current (hot),
 * maximum power, maximum rise, and the hot spot within the insulation class (always).
 */
public final class WireChoice {
    private final Bobbin bobbin;
    private final WireSeries series;
    private final double volts, vtol;
    private final double minNI, minI, maxP, maxRise;
    private final double fill, bulge, tape, rtol;
    private final double hot, cold;
    private final InsulationClass insulation;
    private final Cooling cooling;
    private final double duty;

    private WireChoice(Bobbin bobbin, WireSeries series, double volts, double vtol, double minNI, double minI, double maxP, double maxRise,
            double fill, double bulge, double tape, double rtol, double hot, double cold, InsulationClass insulation, Cooling cooling, double duty) {
        this.duty = duty;
        this.bobbin = bobbin;
        this.series = series;
        this.volts = volts;
        this.vtol = vtol;
        this.minNI = minNI;
        this.minI = minI;
        this.maxP = maxP;
        this.maxRise = maxRise;
        this.fill = fill;
        this.bulge = bulge;
        this.tape = tape;
        this.rtol = rtol;
        this.hot = hot;
        this.cold = cold;
        this.insulation = insulation;
        this.cooling = cooling;
    }

    /**
     * A choice for a bobbin over the IEC 60317 metric series (grades 1-3) and AWG 10-44 (single, heavy,
     * triple): no requirement yet but the class 130 (B) limit, ambient 25 °C (cold corner 20 °C), full
     * depth, build factor 1, no tape, each size's own resistance tolerance, the handbook cooling rule.
     */
    public static WireChoice forBobbin(Bobbin bobbin) {
        Require.present("bobbin", bobbin);
        return new WireChoice(bobbin, WireSeries.metric().and(WireSeries.awg()), Double.NaN, 0, 0, 0, Double.POSITIVE_INFINITY,
                Double.POSITIVE_INFINITY, 1, 1, 0, Double.NaN, 298.15, 293.15, InsulationClass.B, Cooling.handbookRule(), 1);
    }

    private WireChoice copy(WireSeries s, double v, double vt, double ni, double i, double p, double r, double f, double b, double t, double rt,
            double h, double c, InsulationClass ic, Cooling co) {
        return new WireChoice(bobbin, s, v, vt, ni, i, p, r, f, b, t, rt, h, c, ic, co, duty);
    }

    /** The supply and its tolerance in percent (±), e.g. {@code withSupply(V(24), 10)}. */
    public WireChoice withSupply(Quantity voltage, double tolerancePercent) {
        double v = Require.positive("supply voltage", voltage, Dimension.VOLTAGE, 1e6);
        if (!(tolerancePercent >= 0 && tolerancePercent < 100)) {
            throw Require.fail("supply tolerance (" + Require.show(tolerancePercent) + " %) must be from 0 % to below 100 %");
        }
        return copy(series, v, tolerancePercent / 100, minNI, minI, maxP, maxRise, fill, bulge, tape, rtol, hot, cold, insulation, cooling);
    }

    public WireChoice withSeries(WireSeries s) {
        Require.present("wire series", s);
        return copy(s, volts, vtol, minNI, minI, maxP, maxRise, fill, bulge, tape, rtol, hot, cold, insulation, cooling);
    }

    /** Least ampere-turns at the lowest supply with the coil hot (a current: {@code A(800)} for 800 At). */
    public WireChoice withMinAmpereTurns(Quantity ampereTurns) {
        double v = Require.positive("minimum ampere-turns", ampereTurns, Dimension.CURRENT, 1e9);
        return copy(series, volts, vtol, v, minI, maxP, maxRise, fill, bulge, tape, rtol, hot, cold, insulation, cooling);
    }

    /** Least current at the lowest supply with the coil hot. */
    public WireChoice withMinCurrentHot(Quantity current) {
        double v = Require.positive("minimum hot current", current, Dimension.CURRENT, 1e6);
        return copy(series, volts, vtol, minNI, v, maxP, maxRise, fill, bulge, tape, rtol, hot, cold, insulation, cooling);
    }

    /** Most power at the highest supply with the coil cold. */
    public WireChoice withMaxPower(Quantity power) {
        double v = Require.positive("maximum power", power, Dimension.POWER, 1e9);
        return copy(series, volts, vtol, minNI, minI, v, maxRise, fill, bulge, tape, rtol, hot, cold, insulation, cooling);
    }

    /** Most steady temperature rise over the hottest ambient (a difference in K). */
    public WireChoice withMaxRise(Quantity kelvin) {
        double v = Require.positive("maximum rise", kelvin, Dimension.TEMPERATURE, 1000);
        return copy(series, volts, vtol, minNI, minI, maxP, v, fill, bulge, tape, rtol, hot, cold, insulation, cooling);
    }

    /** The hottest ambient. */
    public WireChoice withAmbient(Quantity hottest) {
        double t = Require.absoluteTemperature("hottest ambient", hottest, 173.15, 573.15, "the wire choice");
        if (!(t + 10 < insulation.limit().si())) {
            throw Require.fail("hottest ambient " + hottest + " leaves no room below thermal " + insulation + " with its 10 K hot-spot allowance");
        }
        return copy(series, volts, vtol, minNI, minI, maxP, maxRise, fill, bulge, tape, rtol, t, Math.min(cold, t), insulation, cooling);
    }

    /** The coldest ambient (the power corner). */
    public WireChoice withColdAmbient(Quantity coldest) {
        double t = Require.absoluteTemperature("coldest ambient", coldest, 173.15, 573.15, "the wire choice");
        if (!(t <= hot)) throw Require.fail("coldest ambient " + coldest + " is above the hottest " + Quantity.temperatureKelvin(hot));
        return copy(series, volts, vtol, minNI, minI, maxP, maxRise, fill, bulge, tape, rtol, hot, t, insulation, cooling);
    }

    public WireChoice withInsulationClass(InsulationClass c) {
        Require.present("insulation class", c);
        if (!(hot + 10 < c.limit().si())) {
            throw Require.fail("thermal " + c + " is at or below the hottest ambient " + Quantity.temperatureKelvin(hot) + " plus the 10 K hot-spot allowance");
        }
        return copy(series, volts, vtol, minNI, minI, maxP, maxRise, fill, bulge, tape, rtol, hot, cold, c, cooling);
    }

    public WireChoice withCooling(Cooling c) {
        Require.present("cooling", c);
        return copy(series, volts, vtol, minNI, minI, maxP, maxRise, fill, bulge, tape, rtol, hot, cold, insulation, c);
    }

    /** Usable fraction of the winding depth (room left for an outer wrap, leads), from 0.1 to 1. */
    public WireChoice withFillLimit(double fractionOfDepth) {
        Require.between("fill limit (fraction of the depth)", fractionOfDepth, 0.1, 1);
        return copy(series, volts, vtol, minNI, minI, maxP, maxRise, fractionOfDepth, bulge, tape, rtol, hot, cold, insulation, cooling);
    }

    /** Build (bulge) factor: a layer takes this many overall diameters of depth (1 to 2; 1.05-1.15 is common practice). */
    public WireChoice withBuildFactor(double factor) {
        Require.between("build factor", factor, 1, 2);
        return copy(series, volts, vtol, minNI, minI, maxP, maxRise, fill, factor, tape, rtol, hot, cold, insulation, cooling);
    }

    /** Insulating tape over each layer (its thickness). */
    public WireChoice withLayerTape(Quantity thickness) {
        double t = Require.lengthOrZero("layer tape thickness", thickness);
        return copy(series, volts, vtol, minNI, minI, maxP, maxRise, fill, bulge, t, rtol, hot, cold, insulation, cooling);
    }

    /** One resistance tolerance for every wire (± percent) instead of each size's own. */
    public WireChoice withResistanceTolerance(double percent) {
        Require.between("resistance tolerance (%)", percent, 0, 50);
        return copy(series, volts, vtol, minNI, minI, maxP, maxRise, fill, bulge, tape, percent / 100, hot, cold, insulation, cooling);
    }

    /**
     * Intermittent duty (on-time / period, in percent): the temperature is then the steady state at
     * the mean loss, duty × V²/R. That is the mean of the cyclic steady state; for periods much shorter
     * than the winding's thermal time constant the peak is close to it; check the peak with
     * {@link ThermalNetwork#duty}. The power corner stays the loss while on.
     */
    public WireChoice withDuty(double percent) {
        if (!(percent > 0 && percent <= 100)) throw Require.fail("duty (" + Require.show(percent) + " %) must be above 0 % and at most 100 %");
        return new WireChoice(bobbin, series, volts, vtol, minNI, minI, maxP, maxRise, fill, bulge, tape, rtol, hot, cold, insulation, cooling,
                percent / 100);
    }

    /** Runs every wire of the series; fails only when no supply was given. */
    public WireChoices choose() {
        if (Double.isNaN(volts)) throw Require.fail("the wire choice needs the supply: withSupply(V(24), 10) for 24 V ±10 %");
        List<WireCandidate> ok = new ArrayList<>(), bad = new ArrayList<>();
        int k = 0;
        for (Wire w : series.wires()) {
            if ((++k & 63) == 0) Require.notInterrupted("wire choice");
            WireCandidate c = evaluate(w);
            (c.meets() ? ok : bad).add(c);
        }
        ok.sort(Comparator.comparingDouble((WireCandidate c) -> c.powerCold().si()).thenComparing(c -> -c.ampereTurnsHot().si()));
        bad.sort(Comparator.comparingDouble(c -> c.shortfall));
        return new WireChoices(describe(), ok, bad);
    }

    private WireCandidate evaluate(Wire w) {
        double d = w.overallDiameterM();
        double width = bobbin.width().si(), depth = bobbin.depth().si() * fill;
        int perLayer = (int) Math.floor(width / d * (1 + 1e-9));
        double layerPitch = bulge * d + tape;
        int layers = (int) Math.floor(depth / layerPitch * (1 + 1e-9));
        double tol = Double.isNaN(rtol) ? WireSeries.resistanceTolerance(w) : rtol;
        if (perLayer < 1 || layers < 1) {
            String why = perLayer < 1 ? "does not fit: overall diameter " + w.overallDiameter() + " is wider than the winding width " + bobbin.width()
                    : "does not fit: one layer takes " + Quantity.of(layerPitch, Dimension.LENGTH) + ", the usable depth is " + Quantity.of(depth, Dimension.LENGTH);
            return new WireCandidate(w, 0, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, tol,
                    List.of(why), List.of(), 1e9 + d);
        }
        int n = perLayer * layers;
        double build = layers * layerPitch;
        double mlt = bobbin.turnLengthAt(build / 2);
        double r20 = w.resistancePerLengthAt(Conductor.T20) * n * mlt;
        double area = bobbin.turnLengthAt(build) * width + 2 * bobbin.turnLengthAt(build / 2) * build;
        Conductor cu = w.conductor();
        double vmax = volts * (1 + vtol), vmin = volts * (1 - vtol);
        HeatState hs;
        try {
            hs = Heating.of(Quantity.of(r20 * (1 - tol), Dimension.RESISTANCE), cu, Quantity.of(area, Dimension.AREA))
                    .withCooling(cooling).withInsulationClass(insulation).withAmbient(Quantity.temperatureKelvin(hot))
                    .atVoltage(Quantity.of(vmax * Math.sqrt(duty), Dimension.VOLTAGE)); // mean loss duty·V²/R
        } catch (IllegalStateException | IllegalArgumentException e) {
            double p = vmax * vmax / (r20 * (1 - tol) * cu.resistanceRatioAt(cold));
            return new WireCandidate(w, n, layers, r20, Double.NaN, p, Double.NaN, Double.NaN, Double.NaN, mlt, area, tol,
                    List.of("no steady temperature: " + Quantity.of(p, Dimension.POWER) + " cold is far more than the winding can shed (it would burn out)"),
                    List.of(), 1e6 + p);
        }
        double tHot = hs.temperature().si();
        double rHot = r20 * (1 + tol) * cu.resistanceRatioAt(tHot);
        double iHot = vmin / rHot;
        double pCold = vmax * vmax / (r20 * (1 - tol) * cu.resistanceRatioAt(cold));
        double rise = tHot - hot;
        List<String> fails = new ArrayList<>();
        double shortfall = 0;
        if (iHot * n < minNI) {
            double rel = 1 - iHot * n / minNI;
            fails.add("ampere-turns " + WireChoices.at(iHot * n) + " < " + WireChoices.at(minNI) + " (" + pct(-rel) + ")");
            shortfall += rel;
        }
        if (iHot < minI) {
            double rel = 1 - iHot / minI;
            fails.add("hot current " + Quantity.of(iHot, Dimension.CURRENT) + " < " + Quantity.of(minI, Dimension.CURRENT) + " (" + pct(-rel) + ")");
            shortfall += rel;
        }
        if (pCold > maxP) {
            double rel = pCold / maxP - 1;
            fails.add("power " + Quantity.of(pCold, Dimension.POWER) + " > " + Quantity.of(maxP, Dimension.POWER) + " (" + pct(rel) + ")");
            shortfall += rel;
        }
        if (rise > maxRise) {
            fails.add("rise " + HotCoil.kelvin(rise) + " > " + HotCoil.kelvin(maxRise) + " by " + HotCoil.kelvin(rise - maxRise));
            shortfall += rise / maxRise - 1;
        }
        if (!hs.withinClass()) {
            double over = -hs.margin().si();
            fails.add("hot spot " + hs.hotSpot() + " over thermal " + insulation + " by " + HotCoil.kelvin(over));
            shortfall += over / (insulation.limit().si() - hot);
        }
        List<String> notes = new ArrayList<>();
        String range = cooling.rangeNote(hs.totalLoss().si(), area);
        if (range != null) notes.add(range);
        return new WireCandidate(w, n, layers, r20, rHot, pCold, iHot, tHot, rise, mlt, area, tol, fails, notes, shortfall);
    }

    private static String pct(double frac) {
        return String.format(java.util.Locale.ROOT, "%+.1f %%", 100 * frac);
    }

    private String describe() {
        StringBuilder sb = new StringBuilder();
        sb.append(Double.isNaN(volts) ? "no supply" : Quantity.of(volts, Dimension.VOLTAGE) + " ±" + Require.show(100 * vtol) + " %");
        if (minNI > 0) sb.append(", ≥ ").append(WireChoices.at(minNI)).append(" hot");
        if (minI > 0) sb.append(", ≥ ").append(Quantity.of(minI, Dimension.CURRENT)).append(" hot");
        if (maxP < Double.POSITIVE_INFINITY) sb.append(", ≤ ").append(Quantity.of(maxP, Dimension.POWER));
        if (maxRise < Double.POSITIVE_INFINITY) sb.append(", rise ≤ ").append(HotCoil.kelvin(maxRise));
        if (duty < 1) sb.append(", duty ").append(Require.show(100 * duty)).append(" %");
        sb.append(", ambient ").append(Quantity.temperatureKelvin(cold)).append(" to ").append(Quantity.temperatureKelvin(hot));
        sb.append(", ").append(insulation);
        return sb.toString();
    }

    @Override
    public String toString() {
        return "wire choice on a " + bobbin + ", " + series.name() + ": " + describe();
    }
}
