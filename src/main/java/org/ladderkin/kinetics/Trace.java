package org.ladderkin.kinetics;

/**
 * Signals after a pulse at the given delays.
 *
 * @param delaysS delays after the pulse (s)
 * @param bleach band-edge bleach, normalised to one filled level
 * @param photoluminescencePerS photons per second per dot
 */
public record Trace(double[] delaysS, double[] bleach, double[] photoluminescencePerS) {

    public Trace {
        if (bleach.length != delaysS.length || photoluminescencePerS.length != delaysS.length) {
            throw new IllegalArgumentException("trace columns differ in length");
        }
        delaysS = delaysS.clone();
        bleach = bleach.clone();
        photoluminescencePerS = photoluminescencePerS.clone();
    }

    @Override
    public double[] delaysS() {
        return delaysS.clone();
    }

    @Override
    public double[] bleach() {
        return bleach.clone();
    }

    @Override
    public double[] photoluminescencePerS() {
        return photoluminescencePerS.clone();
    }
}
