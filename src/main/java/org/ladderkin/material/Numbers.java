package org.ladderkin.material;

import java.util.Locale;

/** Numbers in messages: a few significant digits, trailing zeros dropped ("9 nm", not "9.00 nm"). */
public final class Numbers {

    private Numbers() {
    }

    /** {@code v} with at most {@code significant} significant digits, trailing zeros removed. */
    public static String sig(double v, int significant) {
        String s = String.format(Locale.ROOT, "%." + significant + "g", v);
        int e = s.indexOf('e');
        String mant = e < 0 ? s : s.substring(0, e);
        String exp = e < 0 ? "" : s.substring(e);
        if (mant.contains(".")) {
            mant = mant.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return mant + exp;
    }
}
