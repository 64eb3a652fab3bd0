package org.cupel.assay;

import org.cupel.units.GradeUnit;

/**
 * An analysed element or compound and the unit in which the project reports it. Every value of the
 * analyte held in a {@link org.cupel.project.Project} is already converted to {@link #unit()}.
 */
public record Analyte(String name, GradeUnit unit) {
    public Analyte {
        if (name == null || name.isBlank() || unit == null) {
            throw new IllegalArgumentException("an analyte needs a name and a unit");
        }
    }

    /** "Au (g/t)", for table headers and chart axes. */
    public String label() {
        return name + " (" + unit.symbol() + ")";
    }
}
