package org.ampturn.bench;

import static org.ampturn.Ampturn.*;

import java.util.concurrent.TimeUnit;
import org.ampturn.coil.AirGap;
import org.ampturn.coil.Coil;
import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.coil.WoundCoil;
import org.ampturn.drive.Circuit;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.LoadProbe;
import org.ampturn.drive.SaturatingCoil;
import org.ampturn.drive.Transient;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.material.Materials;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.openjdk.jmh.annotations.*;

/**
 * The saturating transient against the bare integrator it is built on, measured in one run so
 * that a loaded machine still gives the ratio ({@code bench/satspeed} prints it).
 *
 * <p>Case: 24 V into 200 turns of 2 Ω on a gapped silicon-steel core (80 mm path, 1 cm², 0.2 mm
 * gap; the B-H table of {@code Materials.SILICON_STEEL}), switched off at 20 ms into a 36 V zener
 * across the switch, 40 ms, relative tolerance 1e-8, the default 2,001 samples. The same with the
 * analytic test coil of {@code DriveBench}. The bare run is Commons Math's
 * {@link DormandPrince853Integrator} on the one-state ODE dλ/dt = V − R·i(λ) (then −(V_z + 0.7 V) − R·i
 * after switch-off, the zener and its diode across the coil, stopped where i reaches zero), with the coil's own i(λ), the tolerances and the
 * longest step the library takes for λ, and a step handler that records the same 2,001 sample
 * times (current and λ); everything else the library gives (energies, powers, metrics, markers)
 * is left out of it.
 *
 * <p>Kernels: i(λ) of the wound coil as the coil gives it, as the solver evaluates it, and a plain
 * B-H table lookup (B from H) of the same material.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 6, time = 1)
@Fork(1)
public class SaturatingSpeedBench {
    static final double VOLTS = 24, OHMS = 2, ZENER = 36, OFF = 0.020, END = 0.040, RTOL = 1e-8;
    static final int SAMPLES = 2001;

    static final MagneticCircuit CORE = MagneticCircuit.series(Core.of(mm(80), cm2(1), Materials.SILICON_STEEL), AirGap.of(mm(0.2), cm2(1)));
    private final WoundCoil wound = WoundCoil.of(200, ohm(OHMS), CORE);
    private final SaturatingCoil analytic = new SaturatingCoil(40e-3, 0.5, 2e-3, 4);
    /** The same ODE as the bare run: the silicon steel's core loss, which the circuit would otherwise draw, is left out. */
    private final Circuit tableRun = Drive.dc(V(VOLTS)).into(wound).offAt(ms(20), Clamp.zener(V(ZENER))).tolerance(RTOL).withoutCoreLoss();
    /** The run as a user gets it: the core-loss branch draws the steel's loss (iGSE), a second ODE the bare run does not solve. */
    private final Circuit tableRunWithCoreLoss = Drive.dc(V(VOLTS)).into(wound).offAt(ms(20), Clamp.zener(V(ZENER))).tolerance(RTOL);
    private final Circuit analyticRun = Drive.dc(V(12)).into(analytic).offAt(ms(20), Clamp.zener(V(24))).tolerance(RTOL);
    private final MagneticMaterial steel = Materials.SILICON_STEEL;
    final LoadProbe solverKernel = LoadProbe.of(wound);
    private final double lamMax = wound.fluxLinkageAt(VOLTS / OHMS);
    private double x = 0.01;

    @Benchmark
    public Transient libraryTable() {
        return tableRun.simulate(ms(40));
    }

    @Benchmark
    public Transient libraryTableWithCoreLoss() {
        return tableRunWithCoreLoss.simulate(ms(40));
    }

    @Benchmark
    public double[] bareTable() {
        return bare(wound, VOLTS, OHMS, ZENER);
    }

    @Benchmark
    public Transient libraryAnalytic() {
        return analyticRun.simulate(ms(40));
    }

    @Benchmark
    public double[] bareAnalytic() {
        return bare(analytic, 12, 4, 24);
    }

    /** i(λ) as the wound coil gives it (WoundCoil.currentAt: circuit, core and gap, B-H inverse), λ over 1-99 % of the run's range. */
    @Benchmark
    public double currentOfFluxCoil() {
        x = x > 0.99 ? 0.01 : x + 0.0137;
        return wound.currentAt(x * lamMax);
    }

    /** i(λ) as the solver evaluates it at each stage of a step, for the same λ. */
    @Benchmark
    public double currentOfFluxSolver() {
        x = x > 0.99 ? 0.01 : x + 0.0137;
        return solverKernel.currentAt(x * lamMax);
    }

    /** A plain table lookup: B from H in the material's B-H table (search and one cubic), H over the table. */
    @Benchmark
    public double tableLookup() {
        x = x > 0.99 ? 0.01 : x + 0.0137;
        return steel.fluxDensityAt(x * 20_000);
    }

    /**
     * The bare integrator: returns the recorded current and λ at the 2,001 sample times, side by side.
     * Tolerances as the library sets them for λ: absolute rtol·(dλ/di)·V/R, the longest step two
     * local time constants (dλ/di)/R at V/R.
     */
    static double[] bare(Coil coil, double v, double r, double vz) {
        double iRef = v / r;
        double lInc = Math.min(coil.inductance().si(), coil.incrementalInductanceAt(iRef));
        double abs = RTOL * lInc * iRef;
        double maxStep = Math.min(END, 2 * lInc / r);
        double[] out = new double[2 * SAMPLES];
        double dt = END / (SAMPLES - 1);
        int[] next = {0};
        double[] src = {v};
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            public int getDimension() { return 1; }
            public void computeDerivatives(double t, double[] y, double[] d) { d[0] = src[0] - r * coil.currentAt(y[0]); }
        };
        StepHandler rec = new StepHandler() {
            public void init(double t0, double[] y0, double t) {}
            public void handleStep(StepInterpolator in, boolean last) {
                double tEnd = in.getCurrentTime();
                for (int k = next[0]; k < SAMPLES && (k == SAMPLES - 1 ? END : k * dt) <= tEnd; k++) {
                    in.setInterpolatedTime(k == SAMPLES - 1 ? END : k * dt);
                    double lam = in.getInterpolatedState()[0];
                    out[2 * k] = coil.currentAt(lam);
                    out[2 * k + 1] = lam;
                    next[0] = k + 1;
                }
            }
        };
        double[] y = {0};
        DormandPrince853Integrator on = new DormandPrince853Integrator(1e-14 * END, maxStep, abs, RTOL);
        on.addStepHandler(rec);
        on.integrate(ode, 0, y, OFF, y);
        // switch open: the zener and its diode (0.7 V) across the coil, until the current reaches zero
        src[0] = -(vz + 0.7);
        DormandPrince853Integrator off = new DormandPrince853Integrator(1e-14 * END, maxStep, abs, RTOL);
        off.addStepHandler(rec);
        off.addEventHandler(new EventHandler() {
            public void init(double t0, double[] y0, double t) {}
            public double g(double t, double[] s) { return coil.currentAt(s[0]); }
            public Action eventOccurred(double t, double[] s, boolean increasing) { return increasing ? Action.CONTINUE : Action.STOP; }
            public void resetState(double t, double[] s) {}
        }, (END - OFF) / 8, 1e-12 * END, 200);
        off.integrate(ode, OFF, y, END, y);
        for (int k = next[0]; k < SAMPLES; k++) {
            out[2 * k] = 0; // the open coil: no current, no flux linkage
            out[2 * k + 1] = 0;
        }
        return out;
    }
}
