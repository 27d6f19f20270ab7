package dev.sheaf.miner.report;

import dev.sheaf.miner.measure.AgreementAttribute;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.AgreementThresholds;
import dev.sheaf.miner.measure.AgreementVerdict;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.font.FontRenderContext;
import java.awt.geom.AffineTransform;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.labels.ItemLabelAnchor;
import org.jfree.chart.labels.ItemLabelPosition;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StackedBarRenderer;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * The report's charts: JFreeChart plots drawn through JFreeSVG into an {@code <svg>} string, ready
 * for a {@link Figure}. Every method takes plain data and an id (a-z, 0-9, '-'; the SVG's root id and
 * the prefix of every id inside it, so several charts can share a page). The same input gives the same
 * bytes. Catalog text reaches the SVG only as chart labels, which JFreeSVG escapes as XML.
 *
 * <p>Charts are {@value ChartStyle#WIDTH} units wide (the page scales them to its column); heights
 * grow with the number of rows. Charts carry no title: the {@link Figure} caption is the title.
 */
public final class Charts {
    /** Most facets shown separately in the flags chart; the rest are summed as "other facets". */
    static final int MAX_FLAG_SERIES = 7;
    /** Longest label a chart shows, in characters. */
    static final int MAX_LABEL = 36;
    private static final FontRenderContext FRC = new FontRenderContext(new AffineTransform(), true, true);

    private Charts() {
    }

    // ------------------------------------------------------------------------------------------ (a)

    /**
     * Heat map of fill rate, facets down, categories across, each cell labelled with its percent; a
     * cell whose facet applies to no listing of the category reads "n/a". Facets and categories keep
     * the order in which they first occur in {@code cells}; a (facet, category) pair may occur once.
     */
    public static String fillRateHeatMap(String id, List<FillRateCell> cells) {
        Ids.require(id, "chart");
        if (cells.isEmpty()) {
            throw new IllegalArgumentException("a fill-rate heat map needs at least one cell");
        }
        Set<String> facets = new LinkedHashSet<>();
        Set<String> categories = new LinkedHashSet<>();
        Set<String> pairs = new java.util.HashSet<>();
        for (FillRateCell c : cells) {
            facets.add(c.facet());
            categories.add(c.category());
            if (!pairs.add(c.facet() + '\u0000' + c.category())) {
                throw new IllegalArgumentException("fill rate of facet '" + c.facet() + "' in category '" + c.category()
                        + "' is given twice; give each pair once");
            }
        }
        List<String> facetList = new ArrayList<>(facets);
        List<String> categoryList = new ArrayList<>(categories);
        double[][] data = new double[3][cells.size()];
        for (int i = 0; i < cells.size(); i++) {
            FillRateCell c = cells.get(i);
            data[0][i] = categoryList.indexOf(c.category());
            data[1][i] = facetList.indexOf(c.facet());
            data[2][i] = c.rate();
        }
        DefaultXYZDataset dataset = new DefaultXYZDataset();
        dataset.addSeries("fill rate", data);

        List<String> categoryLabels = shorten(categoryList);
        List<String> facetLabels = shorten(facetList);
        SymbolAxis x = new SymbolAxis(null, categoryLabels.toArray(String[]::new));
        SymbolAxis y = new SymbolAxis(null, facetLabels.toArray(String[]::new));
        HeatScale scale = new HeatScale();
        LabelledBlocks renderer = new LabelledBlocks(data[2], scale);
        XYPlot plot = new XYPlot(dataset, x, y, renderer);
        JFreeChart chart = new JFreeChart(null, ChartStyle.TICK, plot, false);
        ChartStyle.apply(chart);

        double columnWidth = (ChartStyle.WIDTH - 40 - longest(facetLabels, ChartStyle.TICK)) / categoryList.size();
        boolean vertical = longest(categoryLabels, ChartStyle.TICK) + 8 > columnWidth;
        for (SymbolAxis a : new SymbolAxis[] {x, y}) {
            a.setGridBandsVisible(false);
            a.setAxisLineVisible(false);
            a.setTickMarksVisible(false);
            a.setTickLabelFont(ChartStyle.TICK);
            a.setTickLabelPaint(ChartStyle.INK);
            a.setAutoRange(false);
        }
        x.setRange(-0.5, categoryList.size() - 0.5);
        y.setRange(-0.5, facetList.size() - 0.5);
        y.setInverted(true);
        x.setVerticalTickLabels(vertical);
        plot.setDomainAxisLocation(AxisLocation.TOP_OR_LEFT);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        plot.setBackgroundPaint(ChartStyle.BACKGROUND);
        plot.setAxisOffset(new RectangleInsets(0, 0, 0, 0));

        renderer.setBlockAnchor(RectangleAnchor.CENTER);
        renderer.setBlockWidth(0.96);
        renderer.setBlockHeight(0.9);
        renderer.setDefaultItemLabelsVisible(true);
        renderer.setDefaultItemLabelFont(ChartStyle.TICK);
        renderer.setDefaultItemLabelGenerator((XYDataset d, int series, int item) -> Numbers.format(data[2][item], ValueKind.SHARE));
        renderer.setDefaultPositiveItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.CENTER, TextAnchor.CENTER));

        NumberAxis legendAxis = new NumberAxis("fill rate: share of the listings the facet applies to that carry a valid value");
        legendAxis.setRange(0, 1);
        legendAxis.setNumberFormatOverride(ChartStyle.percentFormat());
        legendAxis.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(0.25, ChartStyle.percentFormat()));
        legendAxis.setTickLabelFont(ChartStyle.SMALL);
        legendAxis.setTickLabelPaint(ChartStyle.MUTED);
        legendAxis.setLabelFont(ChartStyle.SMALL);
        legendAxis.setLabelPaint(ChartStyle.MUTED);
        legendAxis.setAxisLineVisible(false);
        PaintScaleLegend legend = new PaintScaleLegend(scale, legendAxis);
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setSubdivisionCount(40);
        legend.setStripWidth(10);
        legend.setAxisOffset(3);
        legend.setStripOutlineVisible(false);
        legend.setBackgroundPaint(ChartStyle.BACKGROUND);
        legend.setFrame(BlockBorder.NONE);
        legend.setMargin(new RectangleInsets(14, 180, 0, 180));
        chart.addSubtitle(legend);

        double top = vertical ? longest(categoryLabels, ChartStyle.TICK) + 16 : 26;
        int height = (int) Math.ceil(top + 34.0 * facetList.size() + 78);
        return ChartStyle.svg(chart, id, ChartStyle.WIDTH, height);
    }

    /** A sequential light-to-dark teal scale on [0, 1]; NaN (not applicable) is white. */
    static final class HeatScale implements PaintScale {
        private static final double[] AT = {0, 0.25, 0.5, 0.75, 1};
        private static final Color[] STOPS = {
            new Color(0xef, 0xec, 0xe4), new Color(0xcc, 0xdf, 0xdc), new Color(0x8b, 0xbb, 0xbb),
            new Color(0x44, 0x86, 0x8f), new Color(0x1a, 0x4b, 0x58)};
        static final Color NOT_APPLICABLE = Color.WHITE;

        @Override
        public double getLowerBound() {
            return 0;
        }

        @Override
        public double getUpperBound() {
            return 1;
        }

        @Override
        public Paint getPaint(double value) {
            if (Double.isNaN(value)) {
                return NOT_APPLICABLE;
            }
            double v = Math.max(0, Math.min(1, value));
            int i = 0;
            while (i < AT.length - 2 && v > AT[i + 1]) {
                i++;
            }
            double t = (v - AT[i]) / (AT[i + 1] - AT[i]);
            Color a = STOPS[i];
            Color b = STOPS[i + 1];
            return new Color(mix(a.getRed(), b.getRed(), t), mix(a.getGreen(), b.getGreen(), t), mix(a.getBlue(), b.getBlue(), t));
        }

        private static int mix(int a, int b, double t) {
            return (int) Math.round(a + (b - a) * t);
        }
    }

    /** Blocks whose labels switch to white on dark cells and to grey on n/a cells. */
    static final class LabelledBlocks extends XYBlockRenderer {
        private static final long serialVersionUID = 1L;
        private final double[] z;
        private final transient HeatScale scale;

        LabelledBlocks(double[] z, HeatScale scale) {
            this.z = z;
            this.scale = scale;
            setPaintScale(scale);
        }

        @Override
        public Paint getItemLabelPaint(int series, int item) {
            return Double.isNaN(z[item]) ? ChartStyle.MUTED : ChartStyle.textOn(scale.getPaint(z[item]));
        }

        @Override
        public boolean equals(Object o) {
            return this == o;
        }

        @Override
        public int hashCode() {
            return System.identityHashCode(this);
        }
    }

    // ------------------------------------------------------------------------------------------ (b)

    /**
     * Coverage curve: the share of all {@code totalListings} covered by the top k concepts, from k = 0
     * (no concept, 0%) to the last point. Points must have k rising by one from 1 and coverage that
     * never falls. A dashed line marks the first k at which {@code markShare} of the listings are
     * covered, when that happens (a reading aid, not a threshold; pass NaN for none).
     */
    public static String coverageCurve(String id, List<CoveragePoint> points, long totalListings, double markShare) {
        Ids.require(id, "chart");
        if (totalListings <= 0) {
            throw new IllegalArgumentException("a coverage curve needs totalListings > 0, got " + totalListings);
        }
        if (points.isEmpty()) {
            throw new IllegalArgumentException("a coverage curve needs at least one point");
        }
        XYSeries series = new XYSeries("listings covered", false, false);
        series.add(0, 0);
        long before = 0;
        int mark = -1;
        for (int i = 0; i < points.size(); i++) {
            CoveragePoint p = points.get(i);
            if (p.k() != i + 1) {
                throw new IllegalArgumentException("coverage point " + (i + 1) + " has k = " + p.k() + "; expected k = "
                        + (i + 1) + " (points in rank order, one per concept)");
            }
            if (p.covered() < before || p.covered() > totalListings) {
                throw new IllegalArgumentException("coverage at k = " + p.k() + " is " + p.covered() + "; expected between "
                        + before + " (the previous point) and " + totalListings + " (all listings)");
            }
            before = p.covered();
            double share = (double) p.covered() / totalListings;
            series.add(p.k(), share);
            if (mark < 0 && !Double.isNaN(markShare) && share >= markShare) {
                mark = p.k();
            }
        }
        NumberAxis x = new NumberAxis("k: the top k concepts, ranked by listings labelled");
        x.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        x.setRange(0, points.size());
        NumberAxis y = new NumberAxis("listings with at least one of them");
        y.setRange(0, 1.0);
        y.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(0.2, ChartStyle.percentFormat()));
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, points.size() <= 60);
        XYPlot plot = new XYPlot(new XYSeriesCollection(series), x, y, r);
        JFreeChart chart = new JFreeChart(null, ChartStyle.TICK, plot, false);
        ChartStyle.apply(chart);
        styleValueAxis(x);
        styleValueAxis(y);
        r.setSeriesPaint(0, ChartStyle.SERIES[0]);
        r.setSeriesStroke(0, new BasicStroke(2.25f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        r.setSeriesShape(0, ChartStyle.dot(6));
        plot.setDomainGridlinesVisible(false);
        if (mark > 0) {
            ValueMarker m = new ValueMarker(mark, ChartStyle.MUTED, ChartStyle.DASHED);
            m.setLabel(Numbers.percent(markShare) + " of listings at k = " + mark);
            m.setLabelFont(ChartStyle.SMALL);
            m.setLabelPaint(ChartStyle.INK);
            m.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
            m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            m.setLabelOffset(new RectangleInsets(4, 6, 8, 6));
            m.setLabelBackgroundColor(ChartStyle.BACKGROUND);
            plot.addDomainMarker(m, Layer.BACKGROUND);
        }
        return ChartStyle.svg(chart, id, ChartStyle.WIDTH, 380);
    }

    // ------------------------------------------------------------------------------------------ (c)

    /**
     * Krippendorff's alpha of every attribute in {@code report}: a dot per attribute, coloured by its
     * verdict, with its bootstrap interval as a bar, and dashed lines at the report's tentative and
     * reliable edges (by default 0.667 and 0.800). Attributes whose alpha is undefined are listed with
     * "n/a" and no dot. {@code labels} maps attribute keys to display labels (missing keys show the key).
     */
    public static String alpha(String id, AgreementReport report, Map<String, String> labels) {
        Ids.require(id, "chart");
        Objects.requireNonNull(labels, "labels");
        List<AgreementAttribute> attributes = report.attributes();
        if (attributes.isEmpty()) {
            throw new IllegalArgumentException("the agreement report has no attribute to chart");
        }
        AgreementThresholds t = report.thresholds();
        Map<AgreementVerdict, YIntervalSeries> byVerdict = new EnumMap<>(AgreementVerdict.class);
        String[] names = new String[attributes.size()];
        List<String> shown = new ArrayList<>();
        for (AgreementAttribute a : attributes) {
            shown.add(labels.getOrDefault(a.attribute(), a.attribute()));
        }
        shown = shorten(shown);
        double low = 0;
        for (int i = 0; i < attributes.size(); i++) {
            AgreementAttribute a = attributes.get(i);
            String label = shown.get(i);
            double alpha = a.alpha().alpha();
            if (!a.alpha().defined()) {
                names[i] = label + " \u00b7 \u03b1 n/a";
                continue;
            }
            double lo = a.alphaInterval().defined() ? a.alphaInterval().low() : alpha;
            double hi = a.alphaInterval().defined() ? a.alphaInterval().high() : alpha;
            names[i] = label + " \u00b7 \u03b1 " + Numbers.coefficient(alpha);
            low = Math.min(low, Math.min(lo, alpha));
            byVerdict.computeIfAbsent(a.verdict(), v -> new YIntervalSeries(verdictName(v, t), false, false))
                    .add(i, alpha, Math.min(lo, alpha), Math.max(hi, alpha));
        }
        YIntervalSeriesCollection dataset = new YIntervalSeriesCollection();
        List<Color> paints = new ArrayList<>();
        for (AgreementVerdict v : new AgreementVerdict[] {AgreementVerdict.RELIABLE, AgreementVerdict.TENTATIVE,
                AgreementVerdict.CONTESTED}) {
            YIntervalSeries s = byVerdict.get(v);
            if (s != null) {
                dataset.addSeries(s);
                paints.add(v == AgreementVerdict.RELIABLE ? ChartStyle.RELIABLE
                        : v == AgreementVerdict.TENTATIVE ? ChartStyle.TENTATIVE : ChartStyle.CONTESTED);
            }
        }
        SymbolAxis domain = new SymbolAxis(null, names);
        NumberAxis range = new NumberAxis("Krippendorff's \u03b1 (dot) with its " + Numbers.percent(report.confidence())
                + " bootstrap interval (bar)");
        XYErrorRenderer r = new XYErrorRenderer();
        XYPlot plot = new XYPlot(dataset, domain, range, r);
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        plot.setRangeAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        JFreeChart chart = new JFreeChart(null, ChartStyle.TICK, plot, true);
        ChartStyle.apply(chart);

        domain.setGridBandsVisible(false);
        domain.setAutoRange(false);
        domain.setRange(-0.6, attributes.size() - 0.4);
        domain.setInverted(true);
        domain.setTickMarksVisible(false);
        domain.setAxisLineVisible(false);
        domain.setTickLabelFont(ChartStyle.TICK);
        domain.setTickLabelPaint(ChartStyle.INK);
        styleValueAxis(range);
        // a little room past 1 so a perfect alpha's dot is not cut in half; no tick lies beyond 1
        range.setRange(Math.floor((low - 0.05) * 10) / 10, 1.04);
        range.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(0.1, new java.text.DecimalFormat("0.0",
                java.text.DecimalFormatSymbols.getInstance(java.util.Locale.ROOT))));
        plot.setDomainGridlinesVisible(true);
        plot.setDomainGridlinePaint(ChartStyle.GRID);
        plot.setRangeGridlinesVisible(false);

        r.setDrawXError(false);
        r.setDrawYError(true);
        r.setDefaultLinesVisible(false);
        r.setDefaultShapesVisible(true);
        r.setCapLength(9);
        r.setErrorStroke(new BasicStroke(2.5f));
        for (int s = 0; s < paints.size(); s++) {
            r.setSeriesPaint(s, paints.get(s));
            r.setSeriesShape(s, ChartStyle.dot(11));
        }
        plot.addRangeMarker(edge(t.alphaTentative(), "tentative " + Numbers.coefficient(t.alphaTentative()),
                ChartStyle.TENTATIVE, false), Layer.BACKGROUND);
        plot.addRangeMarker(edge(t.alphaReliable(), "reliable " + Numbers.coefficient(t.alphaReliable()),
                ChartStyle.RELIABLE, true), Layer.BACKGROUND);
        if (range.getLowerBound() < 0) {
            plot.addRangeMarker(new ValueMarker(0, ChartStyle.RULE, new BasicStroke(1f)), Layer.BACKGROUND);
        }
        int height = 96 + 34 * attributes.size();
        return ChartStyle.svg(chart, id, ChartStyle.WIDTH, height);
    }

    private static String verdictName(AgreementVerdict v, AgreementThresholds t) {
        String rel = Numbers.coefficient(t.alphaReliable());
        String ten = Numbers.coefficient(t.alphaTentative());
        return switch (v) {
            case RELIABLE -> "reliable (\u03b1 \u2265 " + rel + ")";
            case TENTATIVE -> "tentative (" + ten + " \u2264 \u03b1 < " + rel + ")";
            case CONTESTED -> "contested (\u03b1 < " + ten + ")";
            case UNDEFINED -> "n/a";
        };
    }

    /** A threshold line whose label sits beside it, to the right or left, so two close edges do not collide. */
    private static ValueMarker edge(double value, String label, Color paint, boolean labelRight) {
        ValueMarker m = new ValueMarker(value, paint, ChartStyle.DASHED);
        m.setLabel(label);
        m.setLabelFont(ChartStyle.SMALL);
        m.setLabelPaint(paint.darker());
        m.setLabelBackgroundColor(ChartStyle.BACKGROUND);
        m.setLabelAnchor(labelRight ? RectangleAnchor.TOP_RIGHT : RectangleAnchor.TOP_LEFT);
        m.setLabelTextAnchor(labelRight ? TextAnchor.TOP_LEFT : TextAnchor.TOP_RIGHT);
        m.setLabelOffset(new RectangleInsets(2, 4, 2, 4));
        return m;
    }

    // ------------------------------------------------------------------------------------------ (d)

    /**
     * Mention direction agreement per attribute: one horizontal bar per attribute, its length the
     * share of checked mentions whose direction agrees with the labels, its label the share and the
     * counts. Attributes keep the given order and must be distinct.
     */
    public static String directionAgreement(String id, List<DirectionAgreement> rows) {
        Ids.require(id, "chart");
        if (rows.isEmpty()) {
            throw new IllegalArgumentException("a direction-agreement chart needs at least one attribute");
        }
        DefaultCategoryDataset dataset = new DefaultCategoryDataset();
        Set<String> seen = new java.util.HashSet<>();
        List<String> names = new ArrayList<>();
        for (DirectionAgreement d : rows) {
            if (!seen.add(d.attribute())) {
                throw new IllegalArgumentException("attribute '" + d.attribute() + "' occurs twice; give each attribute once");
            }
            names.add(d.attribute());
        }
        names = shorten(names);
        for (int i = 0; i < rows.size(); i++) {
            DirectionAgreement d = rows.get(i);
            String label = names.get(i) + " \u00b7 " + (d.mentions() == 0 ? "no checked mentions"
                    : Numbers.percent(d.share()) + " of " + Numbers.count(d.mentions()));
            dataset.addValue(d.mentions() == 0 ? null : (Number) d.share(), "agreeing", label);
        }
        CategoryAxis domain = new CategoryAxis(null);
        NumberAxis range = new NumberAxis("share of checked mentions whose direction agrees with the labels");
        BarRenderer r = new BarRenderer();
        CategoryPlot plot = new CategoryPlot(dataset, domain, range, r);
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        plot.setRangeAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        JFreeChart chart = new JFreeChart(null, ChartStyle.TICK, plot, false);
        ChartStyle.apply(chart);
        styleCategoryAxis(domain);
        styleValueAxis(range);
        range.setRange(0, 1);
        range.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(0.2, ChartStyle.percentFormat()));
        plot.setDomainGridlinesVisible(false);
        r.setSeriesPaint(0, ChartStyle.SERIES[0]);
        r.setDrawBarOutline(false);
        r.setMaximumBarWidth(0.7);
        r.setItemMargin(0);
        domain.setCategoryMargin(0.3);
        int height = 80 + 30 * rows.size();
        return ChartStyle.svg(chart, id, ChartStyle.WIDTH, height);
    }

    // ------------------------------------------------------------------------------------------ (e)

    /**
     * Flags over the vocabulary: one bar per flag kind (all five, in their fixed order, each labelled
     * with its total), stacked by facet. Facets beyond the {@value #MAX_FLAG_SERIES} with the most
     * flags are summed as "other facets".
     */
    public static String flags(String id, List<FlagCount> counts) {
        Ids.require(id, "chart");
        Map<String, Map<FlagKind, Integer>> byFacet = new LinkedHashMap<>();
        Map<FlagKind, Integer> totals = new EnumMap<>(FlagKind.class);
        for (FlagCount c : counts) {
            byFacet.computeIfAbsent(c.facet(), f -> new EnumMap<>(FlagKind.class)).merge(c.kind(), c.count(), Integer::sum);
            totals.merge(c.kind(), c.count(), Integer::sum);
        }
        List<String> facets = new ArrayList<>(byFacet.keySet());
        facets.sort((a, b) -> Integer.compare(sum(byFacet.get(b)), sum(byFacet.get(a)))); // stable: ties keep order
        Map<String, Map<FlagKind, Integer>> shown = new LinkedHashMap<>();
        boolean folded = facets.size() > MAX_FLAG_SERIES + 1;
        int keep = folded ? MAX_FLAG_SERIES : facets.size();
        List<String> kept = shorten(facets.subList(0, keep));
        for (int i = 0; i < keep; i++) {
            shown.put(kept.get(i), byFacet.get(facets.get(i)));
        }
        String otherName = null;
        if (folded) {
            otherName = "the other " + (facets.size() - keep) + " facets";
            while (shown.containsKey(otherName)) {
                otherName += "*";
            }
            Map<FlagKind, Integer> other = new EnumMap<>(FlagKind.class);
            for (String f : facets.subList(keep, facets.size())) {
                byFacet.get(f).forEach((k, v) -> other.merge(k, v, Integer::sum));
            }
            shown.put(otherName, other);
        }
        DefaultCategoryDataset dataset = new DefaultCategoryDataset();
        List<String> kinds = new ArrayList<>();
        for (FlagKind k : FlagKind.values()) {
            kinds.add(k.label() + " (" + totals.getOrDefault(k, 0) + ")");
        }
        if (shown.isEmpty()) {
            shown.put("no flags", new EnumMap<>(FlagKind.class));
        }
        for (Map.Entry<String, Map<FlagKind, Integer>> e : shown.entrySet()) {
            for (FlagKind k : FlagKind.values()) {
                dataset.addValue(e.getValue().getOrDefault(k, 0), e.getKey(), kinds.get(k.ordinal()));
            }
        }
        CategoryAxis domain = new CategoryAxis(null);
        NumberAxis range = new NumberAxis("attributes flagged");
        StackedBarRenderer r = new StackedBarRenderer();
        CategoryPlot plot = new CategoryPlot(dataset, domain, range, r);
        JFreeChart chart = new JFreeChart(null, ChartStyle.TICK, plot, true);
        ChartStyle.apply(chart);
        styleCategoryAxis(domain);
        domain.setMaximumCategoryLabelWidthRatio(1f);
        domain.setTickLabelFont(ChartStyle.LABEL_BOLD);
        styleValueAxis(range);
        range.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        int max = 0;
        for (int v : totals.values()) {
            max = Math.max(max, v);
        }
        range.setRange(0, Math.max(1, max) * 1.08);
        plot.setDomainGridlinesVisible(false);
        r.setDrawBarOutline(true);
        r.setDefaultOutlinePaint(ChartStyle.BACKGROUND);
        r.setDefaultOutlineStroke(new BasicStroke(1f));
        r.setMaximumBarWidth(0.11);
        int s = 0;
        for (String f : shown.keySet()) {
            r.setSeriesPaint(s, f.equals(otherName) ? ChartStyle.RULE : ChartStyle.SERIES[s % ChartStyle.SERIES.length]);
            r.setSeriesOutlinePaint(s, ChartStyle.BACKGROUND);
            s++;
        }
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        chart.getLegend().setMargin(new RectangleInsets(10, 0, 0, 0));
        return ChartStyle.svg(chart, id, ChartStyle.WIDTH, 400);
    }

    // -------------------------------------------------------------------------------------- helpers

    private static int sum(Map<FlagKind, Integer> m) {
        int s = 0;
        for (int v : m.values()) {
            s += v;
        }
        return s;
    }

    private static void styleValueAxis(NumberAxis a) {
        a.setLabelFont(ChartStyle.AXIS);
        a.setLabelPaint(ChartStyle.INK);
        a.setTickLabelFont(ChartStyle.TICK);
        a.setTickLabelPaint(ChartStyle.MUTED);
        a.setAxisLinePaint(ChartStyle.RULE);
        a.setTickMarkPaint(ChartStyle.RULE);
        a.setLabelInsets(new RectangleInsets(8, 4, 2, 4));
    }

    private static void styleCategoryAxis(CategoryAxis a) {
        a.setTickLabelFont(ChartStyle.TICK);
        a.setTickLabelPaint(ChartStyle.INK);
        a.setAxisLineVisible(false);
        a.setTickMarksVisible(false);
        a.setMaximumCategoryLabelWidthRatio(0.45f);
        a.setMaximumCategoryLabelLines(2);
    }

    /**
     * Labels as a chart shows them: at most {@value #MAX_LABEL} characters (longer ones end in an
     * ellipsis; the tables carry them in full), made distinct again by a number when cutting made
     * two equal, since a label is also the key of its bar.
     */
    static List<String> shorten(List<String> labels) {
        List<String> out = new ArrayList<>(labels.size());
        Set<String> used = new java.util.HashSet<>();
        for (String l : labels) {
            String s = l.strip().replaceAll("\\s+", " ");
            if (s.codePointCount(0, s.length()) > MAX_LABEL) {
                s = s.substring(0, s.offsetByCodePoints(0, MAX_LABEL - 1)).stripTrailing() + "\u2026";
            }
            String unique = s;
            for (int n = 2; !used.add(unique); n++) {
                unique = s + " (" + n + ")";
            }
            out.add(unique);
        }
        return out;
    }

    /** Width of the widest label in this font, in SVG user units. */
    private static double longest(List<String> labels, Font font) {
        double w = 0;
        for (String s : labels) {
            w = Math.max(w, font.getStringBounds(s, FRC).getWidth());
        }
        return w;
    }
}
