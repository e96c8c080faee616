package org.quire.app.ui;

import java.awt.EventQueue;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Watches the event thread from outside: posts an empty task every few milliseconds and records the longest wait
 * for it, with the event thread's stack the last time a wait went past half the limit.
 */
final class EdtWatchdog implements AutoCloseable {
    private final long limitMillis;
    private final AtomicBoolean running = new AtomicBoolean(true);
    private final AtomicLong worst = new AtomicLong();
    private final AtomicLong pingSent = new AtomicLong();
    private final StringBuilder blocked = new StringBuilder();
    private final Thread watchdog;
    private final Thread sampler;

    EdtWatchdog(long limitMillis) throws Exception {
        this.limitMillis = limitMillis;
        Thread[] edt = new Thread[1]; // the event thread may be replaced after an exception: kept current
        EventQueue.invokeAndWait(() -> edt[0] = Thread.currentThread());
        watchdog = new Thread(() -> {
            while (running.get()) {
                long t0 = System.nanoTime();
                pingSent.set(t0);
                try {
                    EventQueue.invokeAndWait(() -> edt[0] = Thread.currentThread());
                } catch (Exception e) {
                    return;
                }
                pingSent.set(0);
                worst.accumulateAndGet((System.nanoTime() - t0) / 1_000_000, Math::max);
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    return;
                }
            }
        }, "edt-watchdog");
        sampler = new Thread(() -> {
            while (running.get()) {
                long sent = pingSent.get();
                if (sent != 0 && (System.nanoTime() - sent) / 1_000_000 > limitMillis / 2) {
                    synchronized (blocked) {
                        if (Boolean.getBoolean("quire.watchdog.print")) {
                            System.out.println("EDT busy: " + blocked);
                        }
                        blocked.setLength(0);
                        blocked.append("the event thread was busy in:\n");
                        for (StackTraceElement f : edt[0].getStackTrace()) {
                            blocked.append("  at ").append(f).append("\n");
                        }
                    }
                }
                try {
                    Thread.sleep(20);
                } catch (InterruptedException e) {
                    return;
                }
            }
        }, "edt-sampler");
        sampler.setDaemon(true);
        sampler.start();
        watchdog.start();
    }

    /** @return the longest wait for the event thread so far, in milliseconds */
    long worstMillis() {
        return worst.get();
    }

    /** @return whether no wait went past the limit */
    boolean withinLimit() {
        return worst.get() <= limitMillis;
    }

    /** @return what the event thread was doing when it was last found busy */
    String blockedIn() {
        synchronized (blocked) {
            return blocked.toString();
        }
    }

    @Override
    public void close() {
        running.set(false);
        try {
            watchdog.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
