package org.ladderkin.observe;

import java.util.Objects;

/**
 * One risk of a planned measurement with the number behind it.
 *
 * @param name     short name ("steady-state heating")
 * @param verdict  pass, warn or fail
 * @param value    the predicted number, SI or a fraction
 * @param limit    the limit it was compared with, same unit
 * @param unit     unit of value and limit as shown to people ("K", "", "fraction")
 * @param why      one sentence: what the number means and what to change
 */
public record Risk(String name, Verdict verdict, double value, double limit, String unit, String why) {

    public Risk {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(why, "why");
    }
}
