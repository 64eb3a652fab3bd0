package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.cupel.project.FileAccount;
import org.cupel.project.InputException;
import org.cupel.project.Project;

/**
 * Messy and hostile lab files: the readers either return a result or stop with an {@link InputException}
 * naming the file, never another exception; and every file read balances its rows.
 */
class IngestFuzzProperties {
    private static final String CHARS = ",;\t\"\r\n  abcAuRS019.<>-=+BDLNRIS/%\u0000\uFEFF\u00e9\u00a0";

    @Provide
    Arbitrary<byte[]> messyFiles() {
        Arbitrary<byte[]> texty = Arbitraries.strings().withChars(CHARS.toCharArray()).ofMaxLength(3000)
                .map(s -> s.getBytes(StandardCharsets.UTF_8));
        Arbitrary<byte[]> tableLike = Combinators.combine(
                Arbitraries.of("sample_id,Au_ppm,Ag ppm\n", "Lab: X\nJob: 1\nSample ID;Au (g/t)\n", "id\tCu %\n",
                        "Sample,Au_ppm_FA-AAS,Au_ppm_FA-GRAV\r\n", ""),
                Arbitraries.strings().withChars(CHARS.toCharArray()).ofMaxLength(2000))
                .as((h, body) -> (h + body).getBytes(StandardCharsets.UTF_8));
        Arbitrary<byte[]> raw = Arbitraries.bytes().array(byte[].class).ofMaxSize(2000);
        return Arbitraries.oneOf(texty, tableLike, tableLike, raw);
    }

    @Property(tries = 300)
    void tableReaderReturnsATableOrAnInputError(@ForAll("messyFiles") byte[] content) throws IOException {
        Path f = Files.createTempFile("cupel-fuzz", ".csv");
        try {
            Files.write(f, content);
            RawTable t = TableReader.read(f);
            assertTrue(t.rows().stream().noneMatch(RawRow::isBlank));
        } catch (InputException expected) {
            assertTrue(expected.getMessage().startsWith(f.toString()), expected.getMessage());
        } finally {
            Files.deleteIfExists(f);
        }
    }

    @Property(tries = 200)
    void everyFileOfAMessyProjectBalances(@ForAll("messyFiles") byte[] lab, @ForAll("messyFiles") byte[] register)
            throws IOException {
        Path dir = Files.createTempDirectory("cupel-fuzz");
        try {
            Files.createDirectories(dir.resolve("lab"));
            Files.write(dir.resolve("lab/a.csv"), lab);
            Files.writeString(dir.resolve("lab/b.csv"), "sample_id,Au_ppm\nS1,0.5\nS2,<0.01\n");
            Files.write(dir.resolve("register.csv"), register);
            Project p = ProjectLoader.inspect(dir);
            for (FileAccount a : p.files()) {
                assertTrue(a.balances(), a.toString());
            }
            assertTrue(p.files().stream().anyMatch(a -> a.file().equals("lab/b.csv") && a.rowsRead() == 2));
        } finally {
            try (Stream<Path> s = Files.walk(dir)) {
                s.sorted(Comparator.reverseOrder()).forEach(x -> x.toFile().delete());
            }
        }
    }
}
