package org.stellabar.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
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
     * @throws IOException the first failure in task order (every task has ended by then)
     */
    List<Path> runAll() throws IOException {
        refuseSharedTargets();
        List<List<Path>> results;
        try {
            results = tasks.parallelStream().map(p -> unchecked(p.task())).toList();
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        List<Path> files = new ArrayList<>();
        results.forEach(files::addAll);
        return files;
    }

    private static List<Path> unchecked(Task task) {
        try {
            return task.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
