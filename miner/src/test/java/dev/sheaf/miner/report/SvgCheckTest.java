package dev.sheaf.miner.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class SvgCheckTest {
    private static final String NS = "xmlns='http://www.w3.org/2000/svg'";

    @Test
    void acceptsDrawingWithSameDocumentReferences() {
        String svg = "<svg id='c1' " + NS + " xmlns:xlink='http://www.w3.org/1999/xlink'><defs><clipPath id='c1-clip-0'>"
                + "<path d='M0,0L1,1Z'/></clipPath></defs><g style='fill:rgb(1,2,3)' clip-path='url(#c1-clip-0)'>"
                + "<rect x='0' y='0' width='4' height='4'/><text x='1' y='2'>a &lt;b&gt;</text></g></svg>";
        assertEquals("c1", SvgCheck.check(svg));
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "<svg id='a'><script>alert(1)</script></svg>",
        "<svg id='a' onload='alert(1)'></svg>",
        "<svg id='a'><rect onclick='x()' width='1' height='1'/></svg>",
        "<svg id='a'><a href='https://evil.invalid'><text>x</text></a></svg>",
        "<svg id='a'><image href='http://evil.invalid/x.png'/></svg>",
        "<svg id='a'><use xlink:href='#b'/></svg>",
        "<svg id='a'><foreignObject><div>x</div></foreignObject></svg>",
        "<svg id='a'><style>rect{fill:red}</style></svg>",
        "<svg id='a'><rect style='fill:url(http://evil.invalid/p)' width='1' height='1'/></svg>",
        "<svg id='a'><rect style='fill:u\\72l(http://evil.invalid/p)' width='1' height='1'/></svg>",
        "<svg id='a'><rect style='background:url(#ok) url(//evil.invalid/p)' width='1' height='1'/></svg>",
        "<svg id='a'><rect fill='javascript:alert(1)' width='1' height='1'/></svg>",
        "<svg id='a' xmlns:evil='http://evil.invalid/ns'></svg>",
        "<svg id='a'><!-- a comment --></svg>",
        "<svg id='a'/><svg id='b'/>",
        "<div id='a'></div>",
        "text before <svg id='a'/>",
        "<svg></svg>",
        "<svg id='a'><set attributeName='fill' to='red'/></svg>",
        "<svg id='a'><animate attributeName='href' to='javascript:alert(1)'/></svg>"})
    void rejectsAnythingBeyondDrawing(String svg) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SvgCheck.check(svg));
        assertTrue(e.getMessage().contains("only drawing elements"), e.getMessage());
    }
}
