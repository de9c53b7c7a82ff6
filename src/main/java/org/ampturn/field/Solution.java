package org.ampturn.field;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;

/**
 * A solved field: the vector potential A_φ at every node and what follows from it. Flux density
 * {@code B_r = −∂A/∂z}, {@code B_z = ∂A/∂r + A/r} (per triangle the mean of its three quadrature
 * points; at a point from the triangle holding it, on the axis {@code B_z = 2∂A/∂r}); flux lines
 * are the contours of r·A (2π·r·A is the flux through the circle of radius r). Flux linkage of a winding is N times the mean of 2πψ over its section; stored
 * energy {@code W = ∫∫∫(∫₀^B H dB) dV} and co-energy {@code W' = Σ λ·I − W}.
 */
public final class Solution {
    private final Fem.Model model;
    private final double[] psi;
    private final double[] br, bz;
    private final int iterations;
    private final double residual;
    private final boolean converged;
    private LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> factor; // of the tangent, made on first use when null
    private final DMatrixSparseCSC tangent; // the tangent at the solution while it is not factored
    private final double energy;
    private final double[] amps; // winding currents of this solve (the model may be reused at other currents)

    Solution(Fem.Model model, double[] psi, int iterations, double residual, LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> factor, boolean converged) {
        this(model, psi, iterations, residual, factor, null, converged);
    }

    /** A solution whose tangent is factored when an incremental inductance is first asked for. */
    Solution(Fem.Model model, double[] psi, int iterations, double residual, DMatrixSparseCSC tangent, boolean converged) {
        this(model, psi, iterations, residual, null, tangent, converged);
    }

    private Solution(Fem.Model model, double[] psi, int iterations, double residual, LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> factor,
                     DMatrixSparseCSC tangent, boolean converged) {
        this.tangent = tangent;
        this.model = model;
        this.psi = psi;
        this.iterations = iterations;
        this.residual = residual;
        this.factor = factor;
        this.converged = converged;
        this.amps = model.amps.clone();
        br = new double[model.ne];
        bz = new double[model.ne];
        double[] bq = new double[3 * model.ne];
        double peak = 0;
        for (int e = 0; e < model.ne; e++) {
            int o = 3 * e;
            double p0 = psi[model.tri[o]], p1 = psi[model.tri[o + 1]], p2 = psi[model.tri[o + 2]];
            for (int q = 0; q < 3; q++) {
                int g = 18 * e + 6 * q;
                double brq = model.gq[g] * p0 + model.gq[g + 1] * p1 + model.gq[g + 2] * p2;
                double bzq = model.gq[g + 3] * p0 + model.gq[g + 4] * p1 + model.gq[g + 5] * p2;
                br[e] += brq / 3;
                bz[e] += bzq / 3;
                bq[3 * e + q] = Math.hypot(brq, bzq);
                if (model.mat[e] != null) peak = Math.max(peak, bq[3 * e + q]);
            }
        }
        java.util.Map<MagneticMaterial, double[]> tables = new java.util.IdentityHashMap<>();
        final double top = peak;
        double w = 0;
        for (int e = 0; e < model.ne; e++) {
            for (int q = 0; q < 3; q++) {
                double b = bq[3 * e + q];
                double dens;
                if (model.mat[e] == null) dens = 0.5 * model.nu0[e] * b * b;
                else dens = lookup(tables.computeIfAbsent(model.mat[e], m -> energyTable(m, top)), top, b);
                w += model.wq[3 * e + q] * dens;
            }
        }
        energy = w;
    }

    static final int TABLE = 4096;

    /** ∫₀^B H dB (J/m³) on TABLE steps from 0 to {@code peak} (trapezoid rule on the material's H(B)). */
    static double[] energyTable(MagneticMaterial m, double peak) {
        double[] t = new double[TABLE + 1];
        double step = peak / TABLE, prev = 0;
        for (int k = 1; k <= TABLE; k++) {
            double h = m.fieldAt(k * step);
            t[k] = t[k - 1] + 0.5 * (prev + h) * step;
            prev = h;
        }
        return t;
    }

    private static double lookup(double[] t, double peak, double b) {
        if (peak == 0) return 0;
        double u = b / peak * TABLE;
        int k = Math.min(TABLE - 1, (int) u);
        return t[k] + (u - k) * (t[k + 1] - t[k]);
    }

    public Mesh mesh() { return model.mesh; }
    /** Newton steps taken (1 for a linear problem). */
    public int iterations() { return iterations; }
    /** Final residual ‖Kψ − f‖ / ‖f‖. */
    public double residual() { return residual; }
    public boolean converged() { return converged; }

    private int winding(String name) {
        int k = model.mesh.geometry.indexOf(name);
        for (int w = 0; w < model.windings.length; w++) if (model.windings[w] == k) return w;
        throw Require.fail("region " + Require.quote(name) + " is not a winding; flux linkage and inductance belong to windings");
    }

    private String onlyWinding() {
        if (model.windings.length != 1) throw Require.fail("the geometry has " + model.windings.length + " windings; name the one you mean");
        return model.mesh.geometry.regions().get(model.windings[0]).name();
    }

    double fluxLinkageAt(int w) {
        double s = 0;
        double[] wt = model.weight[w];
        for (int n = 0; n < psi.length; n++) s += wt[n] * psi[n];
        return s;
    }

    /** Flux linkage of winding {@code name} (Wb). */
    public Quantity fluxLinkage(String name) {
        return Quantity.of(fluxLinkageAt(winding(name)), Dimension.FLUX);
    }

    /** Flux linkage of the only winding. */
    public Quantity fluxLinkage() { return fluxLinkage(onlyWinding()); }

    /** Secant inductance λ/I of winding {@code name} (all currents as given). */
    public Quantity inductance(String name) {
        int w = winding(name);
        if (amps[w] == 0) return incrementalInductance(name);
        return Quantity.of(fluxLinkageAt(w) / amps[w], Dimension.INDUCTANCE);
    }

    public Quantity inductance() { return inductance(onlyWinding()); }

    /**
     * The factor by which the inductance of winding {@code name} exceeds N²/R for a gap reluctance
     * {@code gapReluctance} (for a gap of length g and face area A, R = g/(μ0·A); for gaps in series,
     * their sum): the fringing factor the field finds, with any leakage the winding sees. Secant
     * inductance at the solved current.
     */
    public double fringingFactor(String name, Quantity gapReluctance) {
        double r = Require.positive("gap reluctance", gapReluctance, Dimension.RELUCTANCE);
        int w = winding(name);
        double n = model.mesh.geometry.regions().get(model.windings[w]).turns();
        return Require.result("fringing factor of " + Require.quote(name), inductance(name).si() * r / (n * n));
    }

    /** {@link #fringingFactor(String, Quantity)} of the only winding. */
    public double fringingFactor(Quantity gapReluctance) { return fringingFactor(onlyWinding(), gapReluctance); }

    /** Incremental inductance dλ/dI of winding {@code name} at this operating point (the tangent system solved once more). */
    public Quantity incrementalInductance(String name) {
        return Quantity.of(incrementalAt(winding(name)), Dimension.INDUCTANCE);
    }

    public Quantity incrementalInductance() { return incrementalInductance(onlyWinding()); }

    private synchronized LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> factor() {
        if (factor == null) {
            LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> chol = LinearSolverFactory_DSCC.cholesky(FillReducing.NONE);
            if (!chol.setA(tangent.copy())) throw Require.fail("field solution: the tangent stiffness is not positive definite; no incremental inductance");
            factor = chol;
        }
        return factor;
    }

    double incrementalAt(int w) {
        int neq = model.neq;
        DMatrixRMaj rhs = new DMatrixRMaj(neq, 1), x = new DMatrixRMaj(neq, 1);
        double[] wt = model.weight[w];
        boolean any = false;
        for (int n = 0; n < wt.length; n++) if (model.eq[n] >= 0) { rhs.data[model.eq[n]] = wt[n]; any |= wt[n] != 0; }
        if (!any) return 0;
        factor().solve(rhs, x);
        double s = 0;
        for (int n = 0; n < wt.length; n++) if (model.eq[n] >= 0) s += wt[n] * x.data[model.eq[n]];
        return s;
    }

    /** Stored magnetic energy (J). */
    public Quantity energy() { return Quantity.of(energy, Dimension.ENERGY); }
    double energyJ() { return energy; }

    /** Co-energy Σ λ·I − W (J); equal to the energy when every material is linear. */
    public Quantity coEnergy() { return Quantity.of(coEnergyJ(), Dimension.ENERGY); }

    double coEnergyJ() {
        double s = 0;
        for (int w = 0; w < model.windings.length; w++) s += fluxLinkageAt(w) * amps[w];
        return s - energy;
    }

    /** Flux density (|B|, B_r, B_z in T) at (r, z) in metres. */
    public double[] fluxDensityAt(double r, double z) {
        double[] gr = model.mesh.r, gz = model.mesh.z;
        Require.between("r (m)", r, 0, gr[gr.length - 1]);
        Require.between("z (m)", z, gz[0], gz[gz.length - 1]);
        int i = Mesh.cellOf(gr, r), j = Mesh.cellOf(gz, z);
        int nr = model.nr;
        double u = (r - gr[i]) / (gr[i + 1] - gr[i]), v = (z - gz[j]) / (gz[j + 1] - gz[j]);
        boolean lower = u >= v && !(i == 0 && r < 1e-6 * gr[1]);
        int e = 2 * (j * (nr - 1) + i) + (lower ? 0 : 1);
        int o = 3 * e;
        double d2 = 2 * model.area[e];
        double pot = 0, dr = 0, dz = 0;
        for (int a = 0; a < 3; a++) {
            int n = model.tri[o + a];
            double rn = gr[n % nr], zn = gz[n / nr];
            double val = psi[n];
            dr += model.b[o + a] * val / d2;
            dz += model.c[o + a] * val / d2;
        }
        // linear A in the triangle: A(r, z) = A(node 0) + dr·(r − r0) + dz·(z − z0)
        int n0 = model.tri[o];
        pot = psi[n0] + dr * (r - gr[n0 % nr]) + dz * (z - gz[n0 / nr]);
        double over = r < 1e-6 * gr[1] ? dr : pot / r; // on the axis A/r → ∂A/∂r (A = 0 there)
        double brv = -dz, bzv = dr + over;
        return new double[] {Math.hypot(brv, bzv), brv, bzv};
    }

    /** |B| at (r, z). */
    public Quantity fluxDensity(Quantity r, Quantity z) {
        return Quantity.of(fluxDensityAt(Require.si("r", r, Dimension.LENGTH), Require.si("z", z, Dimension.LENGTH))[0], Dimension.FLUX_DENSITY);
    }

    /** Axial component B_z at (r, z). */
    public Quantity axialFluxDensity(Quantity r, Quantity z) {
        return Quantity.of(fluxDensityAt(Require.si("r", r, Dimension.LENGTH), Require.si("z", z, Dimension.LENGTH))[2], Dimension.FLUX_DENSITY);
    }

    /** Largest |B| in any triangle of region {@code name}. */
    public Quantity peakFluxDensity(String name) {
        return Quantity.of(peakAt(model.mesh.geometry.indexOf(name)), Dimension.FLUX_DENSITY);
    }

    double peakAt(int k) {
        double m = 0;
        for (int e = 0; e < model.ne; e++) if (model.mesh.region[e] == k) m = Math.max(m, Math.hypot(br[e], bz[e]));
        return m;
    }

    /** Per magnetic region: its peak |B| against its material's saturation flux density, on one line. */
    public String peaks() {
        List<String> out = new ArrayList<>();
        List<Region> regions = model.mesh.geometry.regions();
        for (int k = 0; k < regions.size(); k++) {
            Region g = regions.get(k);
            if (!g.isMagnetic()) continue;
            double p = peakAt(k), sat = g.material().saturationFluxDensity().si();
            out.add(g.name() + " " + Quantity.of(p, Dimension.FLUX_DENSITY) + (Double.isFinite(sat)
                    ? (p >= sat ? " (saturated: " : " (below ") + g.material().name() + " saturation " + g.material().saturationFluxDensity() + ")" : ""));
        }
        return out.isEmpty() ? "no magnetic regions" : String.join("; ", out);
    }

    /**
     * Axial force on region {@code name} (N, positive toward +z) from the Maxwell stress tensor in the
     * air around it: {@code F = −∫ T·∇g dV} with g = 1 on the part's nodes and 0 elsewhere, i.e. the
     * surface integral of T·n averaged over the closed paths across the first layer of air cells
     * around the part (the "eggshell" form; Henrotte, Deliège and Hameyer, COMPEL 23(4), 2004, from
     * memory). T_zr = B_z B_r/μ0, T_zz = (B_z² − B_r²)/(2μ0).
     */
    public Quantity maxwellForce(String name) {
        return Quantity.of(maxwellForceAt(model.mesh.geometry.indexOf(name)), Dimension.FORCE);
    }

    double maxwellForceAt(int k) {
        double[] g = new double[psi.length];
        for (int e = 0; e < model.ne; e++) if (model.mesh.region[e] == k) for (int a = 0; a < 3; a++) g[model.tri[3 * e + a]] = 1;
        List<Region> regions = model.mesh.geometry.regions();
        double f = 0;
        double mu0 = MagneticMaterial.MU0;
        for (int e = 0; e < model.ne; e++) {
            int o = 3 * e;
            double g0 = g[model.tri[o]], g1 = g[model.tri[o + 1]], g2 = g[model.tri[o + 2]];
            if (model.mesh.region[e] == k || g0 == g1 && g1 == g2) continue;
            int reg = model.mesh.region[e];
            if (reg >= 0 && (regions.get(reg).isMagnetic() || regions.get(reg).isWinding())) {
                throw Require.fail("region " + Require.quote(regions.get(k).name()) + " touches region " + Require.quote(regions.get(reg).name())
                        + "; leave air around a part whose force is wanted");
            }
            double d2 = 2 * model.area[e];
            double dgr = (model.b[o] * g0 + model.b[o + 1] * g1 + model.b[o + 2] * g2) / d2;
            double dgz = (model.c[o] * g0 + model.c[o + 1] * g1 + model.c[o + 2] * g2) / d2;
            double p0 = psi[model.tri[o]], p1 = psi[model.tri[o + 1]], p2 = psi[model.tri[o + 2]];
            for (int q = 0; q < 3; q++) {
                int gi = 18 * e + 6 * q;
                double brq = model.gq[gi] * p0 + model.gq[gi + 1] * p1 + model.gq[gi + 2] * p2;
                double bzq = model.gq[gi + 3] * p0 + model.gq[gi + 4] * p1 + model.gq[gi + 5] * p2;
                double tzr = bzq * brq / mu0, tzz = (bzq * bzq - brq * brq) / (2 * mu0);
                f -= (tzr * dgr + tzz * dgz) * model.wq[3 * e + q];
            }
        }
        return f;
    }

    /** A_φ at every node (a copy). */
    double[] potential() { return psi.clone(); }

    /** The flux function r·A_φ (Wb/rad) at every node, row by row in z (flux lines are its contours). */
    public double[] fluxFunction() {
        double[] out = new double[psi.length];
        for (int n = 0; n < psi.length; n++) out[n] = model.mesh.r[n % model.nr] * psi[n];
        return out;
    }
    double[] brPerTriangle() { return br.clone(); }
    double[] bzPerTriangle() { return bz.clone(); }

    @Override
    public String toString() {
        StringBuilder s = new StringBuilder("field solution on ").append(String.format("%,d", model.mesh.nodes())).append(" nodes");
        if (model.windings.length == 1) s.append(": λ ").append(fluxLinkageAt(0) == 0 ? "0" : Quantity.of(fluxLinkageAt(0), Dimension.FLUX).toString())
                .append(", L ").append(inductance(onlyWinding()));
        s.append(", energy ").append(energy());
        s.append(", ").append(iterations).append(iterations == 1 ? " step" : " steps").append(", residual ").append(Require.show(residual));
        return s.toString();
    }
}
