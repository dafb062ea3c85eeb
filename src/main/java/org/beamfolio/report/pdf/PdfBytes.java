package org.beamfolio.report.pdf;

/**
 * Reads the few things the tool needs from a PDF the renderer wrote (its page count and the
 * trailer's document ID) straight from the bytes. Decoding a whole package into a String and
 * running a regular expression over it copied every byte twice and cost up to a few per cent of a
 * warm build; these scans touch each byte once and allocate nothing.
 */
public final class PdfBytes {
    private static final byte[] TYPE = ascii("/Type");
    private static final byte[] PAGE = ascii("/Page");
    private static final byte[] ID = ascii("/ID");

    private PdfBytes() {}

    /**
     * Page objects in a PDF whose page dictionaries are not compressed (the renderer writes them
     * so): each {@code /Type /Page} not followed by a letter, digit or underscore ({@code /Pages}
     * is the page tree, not a page).
     */
    public static int pages(byte[] pdf) {
        int count = 0;
        int at = indexOf(pdf, TYPE, 0);
        while (at >= 0) {
            int next = skipWhitespace(pdf, at + TYPE.length);
            if (startsWith(pdf, PAGE, next) && !isNameCharacter(pdf, next + PAGE.length)) {
                count++;
                next += PAGE.length;
            }
            at = indexOf(pdf, TYPE, Math.max(next, at + 1));
        }
        return count;
    }

    /**
     * Where the last {@code /ID [<hex> <hex>]} in the file keeps its two hexadecimal strings: the
     * start and end (exclusive) of the first, then of the second; null when there is none.
     */
    static int[] lastId(byte[] pdf) {
        for (int at = lastIndexOf(pdf, ID, pdf.length - ID.length); at >= 0; at = lastIndexOf(pdf, ID, at - 1)) {
            int[] found = idAt(pdf, at + ID.length);
            if (found != null) {
                return found;
            }
        }
        return null;
    }

    /** The two strings of {@code [<hex> <hex>]} after the key, or null when what follows is not that. */
    private static int[] idAt(byte[] pdf, int from) {
        int i = skipWhitespace(pdf, from);
        if (i >= pdf.length || pdf[i] != '[') {
            return null;
        }
        int[] first = hexString(pdf, skipWhitespace(pdf, i + 1));
        if (first == null) {
            return null;
        }
        int[] second = hexString(pdf, skipWhitespace(pdf, first[1] + 1));
        if (second == null) {
            return null;
        }
        int close = skipWhitespace(pdf, second[1] + 1);
        if (close >= pdf.length || pdf[close] != ']') {
            return null;
        }
        return new int[] {first[0], first[1], second[0], second[1]};
    }

    /** A non-empty {@code <hex>} at {@code at}: its digits' start and end, or null. */
    private static int[] hexString(byte[] pdf, int at) {
        if (at >= pdf.length || pdf[at] != '<') {
            return null;
        }
        int end = at + 1;
        while (end < pdf.length && isHexDigit(pdf[end])) {
            end++;
        }
        if (end == at + 1 || end >= pdf.length || pdf[end] != '>') {
            return null;
        }
        return new int[] {at + 1, end};
    }

    private static int indexOf(byte[] bytes, byte[] what, int from) {
        int last = bytes.length - what.length;
        for (int i = from; i <= last; i++) {
            if (bytes[i] == what[0] && startsWith(bytes, what, i)) {
                return i;
            }
        }
        return -1;
    }

    private static int lastIndexOf(byte[] bytes, byte[] what, int from) {
        for (int i = Math.min(from, bytes.length - what.length); i >= 0; i--) {
            if (bytes[i] == what[0] && startsWith(bytes, what, i)) {
                return i;
            }
        }
        return -1;
    }

    private static boolean startsWith(byte[] bytes, byte[] what, int at) {
        if (at < 0 || at + what.length > bytes.length) {
            return false;
        }
        for (int j = 0; j < what.length; j++) {
            if (bytes[at + j] != what[j]) {
                return false;
            }
        }
        return true;
    }

    /** Java's {@code \s}: space, tab, line feed, vertical tab, form feed, carriage return. */
    private static int skipWhitespace(byte[] bytes, int at) {
        while (at < bytes.length && (bytes[at] == ' ' || (bytes[at] >= '\t' && bytes[at] <= '\r'))) {
            at++;
        }
        return at;
    }

    /** A letter, digit or underscore, which would make {@code /Page} part of a longer name. */
    private static boolean isNameCharacter(byte[] bytes, int at) {
        if (at >= bytes.length) {
            return false;
        }
        byte b = bytes[at];
        return (b >= 'a' && b <= 'z') || (b >= 'A' && b <= 'Z') || (b >= '0' && b <= '9') || b == '_';
    }

    private static boolean isHexDigit(byte b) {
        return (b >= '0' && b <= '9') || (b >= 'a' && b <= 'f') || (b >= 'A' && b <= 'F');
    }

    private static byte[] ascii(String s) {
        return s.getBytes(java.nio.charset.StandardCharsets.US_ASCII);
    }
}
