package org.ampturn.wire;

/**
 * How the turns of a round-wire winding lie on one another.
 *
 * <ul>
 *   <li>{@link #LAYERED}: each turn sits straight above the one below (a square lattice): turn pitch
 *       and layer pitch both equal the overall diameter. This is what a coil wound layer by layer
 *       with a traverse, or by hand, gives in practice and is the default (it is the conservative
 *       choice: fewer turns fit).</li>
 *   <li>{@link #ORTHOCYCLIC}: each layer nests in the grooves of the one below (a hexagonal
 *       lattice): the layer pitch is d·√3/2 and every second layer holds one turn fewer, because it
 *       starts half a pitch in. Machine-wound precision coils reach it; the ideal copper fill of the
 *       lattice is π/(2√3) = 0.907 of the overall-diameter circles (common practice).</li>
 * </ul>
 */
public enum Packing {
    LAYERED("layer-wound"),
    ORTHOCYCLIC("orthocyclic");

    private final String label;

    Packing(String label) { this.label = label; }

    @Override
    public String toString() { return label; }
}
