package org.cupel.project;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.SampleTable;
import org.cupel.config.CupelConfig;
import org.cupel.units.UnitChoice;

/**
 * Everything a QC review reads, parsed and typed: the samples and their roles, the reported values
 * of each analyte, the CRM catalog, the settings, and every input problem found on the way.
 *
 * @param name project name (from the config, else the folder name)
 * @param root the project folder, or {@code null} for a project built in memory
 * @param config settings in force
 * @param samples the sample table; row {@code i} is row {@code i} of each analyte column
 * @param analytes analyte columns by name, in the order first read
 * @param catalog the CRM catalog
 * @param exceptions every input problem, including rows left out
 * @param files row accounting per input file
 * @param units per analyte, the reporting unit and why it was chosen; empty for a project built in memory
 */
public record Project(String name, Path root, CupelConfig config, SampleTable samples,
                     Map<String, AnalyteColumn> analytes, CrmCatalog catalog, ExceptionRegister exceptions,
                     List<FileAccount> files, Map<String, UnitChoice> units) {

    public Project {
        analytes = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(analytes));
        files = List.copyOf(files);
        units = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(units));
    }

    /** A project whose units were not read from files (built in memory): each analyte's own unit stands. */
    public Project(String name, Path root, CupelConfig config, SampleTable samples,
                   Map<String, AnalyteColumn> analytes, CrmCatalog catalog, ExceptionRegister exceptions,
                   List<FileAccount> files) {
        this(name, root, config, samples, analytes, catalog, exceptions, files, Map.of());
    }

    public Optional<AnalyteColumn> analyte(String name) {
        return Optional.ofNullable(analytes.get(name));
    }

    public List<String> analyteNames() {
        return new ArrayList<>(analytes.keySet());
    }
}
