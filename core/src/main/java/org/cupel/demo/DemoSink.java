package org.cupel.demo;

import java.io.IOException;
import java.io.Writer;

/**
 * Where the demo generator writes its files. Core never touches the file system: the CLI supplies a
 * sink backed by a folder, tests an in-memory one. Several writers may be open at once (the register
 * stays open while the lab files of each batch are written); the generator closes every writer it opens.
 */
@FunctionalInterface
public interface DemoSink {

    /**
     * Opens a new text file for writing.
     *
     * @param relativePath path inside the project folder with {@code /} separators, e.g. {@code lab/OAL-00001.csv}
     * @return a writer that encodes UTF-8 text; the generator writes line endings and any byte-order mark itself
     */
    Writer open(String relativePath) throws IOException;
}
