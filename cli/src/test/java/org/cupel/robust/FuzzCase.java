package org.cupel.robust;

import java.util.List;
import java.util.Random;

/**
 * One generated input of the fuzz properties: the target, the damage done to its well-formed file (none
 * for raw random bytes), the resulting bytes, and the seed that makes exactly this case again
 * ({@code FuzzCase.damaged(seed, targets)} or {@code FuzzCase.randomBytes(seed, targets, max)}).
 */
record FuzzCase(long seed, FuzzTarget target, List<Mutation> damage, byte[] content) {
    /** Characters of the input shown in a failure message. */
    private static final int SHOWN = 600;

    /** A target drawn from {@code targets} and one to four mutations of its file, all from {@code seed}. */
    static FuzzCase damaged(long seed, List<FuzzTarget> targets) {
        Random r = new Random(seed);
        FuzzTarget t = targets.get(r.nextInt(targets.size()));
        List<Mutation> m = Mutation.some(r);
        return new FuzzCase(seed, t, m, Mutation.applyAll(t.seed(), m));
    }

    /** A target drawn from {@code targets} and up to {@code maxBytes} random bytes in place of its file. */
    static FuzzCase randomBytes(long seed, List<FuzzTarget> targets, int maxBytes) {
        Random r = new Random(seed);
        FuzzTarget t = targets.get(r.nextInt(targets.size()));
        byte[] b = new byte[r.nextInt(maxBytes + 1)];
        r.nextBytes(b);
        return new FuzzCase(seed, t, List.of(), b);
    }

    Mutation.RegisterLayout registerLayout() {
        return Mutation.registerLayout(damage);
    }

    /** Short, for a test's display name. */
    String title() {
        return "seed " + seed + ": " + target + " " + (damage.isEmpty() ? "random bytes" : damage);
    }

    /** Everything needed to see and replay a failing case: the seed, target, damage and the input itself. */
    String describe() {
        StringBuilder sb = new StringBuilder(title()).append(", register layout ").append(registerLayout())
                .append("; input (").append(content.length).append(" bytes): ");
        for (int i = 0; i < Math.min(content.length, SHOWN); i++) {
            int b = content[i] & 0xFF;
            if (b == '\n') {
                sb.append("\\n");
            } else if (b >= 0x20 && b < 0x7F && b != '\\') {
                sb.append((char) b);
            } else {
                sb.append(String.format("\\x%02X", b));
            }
        }
        return sb.append(content.length > SHOWN ? "…" : "").toString();
    }
}
