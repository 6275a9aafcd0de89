package org.ladderkin.sample;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.ladderkin.material.BandAlignment;
import org.ladderkin.material.Heterostructure;
import org.ladderkin.material.Material;

/**
 * A shell grown on the sample's core, as the user describes it; {@link CoreShell} turns it into the effects on σ, the
 * Auger and radiative lifetimes, the biexciton interaction and the heat capacity.
 *
 * @param material           shell material
 * @param thicknessM         shell thickness (m)
 * @param monolayers         the thickness as given in monolayers, NaN when given as a length
 * @param alignment          band alignment used
 * @param alignmentBasis     where the alignment comes from (the user, or the library's band edges with their source)
 * @param alignmentWarning   a contradiction between the alignment given and the library's band edges, or empty
 * @param alloyedInterface   whether core and shell are graded into each other (changes the Auger volume for type I)
 * @param biexcitonShiftJ    measured biexciton interaction Δ_XX (J), positive for repulsion (biexciton above twice the
 *                           exciton), NaN for the alignment's default
 * @param lineWidthJ         measured FWHM of the band-edge transition (J), NaN for the default
 * @param firstExcitonPeakM  first-exciton peak measured on the core/shell (m), NaN when not measured
 */
public record Shell(Material material, double thicknessM, double monolayers, BandAlignment alignment, String alignmentBasis,
                    String alignmentWarning, boolean alloyedInterface, double biexcitonShiftJ, double lineWidthJ,
                    double firstExcitonPeakM) {

    /**
     * Thickest shell accepted (m). Giant shells reach about 20 monolayers (7 nm); 20 nm of shell is far beyond any
     * colloidal synthesis and far beyond where the core's exciton still sets the band edge (common practice, no source).
     */
    public static final double MAX_THICKNESS_M = 20e-9;

    public Shell {
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(alignment, "alignment");
        Objects.requireNonNull(alignmentBasis, "alignmentBasis");
        Objects.requireNonNull(alignmentWarning, "alignmentWarning");
        if (!(thicknessM > 0) || thicknessM > MAX_THICKNESS_M) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "shell thickness must be in (0, %.0f nm], was %s nm",
                    MAX_THICKNESS_M * 1e9, thicknessM * 1e9));
        }
        if (!Double.isFinite(biexcitonShiftJ) && !Double.isNaN(biexcitonShiftJ)) {
            throw new IllegalArgumentException("biexciton shift must be finite");
        }
        if (!Double.isNaN(lineWidthJ) && !(lineWidthJ > 0 && Double.isFinite(lineWidthJ))) {
            throw new IllegalArgumentException("line width must be > 0");
        }
        if (!Double.isNaN(firstExcitonPeakM) && !(firstExcitonPeakM > 0 && Double.isFinite(firstExcitonPeakM))) {
            throw new IllegalArgumentException("first-exciton peak must be > 0");
        }
    }

    /** How thick the shell is. */
    public sealed interface Thickness permits Length, Monolayers { }

    /** A thickness as a length (m). */
    public record Length(double thicknessM) implements Thickness { }

    /** A thickness in monolayers of the shell material. */
    public record Monolayers(double count) implements Thickness { }

    /**
     * A shell from the user's description: the thickness in metres (monolayers through the library's lattice
     * constant), the alignment from the library's band edges unless given, and a warning when the given alignment
     * contradicts them.
     *
     * @throws IllegalArgumentException when the thickness is in monolayers and the library has no lattice constant for
     *                                  the shell, or when no alignment is given and none can be derived
     */
    public static Shell of(Material core, Material shell, Thickness thickness, Optional<BandAlignment> given,
                           boolean alloyed, double biexcitonShiftJ, double lineWidthJ, double firstExcitonPeakM) {
        double thicknessM;
        double layers = Double.NaN;
        if (thickness instanceof Monolayers ml) {
            if (!(ml.count() > 0)) {
                throw new IllegalArgumentException("monolayers must be > 0, was " + ml.count());
            }
            var one = Heterostructure.monolayer(shell).orElseThrow(() -> new IllegalArgumentException("the library has no "
                    + "lattice constant for " + shell.key() + ": give the thickness as a length (e.g. \"1.5 nm\")"));
            thicknessM = ml.count() * one.value();
            layers = ml.count();
        } else {
            thicknessM = ((Length) thickness).thicknessM();
        }
        Optional<Heterostructure.Derived> derived = Heterostructure.alignment(core, shell);
        BandAlignment alignment;
        String basis;
        String warning = "";
        if (given.isPresent()) {
            alignment = given.get();
            basis = "given in the sample description";
            if (derived.isPresent() && derived.get().alignment() != alignment) {
                warning = String.format(Locale.ROOT, "the alignment given, %s, contradicts the %s that the library's band "
                        + "edges give for %s/%s (%s); the value given is used: check it", alignment.key(),
                        derived.get().alignment().key(), core.key(), shell.key(), derived.get().basis());
            }
        } else if (derived.isPresent()) {
            alignment = derived.get().alignment();
            basis = derived.get().basis();
        } else {
            throw new IllegalArgumentException("the library has no band edges for " + core.key() + "/" + shell.key()
                    + ": give \"alignment\" (type-I, quasi-type-II or type-II)");
        }
        return new Shell(shell, thicknessM, layers, alignment, basis, warning, alloyed, biexcitonShiftJ, lineWidthJ,
                firstExcitonPeakM);
    }
}
