package org.ladderkin.io;

import java.util.Locale;
import java.util.Optional;
import org.ladderkin.io.json.Node;
import org.ladderkin.material.BandAlignment;
import org.ladderkin.material.Heterostructure;
import org.ladderkin.material.Material;
import org.ladderkin.material.Numbers;
import org.ladderkin.sample.Shell;
import org.ladderkin.units.Dimension;

/**
 * Reads the {@code shell} object of a sample: {@code material}, {@code thickness} (a length) or {@code monolayers},
 * optional {@code alignment}, {@code alloyedInterface}, {@code biexcitonShift} (positive for repulsion),
 * {@code lineWidth} (FWHM) and {@code firstExcitonPeak} (measured on the core/shell). Kept apart from
 * {@link SampleCodec} so that codec stays small.
 */
final class ShellCodec {

    private ShellCodec() {
    }

    static Shell shell(Node n, Material core, MaterialLibrary library) {
        Node materialNode = n.field("material");
        Material shellMaterial;
        try {
            shellMaterial = library.material(materialNode.string());
        } catch (IllegalArgumentException e) {
            throw materialNode.error(InputProblem.BAD_CHOICE, e.getMessage());
        }
        String by = n.oneOf("thickness", "monolayers");
        Node thicknessNode = n.field(by);
        Shell.Thickness thickness;
        if (by.equals("thickness")) {
            thickness = new Shell.Length(thicknessNode.positive(Dimension.LENGTH, null));
        } else {
            double layers = thicknessNode.number();
            if (!(layers > 0)) {
                throw thicknessNode.error(InputProblem.OUT_OF_RANGE, "must be > 0 monolayers, was " + layers);
            }
            thickness = new Shell.Monolayers(layers);
        }
        double knownM = thickness instanceof Shell.Length l ? l.thicknessM()
                : Heterostructure.monolayer(shellMaterial).map(m -> m.value() * ((Shell.Monolayers) thickness).count())
                        .orElse(Double.NaN);
        if (knownM > Shell.MAX_THICKNESS_M) {
            throw thicknessNode.error(InputProblem.OUT_OF_RANGE, String.format(Locale.ROOT, "a %s nm shell is thicker than "
                    + "physically sensible (at most %.0f nm)", Numbers.sig(knownM * 1e9, 3), Shell.MAX_THICKNESS_M * 1e9));
        }
        Optional<BandAlignment> alignment = n.optional("alignment")
                .map(a -> BandAlignment.ofKey(a.choice("type-I", "quasi-type-II", "type-II")));
        boolean alloyed = n.optional("alloyedInterface").map(Node::bool).orElse(false);
        double shift = n.optional("biexcitonShift").map(s -> s.quantity(Dimension.ENERGY, null).si()).orElse(Double.NaN);
        double width = n.optional("lineWidth").map(w -> w.positive(Dimension.ENERGY, null)).orElse(Double.NaN);
        double peak = n.optional("firstExcitonPeak").map(p -> p.positive(Dimension.LENGTH, null)).orElse(Double.NaN);
        n.finish();
        try {
            return Shell.of(core, shellMaterial, thickness, alignment, alloyed, shift, width, peak);
        } catch (IllegalArgumentException e) {
            throw (alignment.isEmpty() && e.getMessage().contains("band edges") ? n : thicknessNode)
                    .error(InputProblem.INVALID_VALUE, e.getMessage());
        }
    }
}
