package org.ampturn.material;

import org.ampturn.units.Require;
import java.util.Optional;
import org.ampturn.units.Quantity;

/** A material with a core-loss model attached; the B-H relation is the wrapped material's. */
final class LossyMaterial implements MagneticMaterial {
    private final MagneticMaterial base;
    private final CoreLoss loss;

    LossyMaterial(MagneticMaterial base, CoreLoss loss) {
        this.base = base instanceof LossyMaterial l ? l.base : base;
        this.loss = loss;
    }

    @Override public String name() { return base.name(); }
    @Override public double relativePermeability() { return base.relativePermeability(); }
    @Override public Quantity saturationFluxDensity() { return base.saturationFluxDensity(); }
    @Override public double fluxDensityAt(double h) {
        Require.finite("field strength (A/m)", h);
        return Require.result("flux density", base.fluxDensityAt(h));
    }
    @Override public double fieldAt(double b) {
        Require.finite("flux density (T)", b);
        return Require.result("field", base.fieldAt(b));
    }
    @Override public boolean isLinear() { return base.isLinear(); }
    @Override public double incrementalPermeabilityAt(double h) {
        Require.finite("field strength (A/m)", h);
        return Require.result("incremental permeability", base.incrementalPermeabilityAt(h));
    }
    @Override public Optional<CoreLoss> coreLoss() { return Optional.of(loss); }

    @Override
    public String toString() {
        return base + "; " + loss;
    }
}
