package org.ladderkin.gui.model;

import org.ladderkin.plan.PlanFitBasis;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Quantity;

/**
 * Which fitted values go into the plan ("Use fitted values in the plan") and which do not, with the reason. Only
 * values whose meaning in the plan is exactly what the fit measured are written:
 * <ul>
 * <li>τ₂ → {@code model.biexcitonLifetime}: the same biexciton Auger lifetime in both. (Unless the plan gives trion
 * lifetimes, it derives them from τ₂, so they follow the new value; the fit held them at the plan's old ones. Trions
 * only matter through rare Auger ionisation, so the difference stays far below the fit's error.)</li>
 * <li>τ_rad → {@code model.singleExcitonLifetime} only when the plan's PL quantum yield is 1 and trapping was held.
 * The plan's τ₁ is the TOTAL single-exciton lifetime: it splits into radiative QY/τ₁ and trapping (1 − QY)/τ₁.
 * The fit varies the radiative rate alone with trapping held, so τ_rad equals τ₁ only when there is no trapping;
 * otherwise writing it would change τ₁ and, silently, the quantum yield, which a bleach fit cannot see.</li>
 * <li>σ → {@code sample.crossSection.value} and {@code .at} when the traces were given as photon fluences (the scale
 * IS σ, at the traces' pump wavelength or else the plan's chosen one). Pulse energies give ⟨N⟩ per joule, which also
 * holds the spot sizes; ⟨N⟩ given directly gives only a correction factor: neither is σ.</li>
 * </ul>
 *
 * @param edits the plan fields and their new texts, written as one undo step
 * @param notes one line per freed value that is not written, and why; or why nothing is written
 */
public record PushBack(List<Map.Entry<FieldSpec, String>> edits, List<String> notes) {

    public PushBack {
        edits = List.copyOf(edits);
        notes = List.copyOf(notes);
    }

    /** Nothing to write, for {@code reason}. */
    public static PushBack nothing(String reason) {
        return new PushBack(List.of(), List.of(reason));
    }

    /** The field at {@code path} in {@link PlanForms}. */
    static FieldSpec field(String path) {
        List<FieldSpec> all = new ArrayList<>(PlanForms.MODEL);
        all.addAll(PlanForms.SAMPLE);
        return all.stream().filter(f -> f.path().toString().equals(path)).findFirst()
                .orElseThrow(() -> new IllegalStateException("no form field " + path));
    }

    /** What a finished fit writes into the plan it started from. */
    static PushBack of(LadderFit.Outcome outcome, Dataset data, PlanFitBasis basis, Set<LadderParameter> free) {
        List<Map.Entry<FieldSpec, String>> edits = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        var r = outcome.result();
        if (free.contains(LadderParameter.TAU_AUGER2)) {
            r.find("tauAuger2S", -1).filter(e -> !e.fixed()).ifPresent(e -> edits.add(Map.entry(field("model.biexcitonLifetime"),
                    Quantity.formatBest(e.value(), Dimension.TIME, 4))));
        }
        if (free.contains(LadderParameter.TAU_RAD)) {
            ParameterEstimate e = r.estimate("tauRadS");
            if (basis.model().plQuantumYield() == 1 && !free.contains(LadderParameter.TAU_TRAP)) {
                edits.add(Map.entry(field("model.singleExcitonLifetime"), Quantity.formatBest(e.value(), Dimension.TIME, 4)));
            } else {
                notes.add("τ_rad is not written: the plan's τ₁ is the total single-exciton lifetime (radiative and trapping, "
                        + "split by the PL quantum yield " + FitCharts.num(basis.model().plQuantumYield())
                        + "), and the fit changed the radiative part alone");
            }
        }
        if (free.contains(LadderParameter.TAU_TRAP)) {
            notes.add("τ_trap is not written: the plan sets trapping through τ₁ and the PL quantum yield, not as a lifetime");
        }
        if (free.contains(LadderParameter.SCALE)) {
            if (outcome.kind() == Excitation.Kind.PHOTON_FLUENCE_PER_M2) {
                double sigma = r.estimate("crossSectionM2").value();
                edits.add(Map.entry(field("sample.crossSection.value"), String.format(java.util.Locale.ROOT, "%.4g cm²", sigma * 1e4)));
                edits.add(Map.entry(field("sample.crossSection.at"), Quantity.formatBest(pumpWavelengthM(data, basis), Dimension.LENGTH, 4)));
            } else {
                notes.add(outcome.kind() == Excitation.Kind.PULSE_ENERGY_J
                        ? "σ is not written: with pulse energies the fit measures ⟨N⟩ per joule, which also holds the pump and probe "
                        + "spots (give photon fluences to fit σ itself)"
                        : "σ is not written: with ⟨N⟩ given directly the fit measures only a correction factor on it");
            }
        }
        if (edits.isEmpty() && notes.isEmpty()) {
            notes.add("no freed value maps onto a plan field");
        }
        return new PushBack(edits, notes);
    }

    /** The traces' common pump wavelength when their files give one, else the plan's chosen pump wavelength. */
    private static double pumpWavelengthM(Dataset data, PlanFitBasis basis) {
        OptionalDouble first = data.traces().get(0).metadata().photonEnergyJ();
        boolean common = first.isPresent() && data.traces().stream().allMatch(t -> t.metadata().photonEnergyJ().equals(first));
        return common ? Photon.wavelengthM(first.getAsDouble()) : basis.pumpWavelengthM();
    }
}
