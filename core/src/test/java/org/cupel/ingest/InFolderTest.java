package org.cupel.ingest;

import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.io.TempDir;

/** A test that writes its inputs into a fresh temporary project folder per test. */
abstract class InFolderTest {
    @TempDir
    Path tmp;
    ProjectFolder folder;

    @BeforeEach
    void newFolder() {
        folder = new ProjectFolder(tmp);
    }
}
