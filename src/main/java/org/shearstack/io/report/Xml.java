package org.shearstack.io.report;

/** Escaping for text and attribute values in the XHTML report. */
public final class Xml {

    private Xml() {
    }

    /** Escapes &amp;, &lt;, &gt;, quotes; drops control characters XML does not allow. */
    public static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> {
                    if (c >= 0x20 || c == '\n' || c == '\t') {
                        b.append(c);
                    }
                }
            }
        }
        return b.toString();
    }
}
