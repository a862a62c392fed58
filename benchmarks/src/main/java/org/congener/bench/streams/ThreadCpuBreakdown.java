package org.congener.bench.streams;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadInfo;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;

/**
 * CPU time of every thread of this JVM, the JVM's own (collector, compiler) included, grouped by role:
 * where the two cores go during a burst besides the stream thread. Java threads are timed through
 * {@link ThreadMXBean} under their full names; the JVM's own threads through {@code /proc/self/task}
 * (Linux; 10 ms ticks), whose short names are enough for them.
 */
final class ThreadCpuBreakdown {

    private static final double TICK_NANOS = 1e9 / 100;

    private final Map<String, Long> nanosByGroup;

    private ThreadCpuBreakdown(Map<String, Long> nanosByGroup) {
        this.nanosByGroup = nanosByGroup;
    }

    static ThreadCpuBreakdown now() {
        Map<String, Long> byGroup = new HashMap<>();
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        long javaTotal = 0;
        for (ThreadInfo info : threads.getThreadInfo(threads.getAllThreadIds())) {
            if (info == null) {
                continue;
            }
            long cpu = Math.max(0, threads.getThreadCpuTime(info.getThreadId()));
            javaTotal += cpu;
            byGroup.merge(group(info.getThreadName()), cpu, Long::sum);
        }
        long tasksTotal = 0;
        Map<String, Long> jvmOwn = new HashMap<>();
        try (Stream<Path> tasks = Files.list(Path.of("/proc/self/task"))) {
            for (Path task : tasks.toList()) {
                String stat;
                try {
                    stat = Files.readString(task.resolve("stat"));
                } catch (IOException gone) {
                    continue;
                }
                String comm = stat.substring(stat.indexOf('(') + 1, stat.lastIndexOf(')'));
                long nanos = cpuNanos(stat);
                tasksTotal += nanos;
                String g = jvmGroup(comm);
                if (g != null) {
                    jvmOwn.merge(g, nanos, Long::sum);
                }
            }
        } catch (IOException | RuntimeException e) {
            // not Linux: the Java threads alone
            return new ThreadCpuBreakdown(byGroup);
        }
        byGroup.putAll(jvmOwn);
        long jvmOwnTotal = jvmOwn.values().stream().mapToLong(Long::longValue).sum();
        byGroup.put("(other native threads)", Math.max(0, tasksTotal - javaTotal - jvmOwnTotal));
        // the process's own count keeps the time of threads that have ended (a burst's producer)
        long processTotal;
        try {
            processTotal = processNanos();
        } catch (IOException e) {
            processTotal = tasksTotal;
        }
        byGroup.put("(threads ended)", Math.max(0, processTotal - tasksTotal));
        return new ThreadCpuBreakdown(byGroup);
    }

    private static long processNanos() throws IOException {
        return cpuNanos(Files.readString(Path.of("/proc/self/stat")));
    }

    /** User plus system time of a {@code stat} line, "pid (comm) state ...", in nanoseconds. */
    private static long cpuNanos(String stat) {
        // comm may hold spaces and parentheses: the fields start after the last ')'
        String[] f = stat.substring(stat.lastIndexOf(')') + 2).split(" ");
        return (long) ((Long.parseLong(f[11]) + Long.parseLong(f[12])) * TICK_NANOS);
    }

    /** Prints each group's CPU per event between {@code before} and this, the largest first. */
    void printSince(ThreadCpuBreakdown before, int events, String label) {
        Map<String, Long> diff = new HashMap<>();
        nanosByGroup.forEach((g, n) -> diff.put(g, n - before.nanosByGroup.getOrDefault(g, 0L)));
        long total = diff.values().stream().mapToLong(Long::longValue).sum();
        System.out.printf(Locale.ROOT, "[%s] CPU per event by thread, whole JVM %.0f µs:", label, total / 1e3 / events);
        List<Map.Entry<String, Long>> rows = diff.entrySet().stream()
                .filter(e -> e.getValue() / 1e3 / events >= 2)
                .sorted(Map.Entry.<String, Long>comparingByValue().reversed()).toList();
        for (Map.Entry<String, Long> e : rows) {
            System.out.printf(Locale.ROOT, " %s %.0f;", e.getKey(), e.getValue() / 1e3 / events);
        }
        System.out.println();
    }

    /** A Java thread's role: digits and the app's generated ids dropped, so that a pool counts as one. */
    private static String group(String name) {
        String g = name.replaceAll("[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}", "*")
                .replaceAll("(?<=[-#])[0-9]+", "#");
        return g.length() > 90 ? g.substring(0, 90) : g;
    }

    /** The JVM's own threads by their short Linux names; null for a Java thread. */
    private static String jvmGroup(String comm) {
        if (comm.startsWith("GC Thread") || comm.startsWith("G1 ")) {
            return "(JVM) garbage collector";
        }
        if (comm.startsWith("C2 Compiler") || comm.startsWith("C1 Compiler")) {
            return "(JVM) JIT compiler";
        }
        if (comm.equals("VM Thread") || comm.equals("VM Periodic Tas")) {
            return "(JVM) VM thread";
        }
        return null;
    }
}
