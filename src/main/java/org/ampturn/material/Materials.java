package org.ampturn.material;

import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Generic classes of magnetic material with <b>typical values</b>, for first estimates and demos.
 * They are not any maker's grade: every number here is typical of the class, <b>from memory</b>
 * of the general magnetics literature (e.g. the material chapters of magnetics design handbooks and
 * ASM/IEC descriptions of the classes), and a real design should use the datasheet of the part.
 * Define your own in one line:
 * <pre>{@code
 * var f = MagneticMaterial.linear("my ferrite", 2300, mT(390))
 *         .withCoreLoss(CoreLoss.fromPoint(q("90 kW/m^3"), kHz(100), mT(100), 1.4, 2.6));
 * var s = MagneticMaterial.fromTable("my steel", new double[]{0, 100, 300, 1000, 5000},
 *         new double[]{0, 0.6, 1.1, 1.4, 1.65}, 1.6);
 * }</pre>
 */
public final class Materials {
    private Materials() {}

    /** Air (and any non-magnetic material): μr = 1, never saturates. */
    public static final MagneticMaterial AIR = new LinearMaterial("air", 1, Double.POSITIVE_INFINITY);

    /**
     * MnZn power ferrite, typical: μr 2000, saturation 0.35 T at 100 °C (about 0.47 T at 25 °C);
     * loss about 100 kW/m³ at 100 kHz, 100 mT peak, 100 °C, with α = 1.4, β = 2.5. Typical, from memory.
     */
    public static final MagneticMaterial MNZN_FERRITE = MagneticMaterial.linear("MnZn ferrite (typical)", 2000, Quantity.of(0.35, Dimension.FLUX_DENSITY))
            .withCoreLoss(CoreLoss.fromPoint(Quantity.of(100e3, Dimension.POWER_DENSITY), Quantity.of(100e3, Dimension.FREQUENCY),
                    Quantity.of(0.1, Dimension.FLUX_DENSITY), 1.4, 2.5).withSource("typical MnZn power ferrite at 100 °C, from memory"));

    /** NiZn ferrite, typical: μr 250 (the class spans about 15 to 1500), saturation 0.30 T. Typical, from memory. */
    public static final MagneticMaterial NIZN_FERRITE = MagneticMaterial.linear("NiZn ferrite (typical)", 250, Quantity.of(0.30, Dimension.FLUX_DENSITY));

    /**
     * Powdered iron with distributed gap, typical: effective μr 75, soft saturation taken at 1.0 T;
     * loss about 600 kW/m³ at 100 kHz, 50 mT peak, α = 1.2, β = 2.1 (order of magnitude). Typical, from memory.
     */
    public static final MagneticMaterial POWDERED_IRON = MagneticMaterial.linear("powdered iron (typical)", 75, Quantity.of(1.0, Dimension.FLUX_DENSITY))
            .withCoreLoss(CoreLoss.fromPoint(Quantity.of(600e3, Dimension.POWER_DENSITY), Quantity.of(100e3, Dimension.FREQUENCY),
                    Quantity.of(0.05, Dimension.FLUX_DENSITY), 1.2, 2.1).withSource("typical powdered iron, order of magnitude, from memory"));

    /**
     * Non-oriented silicon steel (about 3 % Si, fully processed laminations 0.35 to 0.5 mm), typical
     * normal magnetisation curve; knee taken at 1.6 T; loss about 2.5 W/kg (19 kW/m³ at 7650 kg/m³)
     * at 50 Hz, 1.5 T, α = 1.4, β = 2.0. Typical, from memory.
     */
    public static final MagneticMaterial SILICON_STEEL = MagneticMaterial.fromTable("silicon steel (typical)",
            new double[] {0, 40, 60, 100, 200, 400, 1000, 2500, 5000, 10000, 20000, 50000},
            new double[] {0, 0.40, 0.70, 1.00, 1.20, 1.32, 1.43, 1.53, 1.62, 1.72, 1.83, 2.00}, 1.6)
            .withCoreLoss(CoreLoss.fromPoint(Quantity.of(19e3, Dimension.POWER_DENSITY), Quantity.of(50, Dimension.FREQUENCY),
                    Quantity.of(1.5, Dimension.FLUX_DENSITY), 1.4, 2.0).withSource("typical non-oriented silicon steel, from memory"));

    /**
     * Low-carbon steel (about 0.1 % C, annealed; solid actuator and relay cores), typical normal
     * magnetisation curve; knee taken at 1.6 T. Solid steel is for DC and slow changes: no core-loss
     * model. Typical, from memory.
     */
    public static final MagneticMaterial LOW_CARBON_STEEL = MagneticMaterial.fromTable("low-carbon steel (typical)",
            new double[] {0, 100, 200, 300, 500, 1000, 2000, 5000, 10000, 20000, 50000, 100000},
            new double[] {0, 0.30, 0.75, 1.00, 1.20, 1.38, 1.50, 1.62, 1.72, 1.85, 2.00, 2.10}, 1.6);

    /**
     * Nickel-iron (about 80 % Ni, annealed), typical normal magnetisation curve: initial μr about
     * 80 000, saturation about 0.75 T. Typical, from memory.
     */
    public static final MagneticMaterial NICKEL_IRON = MagneticMaterial.fromTable("nickel-iron 80 % Ni (typical)",
            new double[] {0, 1, 2, 4, 8, 20, 50, 100, 1000},
            new double[] {0, 0.10, 0.25, 0.50, 0.65, 0.72, 0.75, 0.77, 0.80}, 0.75);

    /** All the generic classes, in the order above. */
    public static List<MagneticMaterial> all() {
        return List.of(AIR, MNZN_FERRITE, NIZN_FERRITE, POWDERED_IRON, SILICON_STEEL, LOW_CARBON_STEEL, NICKEL_IRON);
    }
}
