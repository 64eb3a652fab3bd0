package org.cupel.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;
import org.cupel.api.Cupel;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.project.InputException;
import org.cupel.project.Project;

/**
 * The demo project for {@code cupel report --demo}: generated with the default size and seed into a
 * temporary folder, read exactly as a user's folder would be (testwork included), and the folder deleted again.
 */
final class DemoProject {
    private DemoProject() {
    }

    static Cupel open(Path folderAlsoGiven) throws IOException {
        if (folderAlsoGiven != null) {
            throw new InputException("both --demo and the project folder " + folderAlsoGiven
                    + " were given; give one of them");
        }
        Path tmp = Files.createTempDirectory("cupel-demo-");
        try {
            DemoGenerator.generate(new DemoSettings(DemoSettings.DEFAULT_SAMPLES, DemoSettings.DEFAULT_SEED),
                    DemoCommand.folderSink(tmp));
            Cupel in = Cupel.open(tmp);
            Project p = in.project();
            // The generated folder has a temporary name; the demo's own name is the better title.
            return Cupel.of(new Project(p.config().projectName(DemoGenerator.PROJECT), null, p.config(),
                    p.samples(), p.analytes(), p.catalog(), p.exceptions(), p.files(), p.units()), in.recovery());
        } finally {
            try (Stream<Path> walk = Files.walk(tmp)) {
                for (Path p : (Iterable<Path>) walk.sorted(Comparator.reverseOrder())::iterator) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }
}
