package org.cupel.report;

/** Told of each step while a report is written, for a progress bar. */
public interface ReportProgress {
    /** Silent. */
    ReportProgress NONE = new ReportProgress() {
        @Override
        public void start(long steps) {
        }

        @Override
        public void step(String what) {
        }
    };

    /** Called once with the number of steps that follow. */
    void start(long steps);

    /** One step done; {@code what} names the next piece of work. */
    void step(String what);
}
