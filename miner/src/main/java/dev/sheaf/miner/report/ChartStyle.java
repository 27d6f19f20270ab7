package dev.sheaf.miner.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.text.NumberFormat;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.StandardChartTheme;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.DefaultDrawingSupplier;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * The look of every chart and the one place charts become SVG. Colours are the report's own neutral
 * palette; fonts are the logical SansSerif face for layout (its metrics place the labels) and the
 * page's system font stack in the SVG.
 */
final class ChartStyle {
    /** Chart width in SVG user units; the page scales it to its column. */
    static final int WIDTH = 880;

    static final Color INK = new Color(0x27, 0x2e, 0x35);
    static final Color MUTED = new Color(0x5d, 0x66, 0x70);
    static final Color GRID = new Color(0xe3, 0xe6, 0xe8);
    static final Color RULE = new Color(0xb9, 0xc0, 0xc6);
    static final Color BACKGROUND = Color.WHITE;

    static final Color RELIABLE = new Color(0x3b, 0x6e, 0x4c);
    static final Color TENTATIVE = new Color(0xb9, 0x7a, 0x1c);
    static final Color CONTESTED = new Color(0xa3, 0x3f, 0x34);

    /** Series colours: distinct in hue and lightness, readable on white, no neon. */
    static final Color[] SERIES = {
        new Color(0x2e, 0x6b, 0x78), // deep teal
        new Color(0xc0, 0x86, 0x2d), // ochre
        new Color(0x8c, 0x4a, 0x6b), // mulberry
        new Color(0x6b, 0x7f, 0x3a), // moss
        new Color(0x4d, 0x5d, 0x8c), // slate blue
        new Color(0xa6, 0x55, 0x3b), // terracotta
        new Color(0x86, 0x94, 0x9e), // pewter
        new Color(0x5e, 0xa3, 0x9c), // sea green
    };

    static final String FAMILY = "SansSerif";
    static final Font TICK = new Font(FAMILY, Font.PLAIN, 12);
    static final Font AXIS = new Font(FAMILY, Font.PLAIN, 13);
    static final Font SMALL = new Font(FAMILY, Font.PLAIN, 11);
    static final Font LABEL_BOLD = new Font(FAMILY, Font.BOLD, 12);

    /** The CSS font stack written into the SVG for every face. */
    static final String CSS_FONTS =
            "system-ui, -apple-system, \"Segoe UI\", Roboto, \"Helvetica Neue\", \"Noto Sans\", \"DejaVu Sans\", Arial, sans-serif";

    static final Stroke DASHED = new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {5f, 4f}, 0f);

    private static final StandardChartTheme THEME = theme();

    private ChartStyle() {
    }

    /** Applies the house look; call before setting chart-specific paints. */
    static void apply(JFreeChart chart) {
        THEME.apply(chart);
        chart.setBackgroundPaint(BACKGROUND);
        chart.setBorderVisible(false);
        chart.setPadding(new RectangleInsets(6, 4, 6, 14));
        chart.setAntiAlias(true);
        chart.getPlot().setOutlineVisible(false);
        chart.getPlot().setInsets(new RectangleInsets(4, 4, 4, 4));
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setFrame(BlockBorder.NONE);
            legend.setItemFont(TICK);
            legend.setItemPaint(INK);
            legend.setPosition(RectangleEdge.TOP);
            legend.setMargin(new RectangleInsets(0, 0, 8, 0));
        }
    }

    /** A percent format for axes: "0%", "25%". */
    static NumberFormat percentFormat() {
        NumberFormat f = NumberFormat.getPercentInstance(Locale.ROOT);
        f.setMaximumFractionDigits(0);
        return f;
    }

    /** A circle of this diameter, centred on the data point. */
    static Shape dot(double diameter) {
        return new Ellipse2D.Double(-diameter / 2, -diameter / 2, diameter, diameter);
    }

    /** Dark text on light paint, white on dark. */
    static Color textOn(Paint p) {
        if (!(p instanceof Color c)) {
            return INK;
        }
        double l = (0.2126 * lin(c.getRed()) + 0.7152 * lin(c.getGreen()) + 0.0722 * lin(c.getBlue()));
        return l < 0.28 ? Color.WHITE : INK;
    }

    private static double lin(int channel) {
        double v = channel / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    /**
     * The chart as an {@code <svg>} element with root id {@code id}. Every id inside starts with
     * {@code id + "-"} (JFreeSVG's defs key prefix, which otherwise holds a clock value), and numbers are
     * rounded to two decimals, so the same chart gives the same bytes on every run.
     */
    static String svg(JFreeChart chart, String id, int width, int height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(id + "-");
        g.setGeomDoubleConverter(d -> round(d, 2));
        g.setTransformDoubleConverter(d -> round(d, 4));
        g.setFontFunction(family -> CSS_FONTS);
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        g.dispose();
        return g.getSVGElement(id, false, new ViewBox(0, 0, width, height), null, null);
    }

    static String round(double d, int places) {
        if (Double.isNaN(d) || Double.isInfinite(d)) {
            return "0";
        }
        String s = BigDecimal.valueOf(d).setScale(places, RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    private static StandardChartTheme theme() {
        StandardChartTheme t = new StandardChartTheme("Sheaf", false);
        t.setExtraLargeFont(new Font(FAMILY, Font.BOLD, 15));
        t.setLargeFont(AXIS);
        t.setRegularFont(TICK);
        t.setSmallFont(SMALL);
        t.setTitlePaint(INK);
        t.setSubtitlePaint(INK);
        t.setChartBackgroundPaint(BACKGROUND);
        t.setLegendBackgroundPaint(BACKGROUND);
        t.setLegendItemPaint(INK);
        t.setPlotBackgroundPaint(BACKGROUND);
        t.setPlotOutlinePaint(RULE);
        t.setDomainGridlinePaint(GRID);
        t.setRangeGridlinePaint(GRID);
        t.setBaselinePaint(RULE);
        t.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        t.setAxisLabelPaint(INK);
        t.setTickLabelPaint(MUTED);
        t.setItemLabelPaint(INK);
        t.setShadowVisible(false);
        t.setBarPainter(new StandardBarPainter());
        t.setXYBarPainter(new StandardXYBarPainter());
        t.setErrorIndicatorPaint(INK);
        t.setGridBandPaint(BACKGROUND);
        t.setGridBandAlternatePaint(BACKGROUND);
        Stroke[] strokes = {new BasicStroke(2f)};
        Stroke[] outline = {new BasicStroke(1f)};
        Shape[] shapes = {dot(8)};
        t.setDrawingSupplier(new DefaultDrawingSupplier(SERIES, SERIES, SERIES, strokes, outline, shapes));
        return t;
    }
}
