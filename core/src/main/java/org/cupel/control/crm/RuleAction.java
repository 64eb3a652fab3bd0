package org.cupel.control.crm;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;
import org.cupel.control.Verdict;

/** What a violated rule does to the result that completes it: nothing, a warning, or a failure. */
public enum RuleAction {
    OFF,
    WARN,
    FAIL;

    /**
     * Reads off / warn / fail, case-insensitive. YAML 1.1 reads an unquoted {@code off} or {@code no} as
     * boolean false, so "false" and "no" also mean OFF.
     */
    @JsonCreator
    public static RuleAction parse(String text) {
        String t = text.strip();
        if (t.equalsIgnoreCase("false") || t.equalsIgnoreCase("no")) {
            return OFF;
        }
        for (RuleAction a : values()) {
            if (a.name().equalsIgnoreCase(t)) {
                return a;
            }
        }
        throw new IllegalArgumentException("rule action '" + text + "' is not one of off, warn, fail (quote the "
                + "value: \"warn\")");
    }

    @JsonValue
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The verdict a violation with this action gives; PASS for OFF. */
    public Verdict verdict() {
        switch (this) {
            case FAIL: return Verdict.FAIL;
            case WARN: return Verdict.WARN;
            default: return Verdict.PASS;
        }
    }
}
