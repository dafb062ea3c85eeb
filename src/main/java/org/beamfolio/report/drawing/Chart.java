package org.beamfolio.report.drawing;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A diagram along the beam (shear, moment, deflection, or an envelope of them) drawn with
 * JFreeChart. Ordinates are exact values of the solution at the plotted points; the labelled
 * extremes are the solver's, located from roots.
 */
public final class Chart implements Drawing {
    /** One line of the chart. */
    public record Series(String name, double[] x, double[] y) {}

    /** A labelled point, e.g. the largest moment. */
    public record Mark(double x, double y, String label) {}

    private final String yLabel;
    private final String xLabel;
    private final List<Series> series;
    private final List<Mark> marks;
    private final boolean downwardPositive;

    public Chart(String yLabel, String xLabel, List<Series> series, List<Mark> marks, boolean downwardPositive) {
        this.yLabel = yLabel;
        this.xLabel = xLabel;
        this.series = List.copyOf(series);
        this.marks = List.copyOf(marks);
        this.downwardPositive = downwardPositive;
    }

    private static final Color[] COLOURS = {new Color(0x1f, 0x3b, 0x57), new Color(0xb3, 0x6b, 0x00)};

    @Override
    public void draw(Graphics2D g, double width, double height) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (Series s : series) {
            XYSeries xy = new XYSeries(s.name(), false, true);
            for (int i = 0; i < s.x().length; i++) {
                xy.add(s.x()[i], s.y()[i]);
            }
            data.addSeries(xy);
        }
        NumberAxis x = new NumberAxis(xLabel);
        NumberAxis y = new NumberAxis(yLabel);
        for (NumberAxis axis : List.of(x, y)) {
            axis.setStandardTickUnits(NumberAxis.createStandardTickUnits(Locale.US));
            axis.setLabelFont(Style.font(7f));
            axis.setTickLabelFont(Style.font(6.5f));
        }
        x.setAutoRangeIncludesZero(true);
        x.setLowerMargin(0.01);
        x.setUpperMargin(0.01);
        y.setAutoRangeIncludesZero(true);
        y.setInverted(downwardPositive);
        // room for the labels of the extremes inside the plot
        y.setUpperMargin(0.32);
        y.setLowerMargin(0.32);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < series.size(); i++) {
            renderer.setSeriesPaint(i, COLOURS[i % COLOURS.length]);
            renderer.setSeriesStroke(i, new BasicStroke(1.1f));
        }
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setRangeGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        plot.addRangeMarker(new org.jfree.chart.plot.ValueMarker(0, Color.GRAY, new BasicStroke(0.6f)));
        double xMax = series.stream().flatMapToDouble(s -> java.util.Arrays.stream(s.x())).max().orElse(1);
        for (Mark m : marks) {
            // the label sits outward of the curve (up for a peak drawn high, down for one drawn low)
            // and towards the middle of the beam, so it stays inside the plot
            boolean up = (m.y() >= 0) != downwardPositive;
            boolean toLeft = m.x() > 0.6 * xMax;
            double angle = up ? (toLeft ? -3 * Math.PI / 4 : -Math.PI / 4) : (toLeft ? 3 * Math.PI / 4 : Math.PI / 4);
            XYPointerAnnotation a = new XYPointerAnnotation(m.label(), m.x(), m.y(), angle);
            a.setFont(Style.font(6.5f));
            a.setArrowLength(6);
            a.setBaseRadius(8);
            a.setTipRadius(1);
            a.setTextAnchor(up ? (toLeft ? TextAnchor.BOTTOM_RIGHT : TextAnchor.BOTTOM_LEFT)
                    : (toLeft ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT));
            plot.addAnnotation(a);
        }
        JFreeChart chart = new JFreeChart(null, Style.font(8f), plot, series.size() > 1);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(false);
        chart.setTextAntiAlias(false);
        if (chart.getLegend() != null) {
            chart.getLegend().setItemFont(Style.font(6.5f));
        }
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
    }
}
