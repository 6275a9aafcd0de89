package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.plan.Goal;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.LaserSetup;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Quantity;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code ladderkin plan PLAN.json --out DIR}: reads a campaign plan and writes what it resolved. */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = {"Read a campaign plan (schema ladderkin.plan/1), check every input, and write the resolved plan.",
            "Writes DIR/plan-resolved.json (every input in SI and trade units)."})
final class PlanCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PLAN.json", description = "campaign plan file")
    Path planFile;

    @Option(names = "--out", paramLabel = "DIR", description = "output folder (created if missing)")
    Path outDir;

    @Override
    public Integer call() throws Exception {
        PlanInputs plan = PlanCodec.read(planFile);
        PrintWriter out = spec.commandLine().getOut();
        printSummary(plan, out);
        if (outDir != null) {
            Path resolved = outDir.resolve("plan-resolved.json");
            ResolvedJson.write(resolved, resolvedJson(plan));
            out.println("wrote " + resolved);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static void printSummary(PlanInputs plan, PrintWriter out) {
        out.println("Plan: " + plan.title());
        if (!plan.lab().isEmpty()) {
            out.println("Lab:  " + plan.lab());
        }
        out.println();
        SampleReport.print(plan.sample(), out);
        SampleReport.printAdvisories(plan.sample().advisories(), out);
        LaserSetup l = plan.laser();
        out.println("Laser    pump at " + String.join(", ", l.pumpWavelengthsM().stream()
                        .map(w -> fmt(w, Dimension.LENGTH) + " (" + fmt(Photon.energyJ(w), Dimension.ENERGY) + ")").toList())
                + "; " + fmt(l.repetitionRateHz(), Dimension.FREQUENCY) + ", picker ÷" + l.pulsePickerDivisions());
        out.println("         " + fmt(l.pulseFwhmS(), Dimension.TIME) + " pulses, " + fmt(l.minPulseEnergyJ(), Dimension.ENERGY)
                + " to " + fmt(l.maxPulseEnergyJ(), Dimension.ENERGY) + ", pump radius " + fmt(l.pumpRadiusM(), Dimension.LENGTH)
                + ", probe radius " + fmt(l.probeRadiusM(), Dimension.LENGTH) + " (1/e²)");
        for (Instrument i : plan.instruments()) {
            out.println("Detect   " + i.kind().key() + ": " + fmt(i.minDelayS(), Dimension.TIME) + " to " + fmt(i.maxDelayS(), Dimension.TIME)
                    + ", IRF " + fmt(i.irfFwhmS(), Dimension.TIME)
                    + (i.kind() == Instrument.Kind.TRANSIENT_ABSORPTION
                    ? ", noise floor " + String.format(java.util.Locale.ROOT, "%.2g", i.noiseFloor()) + " OD"
                    : ", count rate ≤ " + pct(i.maxCountFraction()) + " of the repetition rate"));
        }
        out.println("Goals    " + String.join("; ", plan.goals().stream().sorted().map(Goal::description).toList()));
        out.println("Limits   temperature rise ≤ " + fmt(plan.limits().maxTemperatureRiseK(), Dimension.TEMPERATURE)
                + ", charged ≤ " + pct(plan.limits().maxChargedFraction())
                + ", residual excitation ≤ " + pct(plan.limits().maxResidualExcitation())
                + ", beam time " + fmt(plan.limits().beamTimeS(), Dimension.TIME));
        out.println();
        out.println("Safety   Class 4 pulsed lasers can blind and burn: follow your institution's laser safety officer and local rules.");
    }

    static ObjectNode resolvedJson(PlanInputs plan) {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", "ladderkin.plan-resolved/1");
        root.put("title", plan.title());
        root.put("lab", plan.lab());
        ObjectNode sample = root.putObject("sample");
        SampleReport.json(plan.sample(), sample);
        SampleReport.advisoriesJson(plan.sample().advisories(), sample.putArray("advisories"));
        LaserSetup l = plan.laser();
        ObjectNode laser = root.putObject("laser");
        ArrayNode wl = laser.putArray("pumpWavelengthsNm");
        ArrayNode ev = laser.putArray("pumpPhotonEnergiesEv");
        for (double w : l.pumpWavelengthsM()) {
            wl.add(w * 1e9);
            ev.add(Photon.energyJ(w) / PhysicalConstants.ELECTRONVOLT_J);
        }
        laser.put("repetitionRateHz", l.repetitionRateHz());
        ArrayNode div = laser.putArray("pulsePickerDivisions");
        l.pulsePickerDivisions().forEach(div::add);
        laser.put("pulseFwhmFs", l.pulseFwhmS() * 1e15);
        laser.put("minPulseEnergyNj", l.minPulseEnergyJ() * 1e9);
        laser.put("maxPulseEnergyNj", l.maxPulseEnergyJ() * 1e9);
        laser.put("pumpRadiusUm", l.pumpRadiusM() * 1e6);
        laser.put("probeRadiusUm", l.probeRadiusM() * 1e6);
        ArrayNode inst = root.putArray("instruments");
        for (Instrument i : plan.instruments()) {
            ObjectNode o = inst.addObject();
            o.put("kind", i.kind().key());
            o.put("minDelayPs", i.minDelayS() * 1e12);
            o.put("maxDelayPs", i.maxDelayS() * 1e12);
            o.put("irfFwhmPs", i.irfFwhmS() * 1e12);
            if (i.kind() == Instrument.Kind.TRANSIENT_ABSORPTION) {
                o.put("noiseFloorOd", i.noiseFloor());
            } else {
                o.put("maxCountFraction", i.maxCountFraction());
            }
        }
        ObjectNode goals = root.putObject("goals");
        ArrayNode measure = goals.putArray("measure");
        plan.goals().stream().sorted().forEach(g -> measure.add(g.key()));
        ArrayNode cm = goals.putArray("multiplicationPhotonEnergiesEv");
        plan.multiplicationPhotonEnergiesJ().forEach(e -> cm.add(e / PhysicalConstants.ELECTRONVOLT_J));
        ObjectNode limits = root.putObject("limits");
        limits.put("maxTemperatureRiseK", plan.limits().maxTemperatureRiseK());
        limits.put("maxChargedFraction", plan.limits().maxChargedFraction());
        limits.put("maxResidualExcitation", plan.limits().maxResidualExcitation());
        limits.put("beamTimeH", plan.limits().beamTimeS() / 3600);
        return root;
    }

    private static String fmt(double si, Dimension d) {
        return Quantity.formatBest(si, d, 4);
    }

    private static String pct(double fraction) {
        return String.format(java.util.Locale.ROOT, "%.3g %%", fraction * 100);
    }
}
