package org.ladderkin.material;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.ladderkin.units.PhysicalConstants;

/**
 * What the library knows about pairs of materials grown one on another: the bulk band edges on a common (vacuum)
 * scale, from which a core/shell's band alignment follows, and the thickness of one monolayer, from the lattice
 * constant. Kept beside the material files rather than in them because only shell growth needs them; every value
 * carries its source like the material files' values.
 */
public final class Heterostructure {

    /**
     * A band offset below this leaves that carrier spread over core and shell (quasi-type II): it is of the order of
     * the confinement energies of few-nanometre dots, so the carrier's kinetic energy overcomes the step. An assumption
     * (common practice, no source), stated in docs/physics.md.
     */
    public static final double QUASI_OFFSET_J = 0.3 * PhysicalConstants.ELECTRONVOLT_J;

    /** Bulk band-edge constants of one material. */
    public record Edges(Sourced electronAffinityJ, Sourced monolayerM) {
    }

    private static final String AFFINITY = "from memory: bulk electron affinity as commonly tabulated for core/shell "
            + "band diagrams; not read in a source";

    // Monolayer: half the wurtzite c axis, or the {111} spacing a/√3 of zinc blende, the growth directions of
    // colloidal shells; both from recalled lattice constants.
    private static final Map<String, Edges> EDGES = Map.of(
            "CdSe", new Edges(ev(4.95, AFFINITY), nm(0.350, "derived: c/2 of wurtzite CdSe, c = 0.701 nm (from memory)")),
            "CdS", new Edges(ev(4.79, AFFINITY), nm(0.336, "derived: c/2 of wurtzite CdS, c = 0.6714 nm (from memory)")),
            "ZnS", new Edges(ev(3.90, AFFINITY), nm(0.312, "derived: a/√3 of zinc-blende ZnS, a = 0.5409 nm (from memory)")),
            "ZnSe", new Edges(ev(4.09, AFFINITY), nm(0.327, "derived: a/√3 of zinc-blende ZnSe, a = 0.5668 nm (from memory)")),
            "CdTe", new Edges(ev(4.28, AFFINITY), nm(0.374, "derived: a/√3 of zinc-blende CdTe, a = 0.6481 nm (from memory)")),
            "InP", new Edges(ev(4.38, AFFINITY), nm(0.339, "derived: a/√3 of zinc-blende InP, a = 0.5869 nm (from memory)")));

    private Heterostructure() {
    }

    private static Sourced ev(double v, String source) {
        return new Sourced(v * PhysicalConstants.ELECTRONVOLT_J, source);
    }

    private static Sourced nm(double v, String source) {
        return new Sourced(v * 1e-9, source);
    }

    /** The band-edge constants of a material, if the library has them. */
    public static Optional<Edges> edges(Material m) {
        return Optional.ofNullable(EDGES.get(m.key()));
    }

    /** Thickness of one monolayer of {@code m} (m), if the library has its lattice constant. */
    public static Optional<Sourced> monolayer(Material m) {
        return edges(m).map(Edges::monolayerM);
    }

    /** An alignment with the words that justify it. */
    public record Derived(BandAlignment alignment, String basis) {
    }

    /**
     * The band alignment of {@code core} covered by {@code shell} from the bulk band edges (conduction edge −χ,
     * valence edge −χ − E_g), or empty when either material's edges or gap are missing, or when the shell's gap lies
     * inside the core's (both carriers in the shell, which this library does not model).
     */
    public static Optional<Derived> alignment(Material core, Material shell) {
        Optional<Edges> c = edges(core);
        Optional<Edges> s = edges(shell);
        if (c.isEmpty() || s.isEmpty() || !core.bulkGapJ().known() || !shell.bulkGapJ().known()) {
            return Optional.empty();
        }
        double cbCore = -c.get().electronAffinityJ().value();
        double cbShell = -s.get().electronAffinityJ().value();
        double vbCore = cbCore - core.bulkGapJ().value();
        double vbShell = cbShell - shell.bulkGapJ().value();
        double electronStep = cbShell - cbCore;  // > 0: the shell repels the electron
        double holeStep = vbCore - vbShell;      // > 0: the shell repels the hole
        BandAlignment a;
        if (electronStep > 0 && holeStep > 0) {
            a = electronStep < QUASI_OFFSET_J || holeStep < QUASI_OFFSET_J ? BandAlignment.QUASI_TYPE_II : BandAlignment.TYPE_I;
        } else if (electronStep < 0 && holeStep < 0) {
            return Optional.empty();
        } else {
            // the step that pulls one carrier into the shell decides how far it leaves the core
            double pull = Math.min(electronStep, holeStep);
            a = -pull < QUASI_OFFSET_J ? BandAlignment.QUASI_TYPE_II : BandAlignment.TYPE_II;
        }
        String basis = String.format(Locale.ROOT, "bulk band edges: conduction-band step %+.2f eV, valence-band step %+.2f eV "
                + "(positive confines the carrier to the core; below %.1f eV counts as spread); electron affinities %s; "
                + "gaps from the material files", electronStep / PhysicalConstants.ELECTRONVOLT_J,
                holeStep / PhysicalConstants.ELECTRONVOLT_J, QUASI_OFFSET_J / PhysicalConstants.ELECTRONVOLT_J, AFFINITY);
        return Optional.of(new Derived(a, basis));
    }
}
