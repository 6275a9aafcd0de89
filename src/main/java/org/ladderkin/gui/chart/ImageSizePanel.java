package org.ladderkin.gui.chart;

import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSpinner;
import javax.swing.SpinnerNumberModel;
import net.miginfocom.swing.MigLayout;

/**
 * Size and scale of an exported chart image, shown beside the file chooser. The last choice is kept for the rest of
 * the session, so a series of figures comes out alike.
 */
public final class ImageSizePanel extends JPanel {

    private static final long serialVersionUID = 1L;
    private static volatile ChartExport.ImageSize last = ChartExport.ImageSize.DEFAULT;

    private final JSpinner width = new JSpinner(new SpinnerNumberModel(last.widthPx(), 200, 4000, 10));
    private final JSpinner height = new JSpinner(new SpinnerNumberModel(last.heightPx(), 150, 4000, 10));
    private final JComboBox<String> scale = new JComboBox<>(new String[] {"1×", "2×", "3×", "4×"});
    private final JLabel result = new JLabel();

    /** @param scaled whether the format has pixels to scale (PNG); SVG takes the layout size only */
    public ImageSizePanel(boolean scaled) {
        super(new MigLayout("insets 0 8 0 0, wrap 2", "[right][fill]"));
        setName("export:size");
        width.setName("export:width");
        height.setName("export:height");
        scale.setName("export:scale");
        scale.setSelectedIndex(last.scale() - 1);
        scale.setEnabled(scaled);
        add(new JLabel("Image size"), "span 2, left");
        add(new JLabel("width (px)"));
        add(width);
        add(new JLabel("height (px)"));
        add(height);
        add(new JLabel("scale"));
        add(scale);
        add(result, "span 2, left");
        width.addChangeListener(e -> describe());
        height.addChangeListener(e -> describe());
        scale.addActionListener(e -> describe());
        scale.setToolTipText("draws the same layout with 2, 3 or 4 times the pixels each way, for print or a high-density screen");
        describe();
    }

    /** The size chosen; remembered for the next export. */
    public ChartExport.ImageSize imageSize() {
        ChartExport.ImageSize s = new ChartExport.ImageSize((Integer) width.getValue(), (Integer) height.getValue(),
                scale.isEnabled() ? scale.getSelectedIndex() + 1 : 1);
        last = s;
        return s;
    }

    /** Sets the fields (a test, or a caller restoring a saved choice). */
    public void set(ChartExport.ImageSize s) {
        width.setValue(s.widthPx());
        height.setValue(s.heightPx());
        scale.setSelectedIndex(s.scale() - 1);
    }

    private void describe() {
        int w = (Integer) width.getValue();
        int h = (Integer) height.getValue();
        int k = scale.isEnabled() ? scale.getSelectedIndex() + 1 : 1;
        result.setText("<html>writes " + w * k + " × " + h * k + " px</html>");
    }
}
