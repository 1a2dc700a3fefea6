package utdigit.web.waveform;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import tools.jackson.databind.JsonNode;
import utdigit.core.waveform.WaveformResult;

/**
 * The report figure of a waveform analysis (Accept: image/svg+xml): above, the recorded pulse (mean
 * removed), its envelope and the samples at the target rate at their worst phase; below, the
 * spectrum in dB with its -6 and -20 dB edges and the target's Nyquist frequency; and a caption whose
 * numbers are read from the JSON answer itself, so that figure and answer agree. Drawn by JFreeChart
 * into JFreeSVG.
 */
final class WaveformFigure {
    private WaveformFigure() {}

    static final int WIDTH = 960;
    static final int CHART_HEIGHT = 360;
    static final int CAPTION_LINE = 18;
    /** Points of a plotted series at most (the figure only: every figure number is computed on all points). */
    private static final int MAX_PLOTTED = 1200;
    private static final Font CAPTION_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 13);

    static {
        // Rotated axis labels as SVG text (searchable, scalable), not as glyph outlines.
        org.jfree.chart.text.TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    /** The SVG document for a result and its JSON answer. */
    static String render(WaveformResult result, JsonNode answer) {
        List<String> caption = new ArrayList<>();
        for (String line : caption(answer)) {
            caption.addAll(wrap(line, CAPTION_WIDTH));
        }
        int height = 2 * CHART_HEIGHT + 20 + CAPTION_LINE * (caption.size() + 1);
        SVGGraphics2D g2 = new SVGGraphics2D(WIDTH, height);
        g2.setDefsKeyPrefix("waveform");
        g2.setPaint(Color.WHITE);
        g2.fill(new Rectangle2D.Double(0, 0, WIDTH, height));
        timeChart(result, answer).draw(g2, new Rectangle2D.Double(0, 0, WIDTH, CHART_HEIGHT));
        spectrumChart(result, answer).draw(g2, new Rectangle2D.Double(0, CHART_HEIGHT + 10, WIDTH, CHART_HEIGHT));
        g2.setPaint(Color.BLACK);
        g2.setFont(CAPTION_FONT);
        int y = 2 * CHART_HEIGHT + 20 + CAPTION_LINE;
        for (String line : caption) {
            g2.drawString(line, 12, y);
            y += CAPTION_LINE;
        }
        return g2.getSVGDocument();
    }

    /** Characters of a caption line at most (13 px sans-serif across the figure). */
    private static final int CAPTION_WIDTH = 125;

    /** {@code line} broken at spaces into lines of at most {@code width} characters (continuations indented). */
    static List<String> wrap(String line, int width) {
        List<String> lines = new ArrayList<>();
        String rest = line;
        while (rest.length() > width) {
            int cut = rest.lastIndexOf(' ', width);
            if (cut <= 0) {
                break;
            }
            lines.add(rest.substring(0, cut));
            rest = "    " + rest.substring(cut + 1);
        }
        lines.add(rest);
        return lines;
    }

    /** The caption lines; every number is the JSON answer's, at 4 significant digits. */
    static List<String> caption(JsonNode a) {
        List<String> lines = new ArrayList<>();
        JsonNode in = a.path("inputs");
        lines.add(String.format(Locale.ROOT, "Record: %d samples at %s MHz (mean removed; spectrum window %s).",
                a.path("sample_count").asInt(), num(in.path("record_sampling_frequency_mhz")),
                a.path("spectrum_window").asString()));
        lines.add(String.format(Locale.ROOT, "Measured spectrum: peak %s MHz; -6 dB band %s to %s MHz; -20 dB band "
                        + "%s to %s MHz; centre %s MHz (%s); bandwidth %s %%.",
                num(a.path("peak_frequency_mhz")), num(a.path("lower_frequency_mhz")), num(a.path("upper_frequency_mhz")),
                num(a.path("lower_frequency_20db_mhz")), num(a.path("upper_frequency_20db_mhz")),
                num(a.path("centre_frequency_mhz")), in.path("centre_frequency_convention").asString(),
                num(a.path("bandwidth_percent"))));
        lines.add(String.format(Locale.ROOT, "Envelope: -6 dB duration %s us (%s cycles; Gaussian model %s us); "
                        + "-20 dB duration %s us.",
                num(a.path("pulse_duration_6db_us")), num(a.path("cycles_6db")),
                num(a.path("model_pulse_duration_6db_us")), num(a.path("pulse_duration_20db_us"))));
        if (a.has("effective_sampling_frequency_mhz")) {
            lines.add(String.format(Locale.ROOT, "Target %s MHz (decimation %d %s, %s): %s samples per period; "
                            + "worst-case loss %s dB (Gaussian model %s dB) at phase %s ns.",
                    num(in.path("sampling_frequency_mhz")), in.path("decimation_factor").asInt(),
                    in.path("decimation_mode").asString(), in.path("peak_reading").asString(),
                    num(a.path("samples_per_period")), num(a.path("pulse_amplitude_loss_db")),
                    num(a.path("model_pulse_amplitude_loss_db")), num(a.path("worst_phase_ns"))));
            lines.add(String.format(Locale.ROOT, "Energy above the target Nyquist %s MHz: %s of the record "
                            + "(Gaussian model %s).",
                    num(a.path("nyquist_frequency_mhz")), num(a.path("energy_above_nyquist_fraction")),
                    num(a.path("model_energy_above_nyquist_fraction"))));
            if (a.has("required_sampling_frequency_pulse_mhz")) {
                lines.add(String.format(Locale.ROOT, "Rate for %s dB: %s MHz on the record (Gaussian model %s MHz).",
                        num(in.path("amplitude_tolerance_db")), num(a.path("required_sampling_frequency_pulse_mhz")),
                        num(a.path("model_required_sampling_frequency_pulse_mhz"))));
            }
        }
        lines.add("The governing code edition and procedure decide; figures support a qualified examiner.");
        return lines;
    }

    /** A number of the answer at 4 significant digits, or "none" for null. */
    static String num(JsonNode v) {
        if (v == null || !v.isNumber()) {
            return "none";
        }
        return String.format(Locale.ROOT, "%.4g", v.doubleValue());
    }

    private static JFreeChart timeChart(WaveformResult r, JsonNode a) {
        WaveformResult.Figure f = r.figure();
        XYSeries pulse = decimated("recorded pulse (mean removed)", f.timesUs(), f.centred());
        XYSeries envelope = decimated("envelope", f.timesUs(), f.envelope());
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(pulse);
        data.addSeries(envelope);
        boolean samples = f.targetTimesUs().length > 0;
        if (samples) {
            XYSeries target = new XYSeries("samples at " + num(a.path("inputs").path("sampling_frequency_mhz"))
                    + " MHz, worst phase", false, true);
            for (int i = 0; i < f.targetTimesUs().length; i++) {
                target.add(f.targetTimesUs()[i], f.targetValues()[i]);
            }
            data.addSeries(target);
        }
        JFreeChart chart = ChartFactory.createXYLineChart("Recorded pulse and envelope", "Time, µs",
                "Amplitude, record units", data, PlotOrientation.VERTICAL, true, false, false);
        XYPlot plot = chart.getXYPlot();
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
        plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        renderer.setSeriesPaint(0, new Color(0x1f, 0x4e, 0x9a));
        renderer.setSeriesStroke(0, new BasicStroke(1.2f));
        renderer.setSeriesPaint(1, new Color(0xd9, 0x7a, 0x00));
        renderer.setSeriesStroke(1, new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {6f, 4f}, 0f));
        if (samples) {
            renderer.setSeriesLinesVisible(2, false);
            renderer.setSeriesShapesVisible(2, true);
            renderer.setSeriesShape(2, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
            renderer.setSeriesPaint(2, new Color(0xc0, 0x10, 0x20));
        }
        plot.setRenderer(renderer);
        // The echo: where its envelope is above 1 % of its peak, with a margin of a third of that span each side.
        double[] e = f.envelope();
        double max = 0.0;
        for (double v : e) {
            max = StrictMath.max(max, v);
        }
        int first = 0;
        while (first < e.length - 1 && e[first] < 0.01 * max) {
            first++;
        }
        int last = e.length - 1;
        while (last > first && e[last] < 0.01 * max) {
            last--;
        }
        double[] t = f.timesUs();
        double margin = StrictMath.max((t[last] - t[first]) / 3.0, t[1] - t[0]);
        plot.getDomainAxis().setRange(StrictMath.max(t[0], t[first] - margin),
                StrictMath.min(t[t.length - 1], t[last] + margin));
        return chart;
    }

    private static JFreeChart spectrumChart(WaveformResult r, JsonNode a) {
        WaveformResult.Figure f = r.figure();
        double recordNyquist = f.frequenciesMhz()[f.frequenciesMhz().length - 1];
        double top = a.path("upper_frequency_20db_mhz").isNumber() ? a.path("upper_frequency_20db_mhz").doubleValue()
                : a.path("upper_frequency_mhz").doubleValue();
        double shown = StrictMath.max(3.0 * top, 2.0 * a.path("upper_frequency_mhz").doubleValue());
        if (a.path("nyquist_frequency_mhz").isNumber()) {
            shown = StrictMath.max(shown, 1.15 * a.path("nyquist_frequency_mhz").doubleValue());
        }
        shown = StrictMath.min(shown, recordNyquist);
        int last = 0;
        while (last < f.frequenciesMhz().length - 1 && f.frequenciesMhz()[last + 1] <= shown) {
            last++;
        }
        double[] x = java.util.Arrays.copyOf(f.frequenciesMhz(), last + 1);
        double[] y = java.util.Arrays.copyOf(f.spectrumDb(), last + 1);
        for (int i = 0; i < y.length; i++) {
            y[i] = StrictMath.max(y[i], -60.0);
        }
        XYSeriesCollection data = new XYSeriesCollection(decimated("measured spectrum", x, y));
        JFreeChart chart = ChartFactory.createXYLineChart("Measured spectrum", "Frequency, MHz", "Level, dB re peak",
                data, PlotOrientation.VERTICAL, false, false, false);
        XYPlot plot = chart.getXYPlot();
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(Color.LIGHT_GRAY);
        plot.setRangeGridlinePaint(Color.LIGHT_GRAY);
        plot.getRangeAxis().setRange(-60.0, 3.0);
        plot.getDomainAxis().setRange(0.0, shown);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        renderer.setSeriesPaint(0, new Color(0x1f, 0x4e, 0x9a));
        plot.setRenderer(renderer);
        Color edge6 = new Color(0x2a, 0x8a, 0x2a);
        Color edge20 = new Color(0x80, 0x80, 0x80);
        marker(plot, a.path("lower_frequency_mhz"), "fl -6 dB " + num(a.path("lower_frequency_mhz")), edge6, false, true);
        marker(plot, a.path("upper_frequency_mhz"), "fu -6 dB " + num(a.path("upper_frequency_mhz")), edge6, false, false);
        marker(plot, a.path("lower_frequency_20db_mhz"), "-20 dB " + num(a.path("lower_frequency_20db_mhz")), edge20, true, true);
        marker(plot, a.path("upper_frequency_20db_mhz"), "-20 dB " + num(a.path("upper_frequency_20db_mhz")), edge20, true, false);
        if (a.path("nyquist_frequency_mhz").isNumber()) {
            marker(plot, a.path("nyquist_frequency_mhz"), "target Nyquist " + num(a.path("nyquist_frequency_mhz")) + " MHz",
                    new Color(0xc0, 0x10, 0x20), false, false);
        }
        ValueMarker six = new ValueMarker(-6.0, edge6, new BasicStroke(0.8f));
        plot.addRangeMarker(six);
        ValueMarker twenty = new ValueMarker(-20.0, edge20, new BasicStroke(0.8f));
        plot.addRangeMarker(twenty);
        return chart;
    }

    /** A vertical line at {@code value} labelled at its top or bottom ({@code low}), to its left or right. */
    private static void marker(XYPlot plot, JsonNode value, String label, Color color, boolean low, boolean left) {
        if (!value.isNumber()) {
            return;
        }
        ValueMarker m = new ValueMarker(value.doubleValue(), color, new BasicStroke(1.2f));
        m.setLabel(label);
        m.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        m.setLabelPaint(color);
        m.setLabelBackgroundColor(new Color(255, 255, 255, 220));
        if (left) {
            m.setLabelAnchor(low ? RectangleAnchor.BOTTOM_LEFT : RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(low ? TextAnchor.BOTTOM_RIGHT : TextAnchor.TOP_RIGHT);
        } else {
            m.setLabelAnchor(low ? RectangleAnchor.BOTTOM_RIGHT : RectangleAnchor.TOP_RIGHT);
            m.setLabelTextAnchor(low ? TextAnchor.BOTTOM_LEFT : TextAnchor.TOP_LEFT);
        }
        plot.addDomainMarker(m);
    }

    private static XYSeries decimated(String name, double[] x, double[] y) {
        XYSeries s = new XYSeries(name, false, true);
        int step = StrictMath.max(1, (x.length + MAX_PLOTTED - 1) / MAX_PLOTTED);
        for (int i = 0; i < x.length; i += step) {
            s.add(x[i], y[i]);
        }
        return s;
    }
}
