package org.cupel.ingest;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.Locale;
import java.util.Optional;

/**
 * Reads dates as the config's {@code ingest.dateFormat} says: {@code ISO} ({@code 2025-03-14}, also with a
 * time after it), {@code DMY} ({@code 14/03/2025}) or {@code MDY} ({@code 03/14/2025}), with {@code /},
 * {@code -} or {@code .} between the parts. ISO dates are read under every setting, as they cannot be
 * mistaken.
 */
final class DateCells {
    private DateCells() {
    }

    static Optional<LocalDate> parse(String text, String format) {
        String t = text.strip();
        if (t.length() >= 10 && t.charAt(4) == '-' && t.charAt(7) == '-') {
            return of(t.substring(0, 4), t.substring(5, 7), t.substring(8, 10));
        }
        String[] parts = t.split("[/.\\-]");
        if (parts.length != 3) {
            return Optional.empty();
        }
        String f = format.toUpperCase(Locale.ROOT);
        if (f.equals("DMY")) {
            return of(parts[2], parts[1], parts[0]);
        }
        if (f.equals("MDY")) {
            return of(parts[2], parts[0], parts[1]);
        }
        return Optional.empty();
    }

    private static Optional<LocalDate> of(String y, String m, String d) {
        try {
            int year = Integer.parseInt(y.strip());
            if (y.strip().length() != 4) {
                return Optional.empty();
            }
            return Optional.of(LocalDate.of(year, Integer.parseInt(m.strip()), Integer.parseInt(d.strip())));
        } catch (NumberFormatException | DateTimeException e) {
            return Optional.empty();
        }
    }
}
