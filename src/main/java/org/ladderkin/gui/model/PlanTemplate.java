package org.ladderkin.gui.model;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.plan.Instrument;

/**
 * The document behind "New": every field of schema {@code ladderkin.plan/1} present and empty, so the forms show
 * every field and mark what still has to be filled in. No invented values.
 */
public final class PlanTemplate {

    private PlanTemplate() {
    }

    /** A fresh blank plan document with one transient-absorption and one TCSPC instrument. */
    public static ObjectNode blank() {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", PlanCodec.SCHEMA + "/" + PlanCodec.VERSION);
        root.put("title", "");
        ObjectNode sample = root.putObject("sample");
        sample.put("name", "");
        sample.put("material", "");
        sample.put("firstExcitonPeak", "");
        ObjectNode absorbance = sample.putObject("absorbance");
        absorbance.put("value", "");
        absorbance.put("at", "first-exciton");
        sample.put("pathLength", "");
        sample.put("matrix", "");
        sample.putObject("refresh").put("mode", "static");
        ObjectNode laser = root.putObject("laser");
        laser.putArray("pumpWavelengths");
        laser.put("repetitionRate", "");
        laser.put("pulseWidth", "");
        laser.putArray("pulseEnergyRange").add("").add("");
        laser.put("pumpRadius", "");
        laser.put("probeRadius", "");
        ArrayNode instruments = root.putArray("instruments");
        ObjectNode ta = instruments.addObject();
        ta.put("kind", Instrument.Kind.TRANSIENT_ABSORPTION.key());
        ta.putArray("delayRange").add("").add("");
        ta.put("noiseFloor", "");
        ta.put("irfFwhm", "");
        ObjectNode tcspc = instruments.addObject();
        tcspc.put("kind", Instrument.Kind.TCSPC.key());
        tcspc.put("timeBin", "");
        tcspc.put("timeRange", "");
        tcspc.put("irfFwhm", "");
        root.putObject("goals").putArray("measure");
        ObjectNode limits = root.putObject("limits");
        limits.put("maxTemperatureRise", "");
        limits.put("maxChargedFraction", "");
        limits.put("maxResidualExcitation", "");
        limits.put("beamTime", "");
        return root;
    }
}
