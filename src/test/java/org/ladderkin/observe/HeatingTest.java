package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class HeatingTest {

    // CdSe: density 5.81 g/cm³, Cp 49.41 J/(mol·K) (Ioffe NSM Archive, CdSe thermal properties table);
    // molar mass 112.41 + 78.97 = 191.38 g/mol (IUPAC standard atomic weights) → c = 0.25818 J/(g·K)
    private static final double CDSE_DENSITY = 5810;
    private static final double CDSE_C = 49.41 / 191.38e-3;
    // Toluene: Cp(liquid, 298 K) 157.1 J/(mol·K) (NIST Chemistry WebBook), M = 92.14 g/mol → 1705 J/(kg·K);
    // density 0.8669 g/cm³ at 20 °C (CoolProp 8.0.0, Lemmon & Span 2006 equation of state: 0.866892);
    // conductivity 0.13 W/(m·K) (from memory); boiling point 110.6 °C (PHYSICS.md / CRC)
    private static final ThermalMedium TOLUENE = new ThermalMedium(866.9, 157.1 / 92.14e-3, 0.13, 383.75);

    @Test
    @CheckedAgainst(source = "hand calculation with wurtzite CdSe ρ = 5.81 g/cm³, C°p = 49.41 J/(mol·K) of the Khimicheskaya "
            + "entsiklopediya (Chemical Encyclopedia, Moscow, vol. 2, 1990), entry «кадмия селенид», read in a stored copy: 4 nm sphere V = 3.3510e-26 m³, C = ρcV = 5.0268e-20 J/K; one 3.1 eV photon, no PL: "
            + "ΔT = 4.9666e-19 J / 5.0268e-20 J/K = 9.880 K", kind = CheckedAgainst.Kind.PUBLISHED)
    void oneDotTemperatureJumpMatchesHandCalculation() {
        double photonJ = 3.1 * PhysicalConstants.ELECTRONVOLT_J;
        double q = Heating.heatPerDotJ(1, photonJ, 0, 2.1 * PhysicalConstants.ELECTRONVOLT_J);
        double dT = Heating.dotTemperatureJumpK(q, 4e-9, CDSE_DENSITY, CDSE_C);
        Reference.check("4 nm CdSe dot, one 3.1 eV photon (K)", dT, 9.880, 0.002);
    }

    @Test
    @CheckedAgainst(source = "hand calculation with toluene Cp(liquid) = 157.1 J/(mol·K) (NIST Chemistry WebBook, "
            + "condensed-phase heat capacity table, Grolier et al. 1993) and density 0.8669 g/cm³ at 20 °C (CoolProp "
            + "8.0.0, toluene equation of state of Lemmon & Span 2006, evaluated outside the build: 0.866892): "
            + "1 µM dots = 6.0221e20 m⁻³, 4.9666e-19 J each → 299.10 J/m³; ρc = 1.47808e6 J/(m³·K); ΔT = 2.0236e-4 K",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void perPulseRiseOfTheExcitedVolumeMatchesHandCalculation() {
        double photonJ = 3.1 * PhysicalConstants.ELECTRONVOLT_J;
        double dotsPerM3 = 1e-6 * 1e3 * PhysicalConstants.AVOGADRO_PER_MOL;
        double dT = Heating.perPulseVolumeRiseK(photonJ, dotsPerM3, TOLUENE);
        Reference.checkRelative("1 µM CdSe in toluene, one 3.1 eV photon per dot (K)", dT, 2.0236e-4, 2e-4);
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 IterativeLegendreGaussIntegrator: ∫₀^R (1 − e^{−2r²/w²})/r dr of the "
            + "radial heat equation with a Gaussian source", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void liquidSteadyStateRiseAgreesWithQuadrature() {
        double p = 0.01;
        double w = 100e-6;
        double l = 1e-3;
        double r = 5e-3;
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(32, 1e-13, 1e-15);
        double integral = quad.integrate(1_000_000, x -> x == 0 ? 0 : (1 - Math.exp(-2 * x * x / (w * w))) / x, 0, 4 * w)
                + quad.integrate(1_000_000, x -> (1 - Math.exp(-2 * x * x / (w * w))) / x, 4 * w, r);
        double reference = p / (2 * Math.PI * TOLUENE.conductivityWPerMK() * l) * integral;
        Reference.checkRelative("10 mW absorbed in 1 mm toluene, w = 100 µm, wall at 5 mm (K)",
                Heating.steadyRiseLiquidK(p, w, l, r, TOLUENE), reference, 1e-9);
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 IterativeLegendreGaussIntegrator: surface Gaussian flux 2P/(πw²)"
            + "·e^{−2r²/w²} against the semi-infinite point-source kernel 1/(2πκr)", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void filmOnSubstrateRiseAgreesWithQuadrature() {
        double p = 0.005;
        double w = 50e-6;
        ThermalMedium silica = new ThermalMedium(2200, 740, 1.38, Double.POSITIVE_INFINITY);
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(32, 1e-13, 1e-15);
        double ref = quad.integrate(1_000_000, r -> 2 * p / (Math.PI * w * w) * Math.exp(-2 * r * r / (w * w))
                / (2 * Math.PI * silica.conductivityWPerMK() * r) * 2 * Math.PI * r, 0, 10 * w);
        Reference.checkRelative("5 mW absorbed in a film on fused silica, w = 50 µm (K)",
                Heating.steadyRiseFilmK(p, w, silica), ref, 1e-9);
    }

    @Test
    void einMatchesAcrossItsTwoBranches() {
        assertThat(Heating.ein(1.999999)).isCloseTo(Heating.ein(2.000001), org.assertj.core.data.Offset.offset(2e-6));
        assertThat(Heating.ein(1e-6)).isCloseTo(1e-6, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void nearBoilingIsAFailEvenUnderTheUserLimit() {
        Risk r = Heating.risk("steady-state heating", 4, 380, 50, TOLUENE);
        assertThat(r.verdict()).isEqualTo(Verdict.FAIL);
        assertThat(r.why()).contains("boiling");
        assertThat(Heating.risk("steady-state heating", 1, 295, 5, TOLUENE).verdict()).isEqualTo(Verdict.PASS);
        assertThat(Heating.risk("steady-state heating", 3, 295, 5, TOLUENE).verdict()).isEqualTo(Verdict.WARN);
        assertThat(Heating.risk("steady-state heating", 6, 295, 5, TOLUENE).verdict()).isEqualTo(Verdict.FAIL);
    }

    @Test
    void flowRemovesHeatInProportionToSpeed() {
        double slow = Heating.flowRiseK(0.01, 100e-6, 1e-3, 0.01, TOLUENE);
        double fast = Heating.flowRiseK(0.01, 100e-6, 1e-3, 0.1, TOLUENE);
        assertThat(slow / fast).isCloseTo(10, org.assertj.core.data.Offset.offset(1e-9));
    }

    @Test
    void rejectsNonsense() {
        assertThatThrownBy(() -> new ThermalMedium(-1, 1, 1, 300)).hasMessageContaining("density must be > 0");
        assertThatThrownBy(() -> Heating.dotTemperatureJumpK(1e-19, 0, 5810, 258)).hasMessageContaining("dot diameter");
        assertThatThrownBy(() -> Heating.steadyRiseLiquidK(0.01, 1e-4, 1e-3, 1e-5, TOLUENE)).hasMessageContaining("wall distance");
    }
    @Test
    void heatPerPhotonIsTheExcessOverTheExcitonsItMadeAndNeverNegative() {
        double ev = PhysicalConstants.ELECTRONVOLT_J;
        assertThat(Heating.heatPerAbsorbedPhotonJ(3.1 * ev, 1, 2.0 * ev) / ev).as("one exciton from 3.1 eV (eV)")
                .isCloseTo(1.1, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(Heating.heatPerAbsorbedPhotonJ(5.0 * ev, 2, 2.0 * ev) / ev).as("two excitons from 5.0 eV (eV)")
                .isCloseTo(1.0, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(Heating.heatPerAbsorbedPhotonJ(0.6 * 6 * ev, 3, 1.2 * ev)).as("three excitons at exactly 3·E₁S")
                .isBetween(0.0, 1e-30);
        assertThatThrownBy(() -> Heating.heatPerAbsorbedPhotonJ(3.6 * ev, 2, 2.0 * ev))
                .as("two excitons from 1.8·E₁S").hasMessageContaining("2 excitons per photon need ħω ≥ 2·E₁S")
                .hasMessageContaining("ħω = 1.8·E₁S");
        assertThatThrownBy(() -> Heating.heatPerAbsorbedPhotonJ(5.0 * ev, 3, 2.0 * ev))
                .as("three excitons need 3·E₁S").hasMessageContaining("3 excitons per photon need ħω ≥ 3·E₁S");
        assertThatThrownBy(() -> Heating.heatPerAbsorbedPhotonJ(1.9 * ev, 1, 2.0 * ev))
                .as("a sub-gap photon").hasMessageContaining("below the first exciton");
    }
}
