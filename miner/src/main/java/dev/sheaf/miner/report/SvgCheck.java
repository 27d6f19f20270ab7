package dev.sheaf.miner.report;

import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.nodes.Node;
import org.jsoup.nodes.TextNode;
import org.jsoup.parser.Parser;

/**
 * The allow-list an SVG must pass before the page embeds it as markup: drawing elements and
 * presentation attributes only. No script, style or foreign-object element, no event handler, no
 * link ({@code href} of any kind), no {@code url(...)} other than a reference to an element of the
 * same document ({@code url(#id)}), and no namespace other than SVG's own, XLink's and JFreeSVG's.
 * Anything else is a programming error and throws, naming what was found.
 */
final class SvgCheck {
    private static final Set<String> ELEMENTS = Set.of("svg", "g", "defs", "clippath", "path", "rect", "line", "polyline",
            "polygon", "circle", "ellipse", "text", "tspan", "title", "desc", "lineargradient", "radialgradient", "stop");

    private static final Set<String> ATTRIBUTES = Set.of("id", "width", "height", "viewbox", "preserveaspectratio",
            "style", "clip-path", "clippathunits", "d", "x", "y", "x1", "y1", "x2", "y2", "cx", "cy", "r", "rx", "ry", "fx", "fy",
            "transform", "points", "fill", "fill-opacity", "fill-rule", "stroke", "stroke-width", "stroke-opacity",
            "stroke-dasharray", "stroke-dashoffset", "stroke-linecap", "stroke-linejoin", "stroke-miterlimit", "opacity",
            "font-family", "font-size", "font-weight", "font-style", "text-anchor", "dominant-baseline", "text-rendering",
            "shape-rendering", "gradientunits", "gradienttransform", "spreadmethod", "offset", "stop-color", "stop-opacity",
            "dx", "dy", "textlength", "lengthadjust", "role", "aria-label", "class");

    private static final Set<String> NAMESPACES = Set.of("http://www.w3.org/2000/svg", "http://www.w3.org/1999/xlink",
            "http://www.jfree.org/jfreesvg/svg");

    private static final Pattern URL = Pattern.compile("url\\s*\\(", Pattern.CASE_INSENSITIVE);
    private static final Pattern LOCAL_URL = Pattern.compile("url\\(\\s*['\"]?#[A-Za-z0-9_.:-]+['\"]?\\s*\\)");
    private static final Pattern ID = Pattern.compile("[A-Za-z][A-Za-z0-9_.:-]*");

    private SvgCheck() {
    }

    /** Checks {@code svg} and returns the id of its root element. */
    static String check(String svg) {
        Document doc = Parser.xmlParser().parseInput(svg, "");
        Element root = null;
        for (Node n : doc.childNodes()) {
            if (n instanceof Element e) {
                if (root != null) {
                    throw reject("more than one root element");
                }
                root = e;
            } else if (n instanceof TextNode t && t.isBlank()) {
                continue;
            } else {
                throw reject("content outside the root element: " + n.nodeName());
            }
        }
        if (root == null || !root.normalName().equals("svg")) {
            throw reject("a root element other than <svg>: " + (root == null ? "none" : "<" + root.tagName() + ">"));
        }
        for (Element e : root.getAllElements()) {
            String name = e.normalName().toLowerCase(Locale.ROOT);
            if (!ELEMENTS.contains(name)) {
                throw reject("element <" + e.tagName() + ">");
            }
            for (Attribute a : e.attributes()) {
                checkAttribute(e, a);
            }
            for (Node child : e.childNodes()) {
                if (!(child instanceof Element) && !(child instanceof TextNode)) {
                    throw reject("a " + child.nodeName() + " node inside <" + e.tagName() + ">");
                }
            }
        }
        String id = root.attr("id");
        if (!ID.matcher(id).matches()) {
            throw reject("a root element without a plain id (found '" + id + "')");
        }
        return id;
    }

    private static void checkAttribute(Element e, Attribute a) {
        String key = a.getKey().toLowerCase(Locale.ROOT);
        String value = a.getValue();
        if (key.equals("xmlns") || key.startsWith("xmlns:")) {
            if (!NAMESPACES.contains(value)) {
                throw reject("namespace " + key + "='" + value + "'");
            }
            return;
        }
        if (!ATTRIBUTES.contains(key)) {
            throw reject("attribute " + a.getKey() + " on <" + e.tagName() + ">");
        }
        String lower = value.toLowerCase(Locale.ROOT);
        if (lower.contains("javascript:") || lower.contains("expression(") || lower.contains("@import")
                || lower.contains("<") || lower.contains("\\")) {
            throw reject("attribute value " + a.getKey() + "='" + value + "'");
        }
        if (URL.matcher(value).find()) {
            String rest = LOCAL_URL.matcher(value).replaceAll("");
            if (URL.matcher(rest).find()) {
                throw reject("a url(...) that is not a same-document reference in " + a.getKey() + "='" + value + "'");
            }
        }
    }

    private static IllegalArgumentException reject(String what) {
        return new IllegalArgumentException("the SVG may hold only drawing elements and presentation attributes; found "
                + what + ". Draw charts with Charts, which emits only what the report allows");
    }
}
