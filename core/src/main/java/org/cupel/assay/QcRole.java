package org.cupel.assay;

import java.util.Locale;
import java.util.Optional;

/** What a sample is for: a routine sample, or one of the control samples inserted to check the lab. */
public enum QcRole {
    ROUTINE("routine"),
    CRM("CRM"),
    BLANK("blank"),
    FIELD_DUPLICATE("field duplicate"),
    COARSE_DUPLICATE("coarse-reject duplicate"),
    PULP_DUPLICATE("pulp duplicate"),
    LAB_REPEAT("lab repeat"),
    UMPIRE("umpire check");

    private final String label;

    QcRole(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    /** Duplicates of every kind refer to an original sample by ID. */
    public boolean isDuplicate() {
        return this == FIELD_DUPLICATE || this == COARSE_DUPLICATE || this == PULP_DUPLICATE
                || this == LAB_REPEAT || this == UMPIRE;
    }

    /**
     * Reads the role codes written in a sample register. Accepts the enum name and common spellings:
     * {@code STD}, {@code standard}, {@code CRM}, {@code BLK}, {@code blank}, {@code FD}/{@code field dup},
     * {@code CD}/{@code coarse dup}/{@code crush dup}, {@code PD}/{@code pulp dup}, {@code LR}/{@code repeat},
     * {@code UMP}/{@code umpire}, and empty/{@code sample}/{@code routine} for routine samples.
     */
    public static Optional<QcRole> parse(String code) {
        if (code == null) {
            return Optional.of(ROUTINE);
        }
        String c = code.strip().toLowerCase(Locale.ROOT).replace('-', ' ').replace('_', ' ');
        switch (c) {
            case "": case "routine": case "sample": case "primary": case "original": case "smp":
                return Optional.of(ROUTINE);
            case "crm": case "std": case "standard": case "srm": case "reference material":
                return Optional.of(CRM);
            case "blank": case "blk": case "bl": case "coarse blank": case "pulp blank":
                return Optional.of(BLANK);
            case "field duplicate": case "field dup": case "fd": case "fdup": case "field":
                return Optional.of(FIELD_DUPLICATE);
            case "coarse duplicate": case "coarse reject duplicate": case "coarse dup": case "cd": case "crush dup":
            case "coarse reject": case "coarse":
                return Optional.of(COARSE_DUPLICATE);
            case "pulp duplicate": case "pulp dup": case "pd": case "pdup": case "pulp":
                return Optional.of(PULP_DUPLICATE);
            case "lab repeat": case "repeat": case "lr": case "rpt": case "lab duplicate": case "lab dup":
                return Optional.of(LAB_REPEAT);
            case "umpire": case "umpire check": case "ump": case "check assay": case "inter lab":
                return Optional.of(UMPIRE);
            default:
                for (QcRole r : values()) {
                    if (r.name().toLowerCase(Locale.ROOT).replace('_', ' ').equals(c)) {
                        return Optional.of(r);
                    }
                }
                return Optional.empty();
        }
    }
}
