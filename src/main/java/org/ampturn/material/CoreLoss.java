package org.ampturn.material;

import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.apache.commons.math3.special.Gamma;

/**
 * Core loss per volume from Steinmetz parameters, for sinusoidal and for piecewise-linear flux.
 * Immutable. Loss densities are in W/m³ with f in Hz and B in tesla.
 *
 * <p>Sinusoidal flux of peak B̂ (C. P. Steinmetz, "On the law of hysteresis", Trans. AIEE 9,
 * 1892, generalised to the frequency exponent as is usual in ferrite datasheets):
 * P_v = k · f^α · B̂^β.
 *
 * <p>Any periodic flux, by the improved generalised Steinmetz equation (iGSE) of K. Venkatachalam,
 * C. R. Sullivan, T. Abdallah, H. Tacca, "Accurate prediction of ferrite core loss with nonsinusoidal
 * waveforms using only Steinmetz parameters", IEEE COMPEL 2002:
 * P_v = (1/T) ∫ k_i |dB/dt|^α (ΔB)^(β−α) dt, with ΔB the peak-to-peak flux swing and
 * k_i = k / ((2π)^(α−1) · ∫₀^{2π} |cos θ|^α · 2^(β−α) dθ),
 * where ∫₀^{2π} |cos θ|^α dθ = 2√π Γ((α+1)/2) / Γ(α/2 + 1). For a sine the iGSE gives Steinmetz's
 * value exactly. For a piecewise-linear flux (the ripple of a choke) the integral is the sum
 * k_i (ΔB)^(β−α) f Σ |ΔB_j|^α Δt_j^(1−α); for a triangle of duty D this is
 * P_v = k_i · ΔB^β · f^α · (D^(1−α) + (1−D)^(1−α)).
 *
 * <p>Range: the parameters hold over the frequency and flux range they were fitted on (a datasheet's
 * curves), for an unbiased loop with no minor loops (single peak-to-peak swing per period); DC bias,
 * relaxation after flat parts of the waveform (i²GSE) are not included.
 *
 * <p>Temperature: {@link #withTemperatureFactor} multiplies k by the parabolic factor
 * ct0 − ct1·T + ct2·T² (T in °C) of S. A. Mulder, "Loss formulas for power ferrites and their use in
 * transformer design", Philips Components, 1994; {@link #atTemperature} gives the parameters at one
 * temperature. Without a factor the parameters hold at the temperature they were fitted at.
 */
public final class CoreLoss {
    private final double k;
    private final double alpha;
    private final double beta;
    private final double ki;
    private final String source;
    private final double ct0, ct1, ct2; // temperature factor ct0 − ct1·T + ct2·T² (T in °C); NaN: none

    private CoreLoss(double k, double alpha, double beta, String source) {
        this(k, alpha, beta, source, Double.NaN, Double.NaN, Double.NaN);
    }

    private CoreLoss(double k, double alpha, double beta, String source, double ct0, double ct1, double ct2) {
        this.k = k;
        this.alpha = alpha;
        this.beta = beta;
        this.source = source;
        this.ct0 = ct0;
        this.ct1 = ct1;
        this.ct2 = ct2;
        double cosInt = 2 * Math.sqrt(Math.PI) * Math.exp(Gamma.logGamma((alpha + 1) / 2) - Gamma.logGamma(alpha / 2 + 1));
        this.ki = k / (Math.pow(2 * Math.PI, alpha - 1) * cosInt * Math.pow(2, beta - alpha));
    }

    /**
     * Steinmetz parameters: P_v = k · f^α · B̂^β with P_v in W/m³, f in Hz and B̂ in T.
     *
     * @param k coefficient in W/m³ for f in Hz and B in T
     * @param alpha frequency exponent, 1 to 3 (typically 1.1 to 1.9)
     * @param beta flux exponent, 1 to 4 (typically 2 to 3)
     */
    public static CoreLoss steinmetz(double k, double alpha, double beta) {
        Require.positive("Steinmetz coefficient k (W/m³ at f in Hz, B in T)", k);
        Require.between("Steinmetz frequency exponent α", alpha, 1, 3);
        Require.between("Steinmetz flux exponent β", beta, 1, 4);
        return new CoreLoss(k, alpha, beta, "");
    }

    /**
     * Steinmetz parameters from one datasheet point and the two exponents: the loss density
     * {@code lossDensity} at frequency {@code f} and peak flux density {@code bPeak}, sinusoidal.
     * E.g. {@code CoreLoss.fromPoint(q("200 kW/m^3"), kHz(100), mT(100), 1.4, 2.6)}.
     */
    public static CoreLoss fromPoint(Quantity lossDensity, Quantity frequency, Quantity bPeak, double alpha, double beta) {
        double p = Require.positive("loss density", lossDensity, Dimension.POWER_DENSITY);
        double f = Require.positive("frequency", frequency, Dimension.FREQUENCY);
        double b = Require.positive("peak flux density", bPeak, Dimension.FLUX_DENSITY);
        Require.between("Steinmetz frequency exponent α", alpha, 1, 3);
        Require.between("Steinmetz flux exponent β", beta, 1, 4);
        return new CoreLoss(p / (Math.pow(f, alpha) * Math.pow(b, beta)), alpha, beta, "");
    }

    /** The same parameters with a note of where they came from, shown by {@link #toString()}. */
    public CoreLoss withSource(String note) {
        return new CoreLoss(k, alpha, beta, note == null ? "" : note, ct0, ct1, ct2);
    }

    /** Coldest core temperature the temperature factor is evaluated at (°C). */
    public static final double MIN_CELSIUS = -60;
    /** Hottest core temperature the temperature factor is evaluated at (°C). */
    public static final double MAX_CELSIUS = 250;

    /**
     * The same parameters with the parabolic temperature factor of Mulder (1994):
     * P_v(T) = k·f^α·B̂^β·(ct0 − ct1·T + ct2·T²), T the core temperature in °C. The factor is 1 at the
     * temperature where k was fitted when the parameters are normalised so; its least value
     * ct0 − ct1²/(4·ct2), at T = ct1/(2·ct2), must be above zero. Typical of MnZn power ferrites (from
     * memory, shape only): least loss near 80 to 100 °C and about 1.4 to 2 times that at 25 °C, e.g.
     * ct2 = 1e-4 /°C², ct1 = 1.8e-2 /°C, ct0 = 1.81 (1 at 90 °C, 1.42 at 25 °C). Laminated silicon steel
     * changes far less with temperature; leave it without a factor.
     *
     * @param ct0 constant term (at 0 °C), above zero
     * @param ct1 linear coefficient (1/°C), zero or more
     * @param ct2 quadratic coefficient (1/°C²), zero or more
     */
    public CoreLoss withTemperatureFactor(double ct0, double ct1, double ct2) {
        Require.positive("temperature factor ct0", ct0);
        Require.between("temperature factor ct1 (1/°C)", ct1, 0, 1);
        Require.between("temperature factor ct2 (1/°C²)", ct2, 0, 1);
        double least = ct2 > 0 ? ct0 - ct1 * ct1 / (4 * ct2) : ct0 - ct1 * MAX_CELSIUS;
        if (!(least > 0)) {
            throw Require.fail(String.format(Locale.ROOT, "temperature factor ct0 − ct1·T + ct2·T² (ct0 = %.4g, ct1 = %.4g, ct2 = %.4g) "
                    + "falls to %.4g at its least: it must stay above zero", ct0, ct1, ct2, least));
        }
        return new CoreLoss(k, alpha, beta, source, ct0, ct1, ct2);
    }

    /** True when a temperature factor was given. */
    public boolean hasTemperatureFactor() { return !Double.isNaN(ct0); }

    /** Kernel: the temperature factor ct0 − ct1·T + ct2·T² at a core temperature in kelvin (1 without a factor). */
    public double temperatureFactorAt(double kelvin) {
        Require.finite("core temperature (K)", kelvin);
        if (!hasTemperatureFactor()) return 1;
        double c = kelvin - 273.15;
        if (!(c >= MIN_CELSIUS && c <= MAX_CELSIUS)) {
            throw Require.fail(String.format(Locale.ROOT, "core temperature (%.4g °C) must be from %.0f to %.0f °C for the core-loss "
                    + "temperature factor", c, MIN_CELSIUS, MAX_CELSIUS));
        }
        return ct0 - ct1 * c + ct2 * c * c;
    }

    /**
     * The parameters at one core temperature: k times the temperature factor, no factor left (the
     * same parameters when there is none). E.g. {@code loss.atTemperature(degC(25))}.
     */
    public CoreLoss atTemperature(Quantity temperature) {
        Require.absoluteTemperature("core temperature", temperature);
        if (!hasTemperatureFactor()) return this;
        return new CoreLoss(k * temperatureFactorAt(temperature.si()), alpha, beta, source);
    }

    public double k() { return k; }

    public double alpha() { return alpha; }

    public double beta() { return beta; }

    /** The iGSE coefficient k_i (same units as k). */
    public double ki() { return ki; }

    // ---- Quantity surface ----

    /** Loss density for sinusoidal flux of peak {@code bPeak} at {@code frequency} (Steinmetz). */
    public Quantity density(Quantity frequency, Quantity bPeak) {
        double f = Require.positive("frequency", frequency, Dimension.FREQUENCY);
        double b = Require.nonNegative("peak flux density", bPeak, Dimension.FLUX_DENSITY);
        return Quantity.of(densitySineAt(f, b), Dimension.POWER_DENSITY);
    }

    /** Loss in a core volume for sinusoidal flux (Steinmetz). */
    public Quantity loss(Quantity frequency, Quantity bPeak, Quantity volume) {
        double v = Require.positive("core volume", volume, Dimension.VOLUME);
        return Quantity.of(density(frequency, bPeak).si() * v, Dimension.POWER);
    }

    /**
     * Loss density for a triangular flux of peak-to-peak swing {@code ripple} rising for a fraction
     * {@code duty} of each period (the ripple in a choke of a converter at duty D), by the iGSE.
     */
    public Quantity triangularDensity(Quantity frequency, Quantity ripple, double duty) {
        double f = Require.positive("frequency", frequency, Dimension.FREQUENCY);
        double db = Require.nonNegative("peak-to-peak flux swing", ripple, Dimension.FLUX_DENSITY);
        return Quantity.of(densityTriangularAt(f, db, duty), Dimension.POWER_DENSITY);
    }

    /** Loss in a core volume for a triangular flux (iGSE); see {@link #triangularDensity}. */
    public Quantity triangularLoss(Quantity frequency, Quantity ripple, double duty, Quantity volume) {
        double v = Require.positive("core volume", volume, Dimension.VOLUME);
        return Quantity.of(triangularDensity(frequency, ripple, duty).si() * v, Dimension.POWER);
    }

    // ---- kernels (SI) ----

    /** Kernel: Steinmetz loss density (W/m³) at f (Hz) and peak B (T), sinusoidal. */
    public double densitySineAt(double f, double bPeak) {
        Require.finite("frequency (Hz)", f);
        Require.finite("b peak", bPeak);
        return Require.result("density sine", k * Math.pow(f, alpha) * Math.pow(Math.abs(bPeak), beta));
    }

    /** Kernel: iGSE loss density (W/m³) of a triangle: f (Hz), swing ΔB (T, peak to peak), duty D in (0, 1). */
    public double densityTriangularAt(double f, double deltaB, double duty) {
        Require.finite("frequency (Hz)", f);
        Require.finite("delta b", deltaB);
        Require.finite("duty", duty);
        if (!(duty > 0 && duty < 1)) throw Require.fail("duty must be between 0 and 1 (exclusive), got " + duty);
        return Require.result("density triangular", ki * Math.pow(deltaB, beta) * Math.pow(f, alpha) * (Math.pow(duty, 1 - alpha) + Math.pow(1 - duty, 1 - alpha)));
    }

    /**
     * Kernel: iGSE loss density (W/m³) of a periodic piecewise-linear flux given by its corner points
     * over one period: times {@code t} (s, increasing, t[n−1] − t[0] is the period) and flux densities
     * {@code b} (T), with b[n−1] = b[0]. ΔB is max(b) − min(b) (one major loop per period).
     */
    public double densityPiecewiseLinearAt(double[] t, double[] b) {
        Require.present("corner times", t);
        Require.present("corner flux densities", b);
        int n = t.length;
        if (n != b.length || n < 3) {
            throw Require.fail("a piecewise-linear flux needs at least 3 corner points with one B per time, got "
                    + n + " times and " + b.length + " flux densities");
        }
        double period = t[n - 1] - t[0];
        if (!(period > 0)) throw Require.fail("the period t[last] − t[0] must be greater than zero, got " + period + " s");
        if (Math.abs(b[n - 1] - b[0]) > 1e-9 * (Math.abs(b[0]) + 1e-12) + 1e-15) {
            throw Require.fail("the flux must end where it began over one period: b[0] = " + b[0] + " T, b[last] = " + b[n - 1] + " T");
        }
        double lo = b[0], hi = b[0];
        for (double v : b) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
        double sum = 0;
        for (int j = 1; j < n; j++) {
            double dt = t[j] - t[j - 1];
            if (!(dt >= 0)) throw Require.fail("times must not decrease: t[" + j + "] = " + t[j] + " s after " + t[j - 1] + " s");
            double db = Math.abs(b[j] - b[j - 1]);
            if (db == 0) continue;
            if (dt == 0) throw Require.fail("a flux step with no time (at t = " + t[j] + " s) has infinite dB/dt");
            sum += Math.pow(db, alpha) * Math.pow(dt, 1 - alpha);
        }
        return ki * Math.pow(hi - lo, beta - alpha) * sum / period;
    }

    /**
     * Kernel: core-loss energy per volume (J/m³) of any sampled flux waveform, periodic or not (the
     * flux of a transient run): times {@code t} (s, not decreasing) and flux densities {@code b} (T),
     * straight between samples. The iGSE of Venkatachalam et al. (2002) with its splitting of the
     * waveform into a major loop and minor loops: each part of the path belongs to the loop that it
     * closes, found with the turning-point memory of the three-point rainflow count (ASTM E1049-85,
     * "Standard Practices for Cycle Counting in Fatigue Analysis"); a closed loop of swing ΔB costs k_i ΔB^(β−α) ∫ |dB/dt|^α dt over its two
     * halves, and each half loop left open at the end (the rise to a DC bias, the last half period)
     * costs the same with its own swing. A constant flux costs nothing; DC bias does not change the
     * loss here (see the class note on range).
     */
    public double energyDensityAt(double[] t, double[] b) {
        Require.present("times", t);
        Require.present("flux densities", b);
        int n = t.length;
        if (n != b.length || n < 2) {
            throw Require.fail("a flux waveform needs at least 2 samples with one B per time, got " + n + " times and " + b.length + " flux densities");
        }
        // turning points: level and the cost ∫|dB/dt|^(α−1)|dB| of the path leaving it not yet given to a loop
        double[] level = new double[n + 1];
        double[] cost = new double[n + 1];
        int top = 0;
        level[0] = Require.finite("b[0] (T)", b[0]);
        Require.finite("t[0] (s)", t[0]);
        int direction = 0;
        double energy = 0;
        for (int j = 1; j < n; j++) {
            // the names are built only for a message: this loop runs once per output sample of a transient
            if (!Double.isFinite(t[j])) Require.finite("t[" + j + "] (s)", t[j]);
            if (!Double.isFinite(b[j])) Require.finite("b[" + j + "] (T)", b[j]);
            double dt = t[j] - t[j - 1];
            if (!(dt >= 0)) throw Require.fail("times must not decrease: t[" + j + "] = " + t[j] + " s after " + t[j - 1] + " s");
            double from = b[j - 1];
            double to = b[j];
            if (to == from) continue;
            if (dt == 0) throw Require.fail("a flux step with no time (at t = " + t[j] + " s) has infinite dB/dt");
            int d = to > from ? 1 : -1;
            if (direction != 0 && d != direction) { // b[j−1] is a turning point
                top++;
                level[top] = from;
                cost[top] = 0;
            }
            direction = d;
            double weight = Math.pow(Math.abs(to - from) / dt, alpha - 1); // per tesla of this interval
            double at = from;
            while (top >= 1 && (d > 0 ? to >= level[top - 1] : to <= level[top - 1])) {
                // the path passes the turning point before the current one: the loop between them closes there
                double closing = level[top - 1];
                cost[top] += weight * Math.abs(closing - at);
                at = closing;
                double swing = Math.abs(level[top] - level[top - 1]);
                if (top >= 2) {
                    energy += loopCost(swing, cost[top - 1] + cost[top]);
                    top -= 2; // the path goes on as the one leaving the older turning point
                } else { // the start is not a turning point: a half loop from it, then the start is forgotten
                    energy += loopCost(swing, cost[0]);
                    level[0] = level[1];
                    cost[0] = cost[1];
                    top = 0;
                }
            }
            cost[top] += weight * Math.abs(to - at);
        }
        // half loops left open: between turning points, and from the last one to the end
        for (int k = 0; k <= top; k++) {
            double end = k < top ? level[k + 1] : b[n - 1];
            energy += loopCost(Math.abs(end - level[k]), cost[k]);
        }
        return Require.result("core-loss energy density", energy);
    }

    /** k_i ΔB^(β−α) times the path's ∫|dB/dt|^α dt (which is ∫|dB/dt|^(α−1)|dB|). */
    private double loopCost(double swing, double pathCost) {
        return swing == 0 || pathCost == 0 ? 0 : ki * Math.pow(swing, beta - alpha) * pathCost;
    }

    @Override
    public String toString() {
        String s = String.format(Locale.ROOT, "Steinmetz k = %.4g W/m³, α = %.3g, β = %.3g (f in Hz, B in T)", k, alpha, beta);
        if (hasTemperatureFactor()) s += String.format(Locale.ROOT, " × (%.4g − %.4g·T + %.4g·T², T in °C)", ct0, ct1, ct2);
        return source.isEmpty() ? s : s + ", " + source;
    }
}
