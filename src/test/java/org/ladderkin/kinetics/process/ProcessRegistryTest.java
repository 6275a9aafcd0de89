package org.ladderkin.kinetics.process;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

class ProcessRegistryTest {

    @Test
    void flagsSectionsAndFitNamesAreUnique() {
        Set<String> flags = new HashSet<>();
        Set<String> fitNames = new HashSet<>();
        Set<String> sections = new HashSet<>();
        for (ProcessType<?> t : ProcessRegistry.types()) {
            assertThat(sections.add(t.section())).as(t.section()).isTrue();
            Set<String> keys = new HashSet<>();
            for (ProcessParameter p : t.parameters()) {
                assertThat(keys.add(p.key())).as(t.section() + "." + p.key()).isTrue();
                assertThat(flags.add(p.flag())).as(p.flag()).isTrue();
                assertThat(ProcessRegistry.owner(p)).isSameAs(t);
                if (p.fittable()) {
                    assertThat(fitNames.add(p.fitName())).as(p.fitName()).isTrue();
                }
            }
        }
        assertThat(fitNames).contains("tau-auger2", "tau-rad", "tau-trap", "tau-auger3");
    }

    @Test
    void fittableLifetimesAreListedHeadlineFirst() {
        assertThat(ProcessRegistry.fittable().stream().map(ProcessParameter::fitName))
                .containsExactly("tau-auger2", "tau-rad", "tau-trap", "tau-auger3");
    }

    @Test
    void everyProcessRoundTripsItsLifetimes() {
        LadderModel m = LadderModel.radiativeAndAuger(20e-9, org.ladderkin.kinetics.rate.RadiativeScaling.LINEAR, 40e-12,
                org.ladderkin.kinetics.rate.AugerScaling.PAIRS, 2)
                .with(new TrappingProcess(3e-9)).with(new TriexcitonAugerProcess(9e-12)).with(new CoolingProcess(0.4e-12))
                .with(new RefreshProcess(0.1));
        for (ProcessParameter p : ProcessRegistry.parameters()) {
            if (p.kind() == ParameterKind.LIFETIME && m.has(p) && Double.isFinite(m.seconds(p))) {
                assertThat(m.withSeconds(p, 1.25 * m.seconds(p)).seconds(p)).as(p.key()).isEqualTo(1.25 * m.seconds(p));
            }
        }
        assertThat(m.processes().stream().map(s -> s.type().section()))
                .containsExactly("radiative", "auger", "triexcitonAuger", "trapping", "cooling", "refresh");
        assertThat(m.toModel().hotResolved()).isTrue();
    }
}
