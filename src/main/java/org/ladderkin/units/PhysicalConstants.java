package org.ladderkin.units;

/**
 * Physical constants in SI units. Each constant names its source on the line that defines it.
 * Since the 2019 redefinition of the SI, h, c, e, N_A and k_B are exact.
 */
public final class PhysicalConstants {

    /** Planck constant h = 6.62607015e-34 J·s (exact, SI 2019; CODATA 2018). */
    public static final double PLANCK_J_S = 6.62607015e-34;

    /** Speed of light in vacuum c = 299 792 458 m/s (exact, SI; CODATA 2018). */
    public static final double SPEED_OF_LIGHT_M_PER_S = 299_792_458.0;

    /** Elementary charge e = 1.602176634e-19 C (exact, SI 2019; CODATA 2018). */
    public static final double ELEMENTARY_CHARGE_C = 1.602176634e-19;

    /** Avogadro constant N_A = 6.02214076e23 1/mol (exact, SI 2019; CODATA 2018). */
    public static final double AVOGADRO_PER_MOL = 6.02214076e23;

    /** Boltzmann constant k_B = 1.380649e-23 J/K (exact, SI 2019; CODATA 2018). */
    public static final double BOLTZMANN_J_PER_K = 1.380649e-23;

    /** One electronvolt in joules, equal to e (exact, SI 2019). */
    public static final double ELECTRONVOLT_J = ELEMENTARY_CHARGE_C;

    /** h·c in J·m, derived from the exact h and c (CODATA 2018: hc = 1239.841984... eV·nm). */
    public static final double HC_J_M = PLANCK_J_S * SPEED_OF_LIGHT_M_PER_S;

    /** Absolute zero offset: 0 °C = 273.15 K (exact, SI definition of the degree Celsius). */
    public static final double CELSIUS_ZERO_K = 273.15;

    private PhysicalConstants() {
    }
}
