package org.congener.bench.streams;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.congener.broker.EmbeddedKafkaBroker;

/**
 * The embedded broker in a JVM of its own, for the end-to-end harness: the layout of a deployment, where
 * the app's heap, garbage collections and JIT hold the app alone. The child prints its bootstrap address
 * on one line and runs until its standard input closes, so it cannot outlive the harness that started it.
 */
public final class BrokerProcess implements AutoCloseable {

    private static final String READY = "bootstrap=";

    private final Process process;
    private final String bootstrapServers;

    private BrokerProcess(Process process, String bootstrapServers) {
        this.process = process;
        this.bootstrapServers = bootstrapServers;
    }

    /** Starts the child JVM on this JVM's class path with the given heap, data in {@code dataDir}. */
    public static BrokerProcess start(Path dataDir, String heap) throws IOException {
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx" + heap, "-Xms" + heap));
        // further flags of the child (GC logging, collector), separated by spaces
        String flags = System.getProperty("broker.jvm", "").trim();
        if (!flags.isEmpty()) {
            command.addAll(List.of(flags.split("\\s+")));
        }
        command.addAll(List.of("-cp", System.getProperty("java.class.path"),
                BrokerProcess.class.getName(), dataDir.toString()));
        Process process = new ProcessBuilder(command)
                .redirectError(ProcessBuilder.Redirect.INHERIT)
                .start();
        BufferedReader out = new BufferedReader(new InputStreamReader(process.getInputStream(), StandardCharsets.UTF_8));
        for (String line = out.readLine(); line != null; line = out.readLine()) {
            if (line.startsWith(READY)) {
                drain(out);
                return new BrokerProcess(process, line.substring(READY.length()).trim());
            }
            System.err.println("[broker] " + line);
        }
        process.destroyForcibly();
        throw new IOException("the broker process ended before it printed its address (exit "
                + process.exitValue() + ")");
    }

    /** Forwards the child's later output, which would otherwise fill the pipe and stall the broker. */
    private static void drain(BufferedReader out) {
        Thread drain = new Thread(() -> {
            try {
                for (String line = out.readLine(); line != null; line = out.readLine()) {
                    System.err.println("[broker] " + line);
                }
            } catch (IOException e) {
                // the child has ended
            }
        }, "broker-output");
        drain.setDaemon(true);
        drain.start();
    }

    public String bootstrapServers() {
        return bootstrapServers;
    }

    public long pid() {
        return process.pid();
    }

    /** Closes the child's input, which stops its broker cleanly; forces it after 60 s. */
    @Override
    public void close() throws IOException {
        process.getOutputStream().close();
        try {
            if (!process.waitFor(60, TimeUnit.SECONDS)) {
                process.destroyForcibly();
            }
        } catch (InterruptedException e) {
            process.destroyForcibly();
            Thread.currentThread().interrupt();
        }
    }

    /** The child: argument the data folder. */
    public static void main(String[] args) throws IOException {
        try (EmbeddedKafkaBroker broker = EmbeddedKafkaBroker.builder().dataDir(Path.of(args[0])).port(0).start()) {
            System.out.println(READY + broker.bootstrapServers());
            System.out.flush();
            // the parent holds the other end; its exit or close ends this loop
            while (System.in.read() >= 0) {
                // input carries nothing; it is only the parent's lifeline
            }
        }
    }
}
