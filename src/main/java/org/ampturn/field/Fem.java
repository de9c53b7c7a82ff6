package org.ampturn.field;

import java.util.Arrays;
import java.util.List;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Require;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;

/**
 * The finite-element kernel: the azimuthal vector potential A_φ on first-order triangles in the r-z
 * half plane, from the energy functional
 * {@code W(A) = π∫ν[(∂A/∂z)² + (∂A/∂r + A/r)²] r dr dz − 2π∫J A r dr dz}, i.e. the weak form of
 * ∇×(ν∇×A) = J for axisymmetric fields (Silvester and Ferrari, Finite Elements for Electrical
 * Engineers, 3rd ed., Cambridge 1996, the axisymmetric chapter; Jin, The Finite Element Method in
 * Electromagnetics, Wiley; both from memory). Each triangle is integrated with the three-point rule
 * at barycentric (2/3, 1/6, 1/6) (exact for quadratics; Strang and Fix, from memory): its points lie
 * inside the triangle, so A/r is finite even next to the axis, where A = 0. A uniform field
 * (A = B·r/2) is represented exactly. Boundary conditions: A = 0 on the axis and on the outer edges
 * of the truncated domain. Nonlinear iron: Newton-Raphson with ν(B²) at each quadrature point, the
 * tangent {@code Σ_q W_q[ν G_qᵀG_q + 2 dν/d(B²) (G_qᵀB_q)(G_qᵀB_q)ᵀ]} (B_q = G_q·A_e), and, when the
 * full step overshoots, a line search for the least energy along the step (the energy functional is
 * convex for a rising B-H curve, so its slope along the step has one root). The sparse symmetric
 * systems go to EJML's sparse Cholesky, its symbolic factorisation made once per solve; the
 * unknowns are numbered by nested dissection of the grid (George, SIAM J. Numer. Anal. 10, 1973,
 * from memory), which keeps the fill of the factor near n·log n.
 */
final class Fem {
    static final int MAX_NEWTON = 40;
    static final double NEWTON_TOL = 1e-7;
    /** The line search stops where the energy's slope along the step is below this fraction of its start. */
    static final double LINE_TOL = 0.2;

    private Fem() {}

    static Solution solve(Mesh mesh) {
        Fem.Model m = new Model(mesh);
        return m.run();
    }

    static final class Model {
        final Mesh mesh;
        final int nr, nzl, ne;
        final int[] eq;          // equation of each node, -1 for a fixed node
        final int neq;
        final int[] tri;         // 3 nodes per triangle
        final double[] b, c;     // 3 each per triangle
        final double[] area, rbar;
        final double[] gq;       // per triangle and quadrature point: 3 coefficients of B_r, then 3 of B_z
        final double[] wq;       // per triangle and quadrature point: 2π r_q Δ / 3
        final MagneticMaterial[] mat; // per triangle, null for linear
        final double[] nu0;      // linear reluctivity per triangle
        final double[][] weight; // per winding: flux-linkage weights per node
        final int[] windings;    // region index of each winding
        final double[] amps;
        DMatrixSparseCSC k;
        int[] pos;               // 9 per triangle: index into nz_values, -1 when fixed

        Model(Mesh mesh) {
            this.mesh = mesh;
            nr = mesh.nr();
            nzl = mesh.nzLines();
            ne = mesh.triangles();
            List<Region> regions = mesh.geometry.regions();
            eq = new int[nr * nzl];
            Arrays.fill(eq, -1);
            int[] counter = {0};
            dissect(1, nr - 2, 1, nzl - 2, counter);
            neq = counter[0];
            tri = new int[3 * ne];
            b = new double[3 * ne];
            c = new double[3 * ne];
            area = new double[ne];
            rbar = new double[ne];
            gq = new double[18 * ne];
            wq = new double[3 * ne];
            mat = new MagneticMaterial[ne];
            nu0 = new double[ne];
            int nw = 0;
            for (Region g : regions) if (g.isWinding()) nw++;
            windings = new int[nw];
            amps = new double[nw];
            weight = new double[nw][nr * nzl];
            double[] windArea = new double[regions.size()];
            int[] windOf = new int[regions.size()];
            Arrays.fill(windOf, -1);
            for (int k = 0, w = 0; k < regions.size(); k++) {
                if (regions.get(k).isWinding()) {
                    windings[w] = k;
                    amps[w] = regions.get(k).amps();
                    windOf[k] = w++;
                }
            }
            int ncell = nr - 1;
            for (int e = 0; e < ne; e++) {
                int cell = e / 2, i = cell % ncell, j = cell / ncell;
                int p00 = j * nr + i, p10 = p00 + 1, p11 = p00 + nr + 1, p01 = p00 + nr;
                int n0 = p00, n1 = e % 2 == 0 ? p10 : p11, n2 = e % 2 == 0 ? p11 : p01;
                tri[3 * e] = n0;
                tri[3 * e + 1] = n1;
                tri[3 * e + 2] = n2;
                double r0 = rOf(n0), r1 = rOf(n1), r2 = rOf(n2), z0 = zOf(n0), z1 = zOf(n1), z2 = zOf(n2);
                b[3 * e] = z1 - z2;
                b[3 * e + 1] = z2 - z0;
                b[3 * e + 2] = z0 - z1;
                c[3 * e] = r2 - r1;
                c[3 * e + 1] = r0 - r2;
                c[3 * e + 2] = r1 - r0;
                area[e] = 0.5 * ((r1 - r0) * (z2 - z0) - (r2 - r0) * (z1 - z0));
                rbar[e] = (r0 + r1 + r2) / 3;
                double[] rr = {r0, r1, r2};
                for (int q = 0; q < 3; q++) {
                    double rq = 0;
                    for (int a = 0; a < 3; a++) rq += (a == q ? 2.0 / 3 : 1.0 / 6) * rr[a];
                    wq[3 * e + q] = 2 * Math.PI * rq * area[e] / 3;
                    for (int a = 0; a < 3; a++) {
                        gq[18 * e + 6 * q + a] = -c[3 * e + a] / (2 * area[e]);
                        gq[18 * e + 6 * q + 3 + a] = b[3 * e + a] / (2 * area[e]) + (a == q ? 2.0 / 3 : 1.0 / 6) / rq;
                    }
                }
                int reg = mesh.region[e];
                MagneticMaterial m = reg < 0 ? null : regions.get(reg).material();
                nu0[e] = 1 / (MagneticMaterial.MU0 * (m == null ? 1 : m.relativePermeability()));
                mat[e] = m != null && !m.isLinear() ? m : null;
                if (reg >= 0 && windOf[reg] >= 0) windArea[reg] += area[e];
            }
            for (int e = 0; e < ne; e++) {
                int reg = mesh.region[e];
                if (reg < 0 || windOf[reg] < 0) continue;
                Region g = regions.get(reg);
                double dens = g.turns() / windArea[reg];
                for (int q = 0; q < 3; q++) {
                    for (int a = 0; a < 3; a++) weight[windOf[reg]][tri[3 * e + a]] += dens * wq[3 * e + q] * (a == q ? 2.0 / 3 : 1.0 / 6);
                }
            }
            pattern();
        }

        double rOf(int node) { return mesh.r[node % nr]; }
        double zOf(int node) { return mesh.z[node / nr]; }

        /** Nested-dissection numbering of the free nodes in the index box [i0, i1] × [j0, j1]. */
        private void dissect(int i0, int i1, int j0, int j1, int[] counter) {
            if (i0 > i1 || j0 > j1) return;
            int w = i1 - i0 + 1, h = j1 - j0 + 1;
            if (w * h <= 16) {
                for (int j = j0; j <= j1; j++) for (int i = i0; i <= i1; i++) eq[j * nr + i] = counter[0]++;
                return;
            }
            if (w >= h) {
                int m = (i0 + i1) / 2;
                dissect(i0, m - 1, j0, j1, counter);
                dissect(m + 1, i1, j0, j1, counter);
                for (int j = j0; j <= j1; j++) eq[j * nr + m] = counter[0]++;
            } else {
                int m = (j0 + j1) / 2;
                dissect(i0, i1, j0, m - 1, counter);
                dissect(i0, i1, m + 1, j1, counter);
                for (int i = i0; i <= i1; i++) eq[m * nr + i] = counter[0]++;
            }
        }

        /** The compressed-column pattern of the stiffness matrix and each triangle's slots in it. */
        private void pattern() {
            int[][] di = {{0, 0}, {1, 0}, {-1, 0}, {0, 1}, {0, -1}, {1, 1}, {-1, -1}};
            int[] colCount = new int[neq + 1];
            int[] node = new int[neq];
            for (int n = 0; n < eq.length; n++) if (eq[n] >= 0) node[eq[n]] = n;
            int[][] rows = new int[neq][];
            int nnz = 0;
            for (int col = 0; col < neq; col++) {
                int n = node[col], i = n % nr, j = n / nr;
                int[] tmp = new int[7];
                int cnt = 0;
                for (int[] d : di) {
                    int q = eq[(j + d[1]) * nr + i + d[0]];
                    if (q >= 0) tmp[cnt++] = q;
                }
                int[] rr = Arrays.copyOf(tmp, cnt);
                Arrays.sort(rr);
                rows[col] = rr;
                nnz += cnt;
            }
            k = new DMatrixSparseCSC(neq, neq, nnz);
            int at = 0;
            for (int col = 0; col < neq; col++) {
                k.col_idx[col] = at;
                System.arraycopy(rows[col], 0, k.nz_rows, at, rows[col].length);
                at += rows[col].length;
            }
            k.col_idx[neq] = at;
            k.nz_length = at;
            k.indicesSorted = true;
            pos = new int[9 * ne];
            for (int e = 0; e < ne; e++) {
                for (int a = 0; a < 3; a++) {
                    int ra = eq[tri[3 * e + a]];
                    for (int bb = 0; bb < 3; bb++) {
                        int cb = eq[tri[3 * e + bb]];
                        pos[9 * e + 3 * a + bb] = ra < 0 || cb < 0 ? -1 : slot(ra, cb);
                    }
                }
            }
        }

        private int slot(int row, int col) {
            int lo = k.col_idx[col], hi = k.col_idx[col + 1];
            int s = Arrays.binarySearch(k.nz_rows, lo, hi, row);
            if (s < 0) throw new IllegalStateException("stiffness pattern misses (" + row + ", " + col + ")");
            return s;
        }

        double[] load() {
            double[] f = new double[nr * nzl];
            for (int w = 0; w < windings.length; w++) for (int n = 0; n < f.length; n++) f[n] += amps[w] * weight[w][n];
            return f;
        }

        /**
         * Assemble the tangent (into {@code k}) and the residual K(ν)ψ − f (per equation) at ψ; returns
         * the residual's norm. With {@code tangent} false only the residual is computed.
         */
        double assemble(double[] psi, double[] f, double[] res, boolean tangent) {
            if (tangent) Arrays.fill(k.nz_values, 0, k.nz_length, 0);
            Arrays.fill(res, 0);
            for (int n = 0; n < f.length; n++) if (eq[n] >= 0) res[eq[n]] -= f[n];
            double[] ga = new double[3];
            for (int e = 0; e < ne; e++) {
                int o = 3 * e;
                double p0 = psi[tri[o]], p1 = psi[tri[o + 1]], p2 = psi[tri[o + 2]];
                int e0 = eq[tri[o]], e1 = eq[tri[o + 1]], e2 = eq[tri[o + 2]];
                for (int q = 0; q < 3; q++) {
                    int g = 18 * e + 6 * q;
                    double brq = gq[g] * p0 + gq[g + 1] * p1 + gq[g + 2] * p2;
                    double bzq = gq[g + 3] * p0 + gq[g + 4] * p1 + gq[g + 5] * p2;
                    double nu = nu0[e], dnu = 0;
                    if (mat[e] != null) {
                        double bb = Math.sqrt(brq * brq + bzq * bzq);
                        if (bb > 1e-9) {
                            double h = mat[e].fieldAt(bb);
                            nu = h / bb;
                            double hPrime = 1 / (MagneticMaterial.MU0 * mat[e].incrementalPermeabilityAt(h));
                            dnu = (hPrime - nu) / (2 * bb * bb);
                        }
                    }
                    double w = wq[3 * e + q];
                    for (int a = 0; a < 3; a++) ga[a] = gq[g + a] * brq + gq[g + 3 + a] * bzq;
                    if (e0 >= 0) res[e0] += w * nu * ga[0];
                    if (e1 >= 0) res[e1] += w * nu * ga[1];
                    if (e2 >= 0) res[e2] += w * nu * ga[2];
                    if (!tangent) continue;
                    for (int a = 0; a < 3; a++) {
                        for (int qq = 0; qq < 3; qq++) {
                            int slot = pos[9 * e + 3 * a + qq];
                            if (slot < 0) continue;
                            k.nz_values[slot] += w * (nu * (gq[g + a] * gq[g + qq] + gq[g + 3 + a] * gq[g + 3 + qq]) + 2 * dnu * ga[a] * ga[qq]);
                        }
                    }
                }
            }
            double sum = 0;
            for (double v : res) sum += v * v;
            return Math.sqrt(sum);
        }

        /**
         * The step α in (0, 1) where the energy is least along {@code dx}: the root of its slope
         * g(α) = dx·R(ψ + α·dx), rising from {@code g0} &lt; 0 to {@code g1} &gt; 0 (the energy is convex
         * for a rising B-H curve), by regula falsi with the Illinois halving, to {@link #LINE_TOL} of
         * |g0|. Leaves ψ + α·dx in {@code trial} and returns the residual norm there.
         */
        double lineSearch(double[] psi, double[] dx, double g0, double g1, double[] f, double[] res, double[] trial) {
            double a = 0, ga = g0, b = 1, gb = g1, norm = 0;
            int side = 0;
            for (int ls = 0; ls < 8; ls++) {
                double x = (a * gb - b * ga) / (gb - ga);
                for (int n = 0; n < psi.length; n++) if (eq[n] >= 0) trial[n] = psi[n] + x * dx[eq[n]];
                norm = assemble(trial, f, res, false);
                double g = dot(dx, res);
                if (Math.abs(g) < LINE_TOL * -g0) break;
                if (g > 0) {
                    b = x;
                    gb = g;
                    if (side == -1) ga /= 2;
                    side = -1;
                } else {
                    a = x;
                    ga = g;
                    if (side == 1) gb /= 2;
                    side = 1;
                }
            }
            return norm;
        }

        static double dot(double[] a, double[] b) {
            double s = 0;
            for (int i = 0; i < a.length; i++) s += a[i] * b[i];
            return s;
        }

        boolean nonlinear() {
            for (MagneticMaterial m : mat) if (m != null) return true;
            return false;
        }

        Solution run() {
            return run(null);
        }

        /** Solve from {@code start} (a nearby solution, e.g. at a lower current, scaled), or from zero when null. */
        Solution run(double[] start) {
            double[] f = load();
            double fnorm = 0;
            for (int n = 0; n < f.length; n++) if (eq[n] >= 0) fnorm += f[n] * f[n];
            fnorm = Math.sqrt(fnorm);
            double[] psi = start == null ? new double[nr * nzl] : start.clone();
            double[] res = new double[neq];
            LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> chol = LinearSolverFactory_DSCC.cholesky(FillReducing.NONE);
            DMatrixRMaj rhs = new DMatrixRMaj(neq, 1), dx = new DMatrixRMaj(neq, 1);
            boolean nonlinear = nonlinear();
            int it = 0;
            double rel = 0;
            double norm = assemble(psi, f, res, true);
            if (fnorm == 0) {
                if (!chol.setA(k)) throw Require.fail("field solve: the stiffness matrix is not positive definite");
                return new Solution(this, new double[nr * nzl], 0, 0, chol, true);
            }
            while (true) {
                Require.notInterrupted("field solve");
                if (!chol.setA(k)) throw Require.fail("field solve: the stiffness matrix is not positive definite (a region with zero or negative permeability?)");
                chol.setStructureLocked(true);
                for (int q = 0; q < neq; q++) rhs.data[q] = -res[q];
                chol.solve(rhs, dx);
                it++;
                double[] trial = psi.clone();
                for (int n = 0; n < psi.length; n++) if (eq[n] >= 0) trial[n] = psi[n] + dx.data[eq[n]];
                if (!nonlinear) {
                    psi = trial;
                    norm = assemble(psi, f, res, false);
                    rel = norm / fnorm;
                    break;
                }
                // the full step is usually taken: assemble its tangent with its residual at once
                double newNorm = assemble(trial, f, res, true);
                double slope0 = 0, slope1 = dot(dx.data, res);
                for (int q = 0; q < neq; q++) slope0 -= dx.data[q] * rhs.data[q];
                if (slope1 > LINE_TOL * -slope0) {
                    // the energy has passed its least along dx and rises again at the full step: go back to the least
                    lineSearch(psi, dx.data, slope0, slope1, f, res, trial);
                    newNorm = assemble(trial, f, res, true);
                }
                psi = trial;
                norm = newNorm;
                rel = norm / fnorm;
                if (rel < NEWTON_TOL) break;
                if (it >= MAX_NEWTON) {
                    if (rel > 1e-3) throw Require.fail("field solve: Newton did not converge in " + MAX_NEWTON + " steps (relative residual " + Require.show(rel) + "); the iron is driven far beyond its B-H table");
                    break;
                }
            }
            // incremental inductances need the factor of the tangent at the solution: for a linear
            // problem it is the one just used; otherwise the solution keeps the tangent and factors it
            // only when asked (a map never asks)
            if (nonlinear) return new Solution(this, psi, it, rel, k.copy(), rel < NEWTON_TOL);
            return new Solution(this, psi, it, rel, chol, true);
        }
    }
}
