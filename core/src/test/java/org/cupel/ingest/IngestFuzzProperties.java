package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.DynamicTest.dynamicTest;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.cupel.project.FileAccount;
import org.cupel.project.InputException;
import org.cupel.project.Project;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Messy and hostile lab files: the readers either return a result or stop with an {@link InputException}
 * naming the file, never another exception; and every file read balances its rows. Inputs are texts of
 * the characters labs' files hold, table-like texts, tables of cells such as {@code 0,512}, {@code 1,234},
 * {@code 1e308} with one cell too many or too few (ragged rows, mixed decimal marks: issue 15), and raw
 * bytes; the project's register may be missing or misnamed. Each case is made from its own seed, and a
 * failure prints the seed and the input.
 */
class IngestFuzzProperties {
    private static final long SEED = 20_261_202_000L;
    private static final String CHARS = ",;\t\"\r\n  abcAuRS019.<>-=+BDLNRIS/%\u0000\uFEFF\u00e9\u00a0";
    private static final List<String> HEADERS = List.of("sample_id,Au_ppm,Ag ppm\n",
            "Lab: X\nJob: 1\nSample ID;Au (g/t)\n", "id\tCu %\n", "Sample,Au_ppm_FA-AAS,Au_ppm_FA-GRAV\r\n", "");
    private static final List<String> CELLS = List.of("0.5", "<0.005", "0,512", "1,234", "\"1,234.5\"", "\"0,7\"",
            "1e308", "1e160", "1e-400", "BDL", "", "S1", "-0.005", ">10", "2000000", "NR", "\"a,b\"");
    private static final List<String> REGISTER_NAMES = List.of("register.csv", "register.csv", "register.csv",
            "Register.csv", "register.tsv", "(none)", "(folder)", "(dangling link)");

    /** A messy file: texty, table-like (twice as likely), a table of awkward cells (twice), or raw bytes. */
    static byte[] messyFile(Random r) {
        switch (r.nextInt(6)) {
            case 0:
                return text(r, 3000).getBytes(StandardCharsets.UTF_8);
            case 1:
            case 2:
                return (HEADERS.get(r.nextInt(HEADERS.size())) + text(r, 2000)).getBytes(StandardCharsets.UTF_8);
            case 3:
            case 4:
                return cellTable(r);
            default:
                byte[] b = new byte[r.nextInt(2001)];
                r.nextBytes(b);
                return b;
        }
    }

    private static String text(Random r, int maxLength) {
        char[] c = new char[r.nextInt(maxLength + 1)];
        for (int i = 0; i < c.length; i++) {
            c[i] = CHARS.charAt(r.nextInt(CHARS.length()));
        }
        return new String(c);
    }

    /** A header of 2 to 4 columns, then rows of 1 to 5 awkward cells: ragged and mixed-mark rows among them. */
    private static byte[] cellTable(Random r) {
        char d = ",;\t".charAt(r.nextInt(3));
        String[] header = {"Sample ID", "Au_ppm", "Ag_ppm", "Cu_ppm"};
        int width = 2 + r.nextInt(3);
        StringBuilder sb = new StringBuilder(String.join(String.valueOf(d), List.of(header).subList(0, width)))
                .append('\n');
        for (int row = r.nextInt(30); row > 0; row--) {
            int cells = Math.max(1, width + r.nextInt(3) - 1);
            for (int c = 0; c < cells; c++) {
                sb.append(c == 0 ? "S" + row : d + CELLS.get(r.nextInt(CELLS.size())));
            }
            sb.append('\n');
        }
        return sb.toString().getBytes(StandardCharsets.UTF_8);
    }

    @TestFactory
    Stream<DynamicTest> tableReaderReturnsATableOrAnInputError() {
        return LongStream.range(SEED, SEED + 300).mapToObj(seed -> dynamicTest("seed " + seed, () -> {
            byte[] content = messyFile(new Random(seed));
            Path f = Files.createTempFile("cupel-fuzz", ".csv");
            try {
                Files.write(f, content);
                RawTable t = TableReader.read(f);
                assertTrue(t.rows().stream().noneMatch(RawRow::isBlank), () -> describe(seed, content));
            } catch (InputException expected) {
                assertTrue(expected.getMessage().startsWith(f.toString()),
                        () -> expected.getMessage() + "\n" + describe(seed, content));
            } finally {
                Files.deleteIfExists(f);
            }
        }));
    }

    @TestFactory
    Stream<DynamicTest> everyFileOfAMessyProjectBalances() {
        long first = SEED + 1_000;
        return LongStream.range(first, first + 200).mapToObj(seed -> dynamicTest("seed " + seed, () -> {
            Random r = new Random(seed);
            byte[] lab = messyFile(r);
            byte[] register = messyFile(r);
            String registerName = REGISTER_NAMES.get(r.nextInt(REGISTER_NAMES.size()));
            Path dir = Files.createTempDirectory("cupel-fuzz");
            try {
                Files.createDirectories(dir.resolve("lab"));
                Files.write(dir.resolve("lab/a.csv"), lab);
                Files.writeString(dir.resolve("lab/b.csv"), "sample_id,Au_ppm\nS1,0.5\nS2,<0.01\n");
                writeRegister(dir, registerName, register);
                Project p = ProjectLoader.inspect(dir);
                String input = "register as " + registerName + "; lab " + describe(seed, lab) + "; register "
                        + describe(seed, register);
                for (FileAccount a : p.files()) {
                    assertTrue(a.balances(), () -> a + " in " + input);
                }
                assertTrue(p.files().stream().anyMatch(a -> a.file().equals("lab/b.csv") && a.rowsRead() == 2),
                        () -> p.files() + " in " + input);
            } finally {
                try (Stream<Path> s = Files.walk(dir)) {
                    s.sorted(Comparator.reverseOrder()).forEach(x -> x.toFile().delete());
                }
            }
        }));
    }

    private static void writeRegister(Path dir, String name, byte[] content) throws IOException {
        switch (name) {
            case "(none)" -> {
            }
            case "(folder)" -> Files.write(Files.createDirectories(dir.resolve("register.csv")).resolve("x.csv"), content);
            case "(dangling link)" -> Files.createSymbolicLink(dir.resolve("register.csv"), dir.resolve("gone.csv"));
            default -> Files.write(dir.resolve(name), content);
        }
    }

    /** The seed and the input, printable: what a failure needs to be seen and replayed. */
    static String describe(long seed, byte[] content) {
        ByteArrayOutputStream shown = new ByteArrayOutputStream();
        for (int i = 0; i < Math.min(content.length, 600); i++) {
            int b = content[i] & 0xFF;
            String s = b == '\n' ? "\\n" : b >= 0x20 && b < 0x7F && b != '\\' ? String.valueOf((char) b)
                    : String.format("\\x%02X", b);
            shown.writeBytes(s.getBytes(StandardCharsets.US_ASCII));
        }
        return "seed " + seed + ", input (" + content.length + " bytes): " + shown.toString(StandardCharsets.US_ASCII)
                + (content.length > 600 ? "…" : "");
    }
}
