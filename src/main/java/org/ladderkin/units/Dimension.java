package org.ladderkin.units;

/**
 * What a quantity measures. Each dimension has one SI unit that every value is stored in;
 * the {@code example} is what an error message suggests when a unit is missing.
 */
public enum Dimension {
    TIME("time", "s", "50 ps"),
    FREQUENCY("frequency", "Hz", "1 kHz"),
    ENERGY("energy", "J", "2.5 µJ"),
    POWER("power", "W", "10 mW"),
    LENGTH("length", "m", "400 nm"),
    AREA("area", "m²", "2e-15 cm²"),
    VOLUME("volume", "m³", "3 mL"),
    ENERGY_FLUENCE("energy fluence", "J/m²", "0.3 mJ/cm²"),
    PHOTON_FLUENCE("photon fluence", "1/m²", "1e14 photons/cm²"),
    TEMPERATURE("temperature", "K", "295 K"),
    CONCENTRATION("concentration", "mol/m³", "2 µM"),
    ABSORBANCE("absorbance", "OD", "0.3 OD"),
    DENSITY("density", "kg/m³", "5.81 g/cm³"),
    SPECIFIC_HEAT("specific heat", "J/(kg·K)", "0.49 J/(g·K)"),
    THERMAL_CONDUCTIVITY("thermal conductivity", "W/(m·K)", "0.13 W/(m·K)"),
    MOLAR_EXTINCTION("molar extinction coefficient", "m²/mol", "1e5 M⁻¹cm⁻¹"),
    VOLUMETRIC_FLOW("volumetric flow rate", "m³/s", "5 mL/min"),
    SPEED("speed", "m/s", "1 mm/s"),
    DIMENSIONLESS("dimensionless number", "", "0.5");

    private final String label;
    private final String siSymbol;
    private final String example;

    Dimension(String label, String siSymbol, String example) {
        this.label = label;
        this.siSymbol = siSymbol;
        this.example = example;
    }

    /** Human name used in messages, e.g. "energy fluence". */
    public String label() {
        return label;
    }

    /** Symbol of the SI unit values are stored in. */
    public String siSymbol() {
        return siSymbol;
    }

    /** A well-formed example quantity, shown when the user wrote none. */
    public String example() {
        return example;
    }
}
