package org.stellabar.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * A one-node Slurm cluster on this machine for one test: munge (started only if none answers),
 * slurmctld and slurmd with every file in one temporary folder, started in about a second and
 * stopped in {@link #close}, which the test calls in a {@code finally} (try-with-resources) so no
 * daemon outlives it. Needs root and Debian's {@code slurm-wlm} and {@code munge}; fails loudly
 * when either is missing. Set-up facts (no systemd here; munged as user munge; a node name equal
 * to {@code hostname -s}; {@code proctrack/linuxproc} and {@code task/none}, no cgroup.conf)
 * follow a set-up tried on this kind of machine.
 */
final class OneNodeSlurm implements AutoCloseable {

    private final Path folder;
    private final Path conf;
    private final List<Path> pidFiles = new ArrayList<>();
    private Path startedMunge;

    private OneNodeSlurm(Path folder) {
        this.folder = folder;
        this.conf = folder.resolve("slurm.conf");
    }

    /**
     * Starts the cluster and waits until its node is idle.
     *
     * @param folder an empty folder for configuration, state, pid and log files
     * @return the running cluster
     * @throws IllegalStateException (failing the test) when Slurm cannot be started
     */
    static OneNodeSlurm start(Path folder) throws IOException, InterruptedException {
        for (String tool : List.of("/usr/sbin/slurmctld", "/usr/sbin/slurmd", "/usr/sbin/munged", "/usr/bin/sbatch",
                "/usr/bin/squeue", "/usr/bin/sinfo", "/usr/bin/munge", "/usr/bin/unmunge")) {
            if (!Files.isExecutable(Path.of(tool))) {
                throw new IllegalStateException(tool + " is missing: install Debian's slurm-wlm and munge"
                        + " (.ci/run does: apt-get install slurm-wlm munge)");
            }
        }
        if (!"0".equals(run(Map.of(), "id", "-u").strip())) {
            throw new IllegalStateException("starting slurmd needs root; run the integration tests as root, as CI does");
        }
        OneNodeSlurm cluster = new OneNodeSlurm(folder);
        try {
            cluster.startMunge();
            cluster.writeConf();
            cluster.startDaemon("/usr/sbin/slurmctld", "-i", "-f", cluster.conf.toString());
            cluster.startDaemon("/usr/sbin/slurmd", "-f", cluster.conf.toString());
            cluster.awaitIdle(Duration.ofSeconds(60));
            return cluster;
        } catch (IOException | InterruptedException | RuntimeException e) {
            cluster.close();
            throw e;
        }
    }

    /** @return the environment a Slurm client command (and a job it submits) needs */
    Map<String, String> environment() {
        return Map.of("SLURM_CONF", conf.toString());
    }

    private void startMunge() throws IOException, InterruptedException {
        if (mungeAnswers()) {
            return;
        }
        Path run = Path.of("/run/munge");
        Files.createDirectories(run);
        run(Map.of(), "chown", "munge:munge", run.toString());
        Process p = new ProcessBuilder("runuser", "-u", "munge", "--", "/usr/sbin/munged").redirectErrorStream(true)
                .start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor(20, TimeUnit.SECONDS);
        startedMunge = run.resolve("munged.pid");
        Instant until = Instant.now().plusSeconds(15);
        while (!mungeAnswers()) {
            if (Instant.now().isAfter(until)) {
                throw new IllegalStateException("munged did not start: " + out.strip());
            }
            Thread.sleep(200);
        }
    }

    private static boolean mungeAnswers() throws IOException, InterruptedException {
        Process p = new ProcessBuilder("bash", "-c", "munge -n | unmunge").redirectErrorStream(true).start();
        p.getInputStream().readAllBytes();
        return p.waitFor(10, TimeUnit.SECONDS) && p.exitValue() == 0;
    }

    private void writeConf() throws IOException, InterruptedException {
        String host = run(Map.of(), "hostname", "-s").strip();
        int cpus = Runtime.getRuntime().availableProcessors();
        long availableKb = 0;
        for (String line : Files.readAllLines(Path.of("/proc/meminfo"))) {
            if (line.startsWith("MemAvailable:")) {
                availableKb = Long.parseLong(line.replaceAll("[^0-9]", ""));
            }
        }
        long memoryMb = Math.max(512, availableKb / 1024 / 2);
        Path state = Files.createDirectories(folder.resolve("state"));
        Path spool = Files.createDirectories(folder.resolve("spool"));
        String text = String.join("\n",
                "ClusterName=stellabar-test",
                "SlurmctldHost=" + host + "(127.0.0.1)",
                "SlurmUser=root",
                "SlurmdUser=root",
                "AuthType=auth/munge",
                "StateSaveLocation=" + state,
                "SlurmdSpoolDir=" + spool,
                "SlurmctldPidFile=" + folder.resolve("slurmctld.pid"),
                "SlurmdPidFile=" + folder.resolve("slurmd.pid"),
                "SlurmctldLogFile=" + folder.resolve("slurmctld.log"),
                "SlurmdLogFile=" + folder.resolve("slurmd.log"),
                "ProctrackType=proctrack/linuxproc",
                "TaskPlugin=task/none",
                "JobAcctGatherType=jobacct_gather/none",
                "SelectType=select/cons_tres",
                "SelectTypeParameters=CR_Core",
                "ReturnToService=2",
                "MpiDefault=none",
                "NodeName=" + host + " NodeAddr=127.0.0.1 CPUs=" + cpus + " RealMemory=" + memoryMb + " State=UNKNOWN",
                "PartitionName=test Nodes=" + host + " Default=YES MaxTime=INFINITE State=UP",
                "");
        Files.writeString(conf, text);
        pidFiles.add(folder.resolve("slurmd.pid"));
        pidFiles.add(folder.resolve("slurmctld.pid"));
    }

    private void startDaemon(String... command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(30, TimeUnit.SECONDS) || p.exitValue() != 0) {
            throw new IllegalStateException(command[0] + " did not start: " + out.strip() + log(command[0]));
        }
    }

    private void awaitIdle(Duration limit) throws IOException, InterruptedException {
        Instant until = Instant.now().plus(limit);
        String state = "";
        while (Instant.now().isBefore(until)) {
            ProcessBuilder p = new ProcessBuilder("timeout", "5", "sinfo", "-h", "-o", "%t").redirectErrorStream(true);
            p.environment().putAll(environment());
            Process started = p.start();
            state = new String(started.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
            started.waitFor();
            if (state.equals("idle")) {
                return;
            }
            Thread.sleep(250);
        }
        throw new IllegalStateException("the Slurm node did not become idle in " + limit.toSeconds() + " s (sinfo: "
                + state + ")" + log("slurmctld") + log("slurmd"));
    }

    private String log(String daemon) {
        Path log = folder.resolve(Path.of(daemon).getFileName() + ".log");
        try {
            List<String> lines = Files.exists(log) ? Files.readAllLines(log) : List.of();
            return lines.isEmpty() ? "" : "; " + log + " ends: " + String.join(" | ",
                    lines.subList(Math.max(0, lines.size() - 5), lines.size()));
        } catch (IOException e) {
            return "";
        }
    }

    /** Stops the daemons this cluster started (and a munged it started), waiting until they are gone. */
    @Override
    public void close() {
        List<Long> pids = new ArrayList<>();
        for (Path f : pidFiles) {
            readPid(f).ifPresent(pids::add);
        }
        if (startedMunge != null) {
            readPid(startedMunge).ifPresent(pids::add);
        }
        for (long pid : pids) {
            ProcessHandle.of(pid).ifPresent(ProcessHandle::destroy);
        }
        Instant until = Instant.now().plusSeconds(5);
        for (long pid : pids) {
            while (alive(pid) && Instant.now().isBefore(until)) {
                sleep();
            }
            // a leftover slurmd keeps its port and would answer for the next cluster
            ProcessHandle.of(pid).filter(h -> alive(pid)).ifPresent(ProcessHandle::destroyForcibly);
        }
    }

    private static java.util.Optional<Long> readPid(Path f) {
        try {
            return java.util.Optional.of(Long.parseLong(Files.readString(f).strip()));
        } catch (IOException | NumberFormatException e) {
            return java.util.Optional.empty();
        }
    }

    /** Alive and not a zombie (PID 1 here may not reap, and a zombie holds no port). */
    private static boolean alive(long pid) {
        try {
            String stat = Files.readString(Path.of("/proc/" + pid + "/stat"));
            return !stat.substring(stat.lastIndexOf(')') + 2).startsWith("Z");
        } catch (IOException e) {
            return false;
        }
    }

    private static void sleep() {
        try {
            Thread.sleep(100);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    static String run(Map<String, String> env, String... command) throws IOException, InterruptedException {
        ProcessBuilder b = new ProcessBuilder(command).redirectErrorStream(true);
        b.environment().putAll(env);
        Process p = b.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor();
        return out;
    }
}
