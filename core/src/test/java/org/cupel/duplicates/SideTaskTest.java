package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;

class SideTaskTest {

    @Test
    void theWorkRunsExactlyOnceWhoeverRunsIt() {
        AtomicInteger runs = new AtomicInteger();
        List<SideTask<Integer>> tasks = new ArrayList<>();
        for (int i = 0; i < 200; i++) {
            int k = i;
            tasks.add(SideTask.start(() -> {
                runs.incrementAndGet();
                return k * k;
            }));
        }
        for (int i = 0; i < tasks.size(); i++) {
            assertEquals(i * i, tasks.get(i).join());
            assertEquals(i * i, tasks.get(i).join(), "a second join gives the same result");
        }
        assertEquals(200, runs.get());
    }

    /** An input error thrown on a spare thread reaches the caller as itself, not wrapped. */
    @Test
    void whatTheWorkThrowsIsRethrownAsItWas() {
        InputException thrown = new InputException("pairs.csv:3:2: not a number");
        SideTask<Object> task = SideTask.start(() -> {
            throw thrown;
        });
        assertSame(thrown, assertThrows(InputException.class, task::join));
        OutOfMemoryError oom = new OutOfMemoryError("Java heap space");
        assertSame(oom, assertThrows(OutOfMemoryError.class, SideTask.start(() -> {
            throw oom;
        })::join));
    }

    /**
     * A side task that starts and joins side tasks of its own (as a set analysed on a spare thread would):
     * with one spare thread busy running the outer task, the inner ones are claimed by their caller, so this
     * finishes instead of waiting for a thread that is waiting for it.
     */
    @Test
    void nestedSideTasksFinish() {
        List<SideTask<Integer>> outer = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            int k = i;
            outer.add(SideTask.start(() -> {
                SideTask<Integer> a = SideTask.start(() -> k + 1);
                SideTask<Integer> b = SideTask.start(() -> k + 2);
                return a.join() + b.join();
            }));
        }
        for (int i = 0; i < outer.size(); i++) {
            assertEquals(2 * i + 3, outer.get(i).join());
        }
    }

    @Test
    void inPlaceRunsOnTheCallingThreadAtJoin() {
        Thread caller = Thread.currentThread();
        SideTask<Thread> task = SideTask.inPlace(Thread::currentThread);
        assertSame(caller, task.join());
    }
}
