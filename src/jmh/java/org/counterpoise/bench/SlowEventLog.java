package org.counterpoise.bench;

import java.awt.AWTEvent;
import java.awt.Component;
import java.awt.EventQueue;
import java.awt.Toolkit;
import java.awt.event.InvocationEvent;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Every event the Swing event thread dispatches for longer than a bound, with what it was (issue
 * 17; docs/performance.md, "Long events on the wizard's event thread"). Installed by {@link #install}
 * as the top of the system event queue: it times each {@code dispatchEvent}, and a sampler thread
 * takes the event thread's stack every 5 ms while an event runs longer than 20 ms, so a long event
 * says which of the project's methods it spent its time in (the innermost project frame that is not
 * this class, most frequent first) as well as its type and source, and the event thread's CPU time
 * for it (what a loaded machine does not stretch). Not production code.
 */
public final class SlowEventLog extends EventQueue {
    /** One event longer than the bound. */
    public record Slow(long startMs, long durationMs, long cpuMs, String phase, String event, String where) {
        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%6d ms (CPU %4d ms)  at %6d ms  [%s]  %s%n            in %s", durationMs,
                    cpuMs, startMs, phase, event, where);
        }
    }

    private final long boundNanos;
    private final ThreadMXBean threads = ManagementFactory.getThreadMXBean();
    private final long origin = System.nanoTime();
    private final List<Slow> slow = Collections.synchronizedList(new ArrayList<>());
    private volatile String phase = "start";
    private volatile Thread dispatcher;
    private volatile long eventStart;
    private volatile long eventSerial;
    /** Guards the fields below and the current event's (not the queue itself: EventQueue has locks of its own). */
    private final Object lock = new Object();
    private final Map<String, Integer> samples = new HashMap<>();
    private long sampledSerial = -1;
    private long dispatched;

    private SlowEventLog(long boundMs) {
        this.boundNanos = boundMs * 1_000_000L;
    }

    /**
     * @param boundMs events longer than this are kept
     * @return the log, now the top of the system event queue, its sampler running (daemon)
     */
    public static SlowEventLog install(long boundMs) {
        SlowEventLog log = new SlowEventLog(boundMs);
        Toolkit.getDefaultToolkit().getSystemEventQueue().push(log);
        Thread sampler = new Thread(log::sample, "slow-event-sampler");
        sampler.setDaemon(true);
        sampler.start();
        return log;
    }

    /** @param name what the user (or the start-up) is doing from now: printed beside each slow event */
    public void phase(String name) {
        this.phase = name;
    }

    /** @return the events longer than the bound so far, in order */
    public List<Slow> slow() {
        synchronized (slow) {
            return List.copyOf(slow);
        }
    }

    /** @return how many events were dispatched so far */
    public long dispatched() {
        synchronized (lock) {
            return dispatched;
        }
    }

    @Override
    protected void dispatchEvent(AWTEvent event) {
        long start = System.nanoTime();
        long cpuStart = threads.getCurrentThreadCpuTime();
        synchronized (lock) {
            dispatcher = Thread.currentThread();
            eventSerial++;
            eventStart = start;
            dispatched++;
        }
        String phaseAtStart = phase;
        try {
            super.dispatchEvent(event);
        } finally {
            long took = System.nanoTime() - start;
            long cpu = threads.getCurrentThreadCpuTime() - cpuStart;
            String where;
            synchronized (lock) {
                eventStart = 0;
                where = samples.entrySet().stream().sorted(Map.Entry.<String, Integer>comparingByValue().reversed())
                        .limit(3).map(e -> e.getKey() + " x" + e.getValue()).collect(Collectors.joining(", "));
                samples.clear();
            }
            if (took > boundNanos) {
                slow.add(new Slow((start - origin) / 1_000_000L, took / 1_000_000L, cpu / 1_000_000L, phaseAtStart,
                        describe(event), where.isEmpty() ? "(not sampled)" : where));
            }
        }
    }

    private void sample() {
        while (true) {
            try {
                Thread.sleep(5);
            } catch (InterruptedException e) {
                return;
            }
            Thread edt;
            long serial;
            synchronized (lock) {
                if (eventStart == 0 || System.nanoTime() - eventStart < 20_000_000L) {
                    continue;
                }
                edt = dispatcher;
                serial = eventSerial;
            }
            String frame = innermostProjectFrame(edt.getStackTrace());
            synchronized (lock) {
                if (serial == eventSerial && eventStart != 0) {
                    if (sampledSerial != serial) {
                        samples.clear();
                        sampledSerial = serial;
                    }
                    samples.merge(frame, 1, Integer::sum);
                }
            }
        }
    }

    /** @return the innermost frame of the project's own code (not this harness), with its caller's, or the top frame */
    private static String innermostProjectFrame(StackTraceElement[] stack) {
        for (int i = 0; i < stack.length; i++) {
            String c = stack[i].getClassName();
            if (c.startsWith("org.counterpoise.") && !c.startsWith("org.counterpoise.bench.")) {
                String at = shortName(stack[i]);
                for (int j = i + 1; j < stack.length; j++) {
                    if (stack[j].getClassName().startsWith("org.counterpoise.")
                            && !stack[j].getClassName().startsWith("org.counterpoise.bench.")
                            && !stack[j].getClassName().equals(c)) {
                        return at + " < " + shortName(stack[j]);
                    }
                }
                return at;
            }
        }
        return stack.length == 0 ? "?" : "(no project frame) " + shortName(stack[0]);
    }

    private static String shortName(StackTraceElement f) {
        String c = f.getClassName();
        return c.substring(c.lastIndexOf('.') + 1) + "." + f.getMethodName() + ":" + f.getLineNumber();
    }

    private static String describe(AWTEvent event) {
        if (event instanceof InvocationEvent) {
            String s = event.paramString();
            int r = s.indexOf("runnable=");
            String runnable = r < 0 ? s : s.substring(r + 9).split(",")[0];
            return "InvocationEvent " + runnable.replaceAll("@[0-9a-f]+$", "").replaceAll("/0x[0-9a-f]+", "");
        }
        Object source = event.getSource();
        String name = source instanceof Component c && c.getName() != null ? " '" + c.getName() + "'" : "";
        String id = event.paramString().split(",")[0];
        return event.getClass().getSimpleName() + " " + id + " on " + source.getClass().getSimpleName() + name;
    }
}
