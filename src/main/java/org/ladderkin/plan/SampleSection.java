package org.ladderkin.plan;

/**
 * The sample as a plan file describes it, before the material library resolves it. All values SI.
 *
 * @param name               the user's name for the sample
 * @param material           material key in the library (e.g. "CdSe")
 * @param diameterM          core diameter (m), or NaN when {@code firstPeakM} is given
 * @param firstPeakM         measured first-exciton absorption peak (m), or NaN when {@code diameterM} is given
 * @param sizeDispersion     relative standard deviation of the diameter (0..1)
 * @param absorbanceAtPump   decadic absorbance of the sample at the first pump wavelength (OD)
 * @param pathLengthM        optical path length (m)
 * @param matrix             solvent or film host key (e.g. "toluene")
 * @param refresh            how the excited volume is renewed
 * @param flowRateM3PerS     volumetric flow for a flowing cell (m³/s), 0 otherwise
 */
public record SampleSection(String name, String material, double diameterM, double firstPeakM, double sizeDispersion,
                            double absorbanceAtPump, double pathLengthM, String matrix, Refresh refresh,
                            double flowRateM3PerS) {

    /** How the excited volume is renewed between pulses. */
    public enum Refresh { STATIC, STIRRED, FLOWING }
}
