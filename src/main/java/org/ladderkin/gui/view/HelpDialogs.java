package org.ladderkin.gui.view;

import java.awt.Component;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import javax.swing.JOptionPane;
import org.ladderkin.report.Cautions;

/** Help ▸ About and Help ▸ Using the Planner: short, and pointing to the user guide in docs/ for the rest. */
final class HelpDialogs {

    static final String ABOUT_TITLE = "About ladderkin";
    static final String USING_TITLE = "Using the planner";

    private HelpDialogs() {
    }

    /** The version Maven wrote at build time, or "unknown" for an unpackaged build. */
    static String version() {
        try (InputStream in = HelpDialogs.class.getResourceAsStream("/org/ladderkin/version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            String v = p.getProperty("version", "unknown");
            // an unfiltered copy still holds the Maven placeholder
            return v.startsWith("${") ? "unknown" : v;
        } catch (IOException e) {
            return "unknown";
        }
    }

    /** The user guide: under the ladderkin home when it is known and holds one, else named by its place in the project. */
    static String userGuide() {
        String home = System.getProperty("ladderkin.home");
        if (home != null) {
            Path guide = Path.of(home, "docs", "user-guide.md").toAbsolutePath().normalize();
            if (Files.isRegularFile(guide)) {
                return guide.toString();
            }
        }
        return "docs/user-guide.md in the ladderkin folder";
    }

    static String aboutHtml() {
        return "<html><body style='width: 420px'>"
                + "<h2>ladderkin " + escape(version()) + "</h2>"
                + "<p>Rate-equation planner and fitter for multiexciton ladders in quantum dots: fluence series, "
                + "heating, photocharging and pile-up risks, and fits of measured traces.</p><br>"
                + "<p><b>Licence:</b> this build declares no licence; ask the maintainers before passing it on.</p><br>"
                + "<p><b>Laser safety:</b> " + escape(Cautions.LASER) + "</p><br>"
                + "<p>Java " + escape(System.getProperty("java.version", "?")) + "</p>"
                + "</body></html>";
    }

    static String usingHtml() {
        return "<html><body style='width: 440px'>"
                + "<p><b>Left:</b> the plan in five forms (Sample, Laser, Instruments, Goals, Model). Type values with "
                + "their units, as in the lab: <code>50 nJ</code>, <code>1 kHz</code>, <code>150 µm</code>. A grey value "
                + "in an empty field is what the prediction derives in its place.</p><br>"
                + "<p><b>Centre:</b> the predicted charts, the risk table, the derived numbers and the error budget "
                + "follow every edit. Washed-out results with a ‘stale’ note belong to the previous plan or to the last "
                + "version of this plan that read without errors.</p><br>"
                + "<p><b>Problems:</b> a field with a problem is outlined and its form's tab is marked; "
                + "Edit ▸ Go to First Problem (F8) or a click on the status bar jumps to it.</p><br>"
                + "<p><b>Measured data &amp; fit:</b> load traces, fit them against the plan's model and push the "
                + "fitted values back into the plan.</p><br>"
                + "<p>The user guide tells the rest: " + escape(userGuide()) + "</p>"
                + "</body></html>";
    }

    static void about(Component parent) {
        JOptionPane.showMessageDialog(parent, aboutHtml(), ABOUT_TITLE, JOptionPane.INFORMATION_MESSAGE);
    }

    static void using(Component parent) {
        JOptionPane.showMessageDialog(parent, usingHtml(), USING_TITLE, JOptionPane.INFORMATION_MESSAGE);
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
