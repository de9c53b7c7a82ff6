package org.ampturn.drive;

import static org.ampturn.drive.Solver.*;

import java.util.List;
import java.util.concurrent.CancellationException;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.exception.NumberIsTooSmallException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.AdaptiveStepsizeIntegrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54Integrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * The one adapter to Commons Math: integrates a segment with the Dormand-Prince 8(5,3) embedded
 * Runge-Kutta method (Hairer, Nørsett and Wanner, Solving Ordinary Differential Equations I, 2nd ed.,
 * II.5), with dense output for the samples and event location for the solver's events.
 *
 * <p>With an eddy ladder the leakage mode L0/(R + R1) is far faster than the rest of the run, and
 * an explicit method's step is held by its stability there, not by its accuracy. The Dormand-Prince
 * 5(4) pair (same book, II.5; 6 evaluations a step) is left to its error control, which keeps it
 * near its stability limit (4 to 5 of those time constants a step in the bench's shorted-turn run);
 * the 8(5,3) pair costs 16 evaluations a step with its dense output and had to be held to 4 time
 * constants, beyond which its dense output failed the shorted turn's closed form. So ladder runs
 * use the 5(4) pair, at about a third of the evaluations. Neither is a stiff method.
 */
final class OdeStepper implements Solver.Stepper, FirstOrderDifferentialEquations {
    /** Derivative evaluations allowed for one run before it is declared too stiff to finish. */
    static final int MAX_EVALUATIONS = 4_000_000;

    /** Longest step, in local time constants (dλ/di)/R at the final current. */
    static final double MAX_STEP_PER_TIME_CONSTANT = 2.0;


    private final boolean ladderMethod;

    private final Solver sv;
    private final double rtol;
    private final AdaptiveStepsizeIntegrator integrator;
    private final double minStep;
    private long evaluations;
    private final Sampler sampler = new Sampler();
    private final double[] lastStep = new double[Elec.values().length];
    private long steps;
    private long calls;

    OdeStepper(Solver sv, double rtol) {
        this.sv = sv;
        this.rtol = rtol;
        double[] scale = new double[sv.dim];
        double iRef = Double.isFinite(sv.finalCurrent) ? sv.finalCurrent : sv.vs * sv.tEnd / sv.load.inductance();
        if (sv.drive.scheme == Drive.Scheme.PEAK_AND_HOLD) iRef = Math.max(sv.drive.peakAmps, Math.min(iRef, 10 * sv.drive.peakAmps));
        // the error control on λ must hold the current to rtol·iRef: δi = δλ/(dλ/di), and in a saturated core
        // dλ/di at the final current is far below the small-signal L, so L·iRef alone let the current
        // overshoot V/R by many times rtol
        double lInc = Math.min(sv.load.inductance(), sv.load.incrementalInductanceAt(iRef));
        double rOn = sv.rs + sv.ron + sv.rc;
        double tauInc = rOn > 0 ? lInc / rOn : Double.POSITIVE_INFINITY;
        if (sv.loops > 0) {
            // the ladder's fast modes (L0/(R + R1), the tubes' dλ/di over their loops) are left to the 5(4) pair's
            // error control, which holds its step at its stability limit there; the coil current is (λ − λ1)/L0:
            // the leakage sets how finely λ must be held
            lInc = Math.min(lInc, sv.ladder.leakage);
        }
        double lamRef = Math.max(lInc * iRef, 1e-12);
        double eRef = Math.max(sv.vs * iRef * sv.tEnd, 1e-15);
        scale[LAM] = lamRef;
        scale[VC] = sv.vs + Math.max(sv.v0, 0);
        scale[X] = sv.moves ? sv.load.stroke() : 1;
        scale[V] = sv.moves ? sv.load.stroke() / sv.tEnd : 1;
        // the energy integrals start at zero and grow; a loose absolute floor would let their error pass unseen
        for (int k = ESUP; k <= EMECH; k++) scale[k] = 1e-6 * eRef;
        scale[Q] = iRef * sv.tEnd;
        if (sv.loops > 0) {
            scale[EEDDY] = 1e-6 * eRef;
            for (int k = 0; k < sv.loops; k++) scale[LAD + k] = lamRef;
        }
        if (sv.core != null) scale[sv.ecore] = 1e-6 * eRef;
        if (sv.cp != null) {
            scale[sv.lam2] = lamRef * Math.sqrt(sv.cp.l2 / sv.cp.l1);
            scale[sv.esec] = 1e-6 * eRef;
        }
        if (sv.eHyst >= 0) scale[sv.eHyst] = 1e-6 * eRef;
        double[] abs = new double[sv.dim];
        double[] rel = new double[sv.dim];
        for (int k = 0; k < sv.dim; k++) {
            abs[k] = rtol * scale[k];
            rel[k] = rtol;
        }
        this.minStep = 1e-14 * sv.tEnd;
        // near the steady state of a saturated coil the local time constant is dλ/di / R, far shorter than
        // the small-signal L/R: with longer steps an explicit method sits on its stability limit and its
        // dense output wanders around V/R (above it too, which a first-order circuit cannot do)
        double maxStep = Math.min(sv.tEnd, MAX_STEP_PER_TIME_CONSTANT * tauInc);
        if (sv.sine) maxStep = Math.min(maxStep, 0.125 / sv.drive.frequency); // an eighth of the supply's period
        // a ladder's run is held by the stability of its leakage mode: the cheaper 5(4) pair gets further per evaluation
        this.ladderMethod = sv.loops > 0;
        this.integrator = ladderMethod ? new DormandPrince54Integrator(minStep, Math.max(maxStep, 1e3 * minStep), abs, rel)
                : new DormandPrince853Integrator(minStep, Math.max(maxStep, 1e3 * minStep), abs, rel);
    }

    private int mode() { return sv.elec.ordinal(); }

    long evaluations() { return evaluations; }

    long steps() { return steps; }

    String describe() {
        return (ladderMethod ? "Dormand-Prince 5(4)" : "Dormand-Prince 8(5,3)") + ", relative tolerance " + rtol;
    }

    @Override
    public int getDimension() {
        return sv.dim;
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] yDot) {
        sv.t = t;
        // rejected steps never reach the step handler, so a struggling solve polls here too
        if ((++calls & 255) == 0 && Thread.currentThread().isInterrupted()) {
            throw new CancellationException("transient stopped near t = " + Quantity.of(t, Dimension.TIME) + ": the thread was interrupted");
        }
        sv.derivatives(y, yDot);
    }

    @Override
    public double advance(double t0, double t1, double[] y, List<Ev> evs, int[] fired) {
        fired[0] = -1;
        boolean still = sv.elec == Elec.IDLE && sv.mech != Mech.FREE && sv.loops == 0 && sv.core == null && sv.cp == null;
        if (still || t1 - t0 <= 1e-12 * Math.max(Math.abs(t1), sv.tEnd)) {
            for (int k = sv.nextSample(); k < sv.n && sv.sampleTime(k) <= t1; k++) sv.record(k, y);
            return t1;
        }
        integrator.clearEventHandlers();
        integrator.clearStepHandlers();
        integrator.setMaxEvaluations((int) Math.max(1000, MAX_EVALUATIONS - evaluations));
        integrator.addStepHandler(sampler);
        // start from the last accepted step (segments of a switching drive are alike), else let the integrator estimate one
        integrator.setInitialStepSize(lastStep[mode()] > 0 ? Math.min(lastStep[mode()], t1 - t0) : -1);
        Handler[] hs = new Handler[evs.size()];
        double maxCheck = (t1 - t0) / 8;
        double convergence = Math.max(1e-12 * sv.tEnd, 4 * Math.ulp(t1));
        for (int e = 0; e < hs.length; e++) {
            hs[e] = new Handler(evs.get(e));
            integrator.addEventHandler(hs[e], maxCheck, convergence, 200);
        }
        double tStop;
        try {
            tStop = integrator.integrate(this, t0, y, t1, y);
        } catch (MaxCountExceededException ex) {
            if (!Double.isNaN(sv.nonFiniteLambda)) throw new TransientException(sv.noCurrentMessage(), ex);
            throw new TransientException("the solve needed more than " + MAX_EVALUATIONS + " derivative evaluations and stopped near t = "
                    + Quantity.of(sv.t, Dimension.TIME) + ": the circuit is stiff (very different time constants, e.g. a small snubber "
                    + "capacitor with a large coil) or the tolerance is too tight; loosen .tolerance(..) or change the snubber", ex);
        } catch (NumberIsTooSmallException ex) {
            if (!Double.isNaN(sv.nonFiniteLambda)) throw new TransientException(sv.noCurrentMessage(), ex);
            throw new TransientException("the step size fell below " + Quantity.of(minStep, Dimension.TIME) + " near t = "
                    + Quantity.of(sv.t, Dimension.TIME) + " (current " + Quantity.of(sv.coilCurrent(y), Dimension.CURRENT)
                    + "): the circuit is stiff or the solution diverges", ex);
        } finally {
            evaluations += integrator.getEvaluations();
        }
        for (int e = 0; e < hs.length; e++) {
            if (hs[e].fired) {
                fired[0] = e;
                break;
            }
        }
        return tStop;
    }

    /** Records the grid samples inside each accepted step and observes the step's end. */
    private final class Sampler implements StepHandler {
        @Override
        public void init(double t0, double[] y0, double t) {}

        @Override
        public void handleStep(StepInterpolator in, boolean isLast) {
            double tEnd = in.getCurrentTime();
            if (!isLast) lastStep[mode()] = tEnd - in.getPreviousTime();
            steps++;
            for (int k = sv.nextSample(); k < sv.n && sv.sampleTime(k) <= tEnd; k++) {
                in.setInterpolatedTime(sv.sampleTime(k));
                sv.record(k, in.getInterpolatedState());
            }
            in.setInterpolatedTime(tEnd);
            sv.t = tEnd;
            sv.observe(tEnd, in.getInterpolatedState());
        }
    }

    /** One of the solver's events as a Commons Math switching function; it stops the segment. */
    private final class Handler implements EventHandler {
        final Ev ev;
        boolean fired;

        Handler(Ev ev) {
            this.ev = ev;
        }

        @Override
        public void init(double t0, double[] y0, double t) {}

        @Override
        public double g(double t, double[] y) {
            sv.evalT = t;
            return sv.g(ev, y);
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            if (increasing != (ev.direction > 0)) return Action.CONTINUE;
            if (ev.act == Ev.Act.PROBE) {
                // located exactly and noted; the step goes on, so the solution is the same as without it
                if (Double.isNaN(sv.probeTime)) sv.probeTime = t;
                return Action.CONTINUE;
            }
            fired = true;
            return Action.STOP;
        }

        @Override
        public void resetState(double t, double[] y) {}
    }
}
