package dev.sheaf.miner.report;

import java.util.List;

/** Strings that try to become markup, script or a fetch when put into a page or an SVG. */
final class Hostile {
    static final List<String> STRINGS = List.of(
            "<script>alert('x')</script>",
            "<img src=x onerror=alert(1)>",
            "\" onmouseover=\"alert(1)",
            "' onfocus='alert(2)' autofocus='",
            "<a href=\"javascript:alert(3)\">click</a>",
            "javascript:alert(4)",
            "<svg onload=alert(5)><circle r=\"9\"/></svg>",
            "</style><style>body{background:url(http://evil.invalid/x.png)}</style>",
            "</title></textarea></script><iframe src=//evil.invalid/frame>",
            "&lt;already escaped&gt; &amp; & ampersand",
            "<!-- comment --><![CDATA[x]]>",
            "<math><mi xlink:href=\"data:x,alert(6)\">m</mi></math>");

    /** All of them in one string, as a single catalog title might hold. */
    static final String ALL = String.join(" ", STRINGS);

    private Hostile() {
    }
}
