package org.stellabar.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.physics.BadInputException;

class FileTasksTest {

    @Test
    void filesAreListedInTaskOrder(@TempDir Path dir) throws Exception {
        FileTasks tasks = new FileTasks();
        for (int i = 0; i < 50; i++) {
            Path target = dir.resolve("f" + i);
            tasks.add(target, () -> List.of(Files.writeString(target, "x")));
        }
        List<Path> files = tasks.runAll();
        for (int i = 0; i < 50; i++) {
            assertEquals(dir.resolve("f" + i), files.get(i));
        }
    }

    /** Two tasks of one run writing one file (also differing only in case) are refused before any runs. */
    @Test
    void twoTasksForOneFileAreRefusedBeforeAnyRuns(@TempDir Path dir) {
        AtomicInteger ran = new AtomicInteger();
        FileTasks tasks = new FileTasks();
        tasks.add(dir.resolve("cluster-support-1col.png"), () -> List.of(dir.resolve("a" + ran.incrementAndGet())));
        tasks.add(dir.resolve("Cluster-Support-1col.png"), () -> List.of(dir.resolve("b" + ran.incrementAndGet())));
        BadInputException e = assertThrows(BadInputException.class, tasks::runAll);
        assertTrue(e.getMessage().contains("same file"), e.getMessage());
        assertEquals(0, ran.get());
    }

    /**
     * Tasks are taken one at a time by several threads: a failure stops new tasks from starting,
     * every task before it has run, and the failure first in task order is the one thrown (here
     * two fail; the earlier one, whichever thread met it, is reported).
     */
    @Test
    void theFirstFailureInTaskOrderIsThrownAfterEveryEarlierTaskRan(@TempDir Path dir) {
        for (int round = 0; round < 20; round++) {
            boolean[] ran = new boolean[40];
            FileTasks tasks = new FileTasks();
            for (int i = 0; i < 40; i++) {
                int k = i;
                Path target = dir.resolve("r" + round + "-" + i);
                tasks.add(target, () -> {
                    ran[k] = true;
                    if (k == 17 || k == 18) {
                        throw new java.io.IOException("task " + k + " failed");
                    }
                    return List.of(target);
                });
            }
            java.io.IOException e = assertThrows(java.io.IOException.class, tasks::runAll);
            assertEquals("task 17 failed", e.getMessage());
            for (int i = 0; i < 17; i++) {
                assertTrue(ran[i], "task " + i + " before the failure ran");
            }
        }
    }
}
