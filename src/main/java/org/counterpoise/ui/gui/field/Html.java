package org.counterpoise.ui.gui.field;

/**
 * Plain text put into a Swing HTML label: the one escape of the wizard's labels and messages, so that
 * a name or a message with &amp;, &lt; or &gt; shows as typed instead of as markup.
 */
public final class Html {
    private Html() {
    }

    /**
     * @param text plain text
     * @return the text with &amp;, &lt; and &gt; escaped
     */
    public static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    /**
     * @param text plain text
     * @param widthPt the width it wraps at, in points (Swing's HTML takes a CSS px as 1.3 screen pixels
     *     and a pt as one)
     * @return an HTML label's text that wraps the escaped text at that width
     */
    public static String wrapped(String text, int widthPt) {
        return "<html><body style='width: " + widthPt + "pt'>" + escape(text) + "</body></html>";
    }

    /**
     * @param text plain text
     * @return an HTML label's text holding the escaped text (wrapped by the label's own width)
     */
    public static String label(String text) {
        return "<html>" + escape(text) + "</html>";
    }
}
