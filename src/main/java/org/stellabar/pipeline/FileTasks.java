package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import org.stellabar.physics.BadInputException;

/**
 * Independent file-writing tasks (a table, one chart in one width and format) run on all cores,
 * their files listed in task order, so that a parallel run lists, and writes, exactly what a
 * sequential one does. Each task writes its own files atomically; none reads another's.
 */
final class FileTasks {

    /** One unit of work: writes files and returns them in the order it wrote them. */
    @FunctionalInterface
    interface Task {
        List<Path> run() throws IOException;
    }

    /** One task and the file it will write. */
    record Planned(Path target, Task task) {
    }

    private final List<Planned> tasks = new ArrayList<>();

    /**
     * One helper thread per core beyond the first, kept for the process (daemon threads): a
     * thread keeps what it set up for one chart, such as the parsed font and the PNG canvas, for
     * its next.
     */
    private static final ThreadPoolExecutor HELPERS = helpers();

    /**
     * The order tasks are taken in: charts (tens of milliseconds each) before tables (a few),
     * each in task order, so that the last tasks, which one core may run while the other has
     * nothing left, are short ones.
     */
    private int[] chartsFirst() {
        int[] order = new int[tasks.size()];
        int k = 0;
        for (boolean chart : new boolean[] {true, false}) {
            for (int i = 0; i < tasks.size(); i++) {
                String name = tasks.get(i).target().getFileName().toString();
                if (chart == (name.endsWith(".png") || name.endsWith(".pdf") || name.endsWith(".svg"))) {
                    order[k++] = i;
                }
            }
        }
        return order;
    }

    /** A helper's share of the work: run once if it starts before it is called off. */
    private static final class Helper implements Runnable {
        private final Runnable work;
        /** 0 waiting, 1 started, 2 called off. */
        private final AtomicInteger state = new AtomicInteger();
        private final CountDownLatch done = new CountDownLatch(1);

        Helper(Runnable work) {
            this.work = work;
        }

        @Override
        public void run() {
            if (state.compareAndSet(0, 1)) {
                try {
                    work.run();
                } finally {
                    done.countDown();
                }
            }
        }

        /** Calls the helper off if it has not started, else waits for it to end. */
        void finish() throws IOException {
            if (state.compareAndSet(0, 2)) {
                return;
            }
            try {
                done.await();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException("interrupted while waiting for the files being written", e);
            }
        }
    }

    private static ThreadPoolExecutor helpers() {
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors() - 1);
        AtomicInteger count = new AtomicInteger();
        return new ThreadPoolExecutor(threads, threads, 0L,
                TimeUnit.MILLISECONDS, new LinkedBlockingQueue<>(), r -> {
                    Thread t = new Thread(r, "file-tasks-" + count.incrementAndGet());
                    t.setDaemon(true);
                    return t;
                });
    }

    /**
     * @param target the file the task writes
     * @param task a task to run with the others
     */
    void add(Path target, Task task) {
        tasks.add(new Planned(target, task));
    }

    /** @param more tasks to run with the others, in their order */
    void addAll(List<Planned> more) {
        tasks.addAll(more);
    }

    /**
     * No two tasks of one run may write the same file (nor two names a case-insensitive file
     * system takes for one): checked before anything is written.
     */
    private void refuseSharedTargets() {
        Map<String, Path> seen = new HashMap<>();
        for (Planned p : tasks) {
            Path earlier = seen.putIfAbsent(p.target().toAbsolutePath().normalize().toString().toLowerCase(Locale.ROOT),
                    p.target());
            if (earlier != null) {
                throw new BadInputException("two outputs of this run would be written to the same file: " + earlier
                        + " and " + p.target() + "; give the stars names that differ beyond case and punctuation");
            }
        }
    }

    /**
     * Runs every task, in parallel, and lists their files in task order.
     *
     * @return the files written
     * @throws IOException the first failure in task order among the tasks run (after a failure no
     *     further task starts; every task started has ended by then)
     */
    List<Path> runAll() throws IOException {
        refuseSharedTargets();
        int n = tasks.size();
        List<List<Path>> results = new ArrayList<>(Collections.nCopies(n, null));
        Throwable[] failures = new Throwable[n];
        int[] order = chartsFirst();
        AtomicInteger next = new AtomicInteger();
        AtomicBoolean failed = new AtomicBoolean();
        // One task at a time from a shared counter, on this thread and one helper per further
        // core: a parallel stream cut the list into four runs of tasks on two cores, and a chart
        // costs 10-50 ms, so one core could finish a quarter of a second before the other.
        Runnable work = () -> {
            // after a failure no new task starts; a task once taken always runs, so every task
            // taken before a failed one has run
            while (!failed.get()) {
                int taken = next.getAndIncrement();
                if (taken >= n) {
                    break;
                }
                int i = order[taken];
                try {
                    List<Path> written = tasks.get(i).task().run();
                    synchronized (results) {
                        results.set(i, written);
                    }
                } catch (IOException | RuntimeException | Error e) {
                    failures[i] = e;
                    failed.set(true);
                }
            }
        };
        // the helpers come from a pool of our own rather than the common pool, whose workers
        // another run's tasks (or a table's number formatting) may hold; a helper that has not
        // started when this thread runs out of tasks is called off, one that has is waited for
        List<Helper> helpers = new ArrayList<>();
        for (int h = 0; h < Math.min(n - 1, HELPERS.getCorePoolSize()); h++) {
            Helper helper = new Helper(work);
            helpers.add(helper);
            HELPERS.execute(helper);
        }
        work.run();
        for (Helper helper : helpers) {
            helper.finish();
        }
        // the first failure in task order (tasks are taken charts first, each kind in task
        // order: every earlier task of its kind has run)
        for (Throwable f : failures) {
            if (f instanceof IOException io) {
                throw io;
            }
            if (f instanceof RuntimeException re) {
                throw re;
            }
            if (f instanceof Error err) {
                throw err;
            }
        }
        List<Path> files = new ArrayList<>();
        synchronized (results) {
            results.forEach(files::addAll);
        }
        return files;
    }
}
