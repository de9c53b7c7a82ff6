package org.ampturn.drive;

import org.ampturn.coil.Coil;

/** The solver's view of a coil (its package-private {@link Load}) for benchmarks in other packages. */
public final class LoadProbe {
    private final Load load;

    private LoadProbe(Load load) {
        this.load = load;
    }

    /** The load of a run of {@code coil}, as the solver makes it. */
    public static LoadProbe of(Coil coil) {
        return new LoadProbe(Load.of(coil));
    }

    /** i(λ) as the solver evaluates it (A at Wb). */
    public double currentAt(double lambda) {
        return load.currentAt(lambda, 0);
    }

    /** Field energy ∫ i dλ (J) at λ (Wb), as the solver records it. */
    public double fieldEnergyAt(double lambda) {
        return load.fieldEnergyAt(lambda, 0);
    }
}
