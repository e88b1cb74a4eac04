package org.holdfast.uncertain;

import java.util.Locale;

/** Numbers in messages: six significant digits, trailing zeros dropped (770, 1.5e+12, 0.2). */
final class Format {

    private Format() {
    }

    static String number(double v) {
        String s = String.format(Locale.ROOT, "%.6g", v);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        String exponent = e < 0 ? "" : s.substring(e);
        if (mantissa.indexOf('.') >= 0) {
            mantissa = mantissa.replaceAll("0+$", "");
            if (mantissa.endsWith(".")) {
                mantissa = mantissa.substring(0, mantissa.length() - 1);
            }
        }
        return mantissa + exponent;
    }
}
