package org.cupel.charts;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Places labels along one axis so that none overlaps the next, each as close to where it belongs as the others
 * allow. Labels that would overlap are joined into a run laid end to end and centred on the mean of where its
 * labels belong; runs that then overlap are joined in turn, and the runs are kept within the available span.
 * Where labels do not touch they stay where they belong. This is the pool-adjacent-violators scheme of
 * isotonic regression applied to label positions: it gives the placement with the least sum of squared
 * displacements that keeps the labels' order and spacing (common practice for dodging labels along a line).
 */
public final class LabelDodge {
    private LabelDodge() {
    }

    /**
     * The centres at which to draw the labels.
     *
     * @param wanted where each label's centre belongs
     * @param sizes each label's extent along the axis
     * @param gap space kept between neighbours
     * @param min start of the available span
     * @param max end of the available span; when the labels need more than the span they start at {@code min}
     *     and run past {@code max}
     * @return centres, in the order of {@code wanted}
     */
    public static double[] place(double[] wanted, double[] sizes, double gap, double min, double max) {
        int n = wanted.length;
        if (sizes.length != n) {
            throw new IllegalArgumentException("one size per label expected");
        }
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (p, q) -> Double.compare(wanted[p], wanted[q]));
        List<Run> runs = new ArrayList<>();
        for (int k : order) {
            Run r = new Run(k, wanted[k] - sizes[k] / 2, sizes[k], wanted[k] - sizes[k] / 2);
            runs.add(r);
            while (runs.size() > 1) {
                Run last = runs.get(runs.size() - 1);
                Run before = runs.get(runs.size() - 2);
                last.clamp(min, max);
                before.clamp(min, max);
                if (before.start + before.length + gap <= last.start) {
                    break;
                }
                runs.remove(runs.size() - 1);
                before.absorb(last, gap);
                before.clamp(min, max);
            }
            runs.get(runs.size() - 1).clamp(min, max);
        }
        double[] centres = new double[n];
        for (Run r : runs) {
            double at = r.start;
            for (int k : r.members) {
                centres[k] = at + sizes[k] / 2;
                at += sizes[k] + gap;
            }
        }
        return centres;
    }

    /** Labels laid end to end: where they start, how long they are, and the sum of their wanted starts. */
    private static final class Run {
        final List<Integer> members = new ArrayList<>();
        double start;
        double length;
        /** Σ (wanted start of member − its offset in the run): the run's best start is this over the count. */
        double sumWantedStart;

        Run(int member, double start, double length, double wantedStart) {
            members.add(member);
            this.start = start;
            this.length = length;
            this.sumWantedStart = wantedStart;
        }

        void absorb(Run next, double gap) {
            double offset = length + gap;
            // Each absorbed label wants the run to start its own offset before where it belongs.
            sumWantedStart += next.sumWantedStart - offset * next.members.size();
            members.addAll(next.members);
            length += gap + next.length;
            start = sumWantedStart / members.size();
        }

        void clamp(double min, double max) {
            double best = sumWantedStart / members.size();
            start = Math.max(min, Math.min(max - length, best));
        }
    }
}
