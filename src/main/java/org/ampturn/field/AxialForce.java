package org.ampturn.field;

import java.util.Arrays;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The axial force on a named part found two ways: the Maxwell stress in the air around it
 * ({@link Solution#maxwellForce}) and virtual work, {@code F = ∂W'/∂z} at constant current from the
 * co-energy at the part moved by ±δ (central difference). Both use one grid: grid lines are added at
 * the part's faces moved by ±δ, so the three solves differ only in which thin cells are the part's,
 * and no re-meshing noise enters the difference (Coulomb, IEEE Trans. Magn. 19(6), 1983, is the
 * classic form of the method, from memory). Positive toward +z.
 */
public final class AxialForce {
    private final String part;
    private final double maxwell;
    private final double virtualWork;
    private final double delta;

    private AxialForce(String part, double maxwell, double virtualWork, double delta) {
        this.part = part;
        this.maxwell = maxwell;
        this.virtualWork = virtualWork;
        this.delta = delta;
    }

    /** The force on region {@code part} of the mesh's geometry, both ways. */
    static AxialForce of(Mesh mesh, String part) {
        Geometry g = mesh.geometry;
        int k = g.indexOf(part);
        Region region = g.regions().get(k);
        if (region.isWinding()) throw Require.fail("region " + Require.quote(part) + " is a winding; ask for the force on a part of iron");
        double[] z = mesh.z;
        double step = Double.POSITIVE_INFINITY;
        double[] faces = Arrays.stream(region.shape().zs()).distinct().toArray();
        for (double f : faces) {
            int j = Arrays.binarySearch(z, f);
            if (j < 0) throw new IllegalStateException("face of " + part + " is not on a grid line");
            if (j > 0) step = Math.min(step, z[j] - z[j - 1]);
            if (j < z.length - 1) step = Math.min(step, z[j + 1] - z[j]);
        }
        double d = 0.25 * step;
        double[] zz = Arrays.copyOf(z, z.length + 2 * faces.length);
        int at = z.length;
        for (double f : faces) {
            zz[at++] = f - d;
            zz[at++] = f + d;
        }
        Arrays.sort(zz);
        Geometry lo = g.movedAt(part, -d), hi = g.movedAt(part, d);
        Solution s0 = Mesh.onGrid(g, mesh.r, zz).solve();
        Solution sLo = Mesh.onGrid(lo, mesh.r, zz).solve();
        Solution sHi = Mesh.onGrid(hi, mesh.r, zz).solve();
        double fm = s0.maxwellForceAt(k);
        double fv = (sHi.coEnergyJ() - sLo.coEnergyJ()) / (2 * d);
        return new AxialForce(part, fm, fv, d);
    }

    public String part() { return part; }
    /** From the Maxwell stress in the air around the part. */
    public Quantity maxwell() { return Quantity.of(maxwell, Dimension.FORCE); }
    /** From the co-energy at the part moved by ±δ. */
    public Quantity virtualWork() { return Quantity.of(virtualWork, Dimension.FORCE); }
    /** The step δ of the virtual-work difference. */
    public Quantity step() { return Quantity.of(delta, Dimension.LENGTH); }
    /** (Maxwell − virtual work) / virtual work. */
    public double difference() {
        return (maxwell - virtualWork) / Math.abs(virtualWork);
    }

    @Override
    public String toString() {
        return "axial force on " + part + ": Maxwell stress " + maxwell() + ", virtual work " + virtualWork() + " (difference "
                + String.format("%+.2f", 100 * difference()) + " %)";
    }
}
