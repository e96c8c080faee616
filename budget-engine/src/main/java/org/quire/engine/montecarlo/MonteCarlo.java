package org.quire.engine.montecarlo;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import org.quire.engine.model.BlockEvaluator;

/**
 * The Monte Carlo method of propagating distributions: draws the inputs, evaluates the model in every trial for
 * all outputs at once, and summarises each output.
 *
 * <p>The trials are cut into blocks of {@link #BLOCK_SIZE}. Block b (counted from 0 over the whole run) draws
 * from its own stream, a XoRoShiRo128++ generator seeded with outputs 2b+1 and 2b+2 of the SplitMix64 sequence
 * started at the run's seed; within a block the inputs are drawn in input order, each filling its whole column.
 * Blocks are handed to the worker threads as they become free, but every value lands at its trial's place and
 * the sums for the estimates are combined in block order, so the same seed gives bit-identical results with
 * any number of threads. Each output's values are held in one {@code double[]} (8 bytes per trial and output);
 * the coverage intervals need only the two tails of the sorted values, so only the tails are sorted.
 *
 * <p>Thread-safe: every call of {@link #run} makes its own worker threads and ends them before it returns or
 * throws. The arrays of output values are taken from, and given back to, {@link SpareArrays}, so that runs of
 * the same size one after another do not allocate them again.
 *
 * <p>References: JCGM 101:2008 5.9 and 7 (the propagation of distributions and its steps: 7.2 number of
 * trials, 7.3 sampling, 7.4 model evaluation, 7.5 discrete representation, 7.6 estimate and standard
 * uncertainty, 7.7 coverage intervals, 7.9 adaptive procedure), C.3 (random number generators); JCGM 102:2011
 * 7 (several outputs); S. Vigna, Further scramblings of Marsaglia's xorshift generators, J. Comput. Appl.
 * Math. 315 (2017) 175-181, and D. Blackman, S. Vigna, Scrambled linear pseudorandom number generators, ACM
 * Trans. Math. Softw. 47 (2021) 36 (the generators); G. L. Steele, D. Lea, C. H. Flood, Fast splittable
 * pseudorandom number generators, OOPSLA 2014 (SplitMix64, used to derive the block seeds).
 */
public final class MonteCarlo {
    /** Trials per block; part of the definition of the random streams, so changing it changes results. */
    public static final int BLOCK_SIZE = 8192;

    private static final long GOLDEN_GAMMA = 0x9E3779B97F4A7C15L;
    private static final long POLL_MILLIS = 20;
    private static final String THREAD_PREFIX = "quire-montecarlo-";
    private static final AtomicInteger POOL_NUMBER = new AtomicInteger();

    private MonteCarlo() {
    }

    /** Runs without progress reports or cancellation. */
    public static MonteCarloResult run(BlockEvaluator model, InputSampler inputs, MonteCarloSettings settings) {
        return run(model, inputs, settings, ProgressListener.NONE);
    }

    /**
     * Runs the Monte Carlo method.
     *
     * @param model the compiled model; its sessions are used by one worker thread each
     * @param inputs the inputs' joint distribution, in the model's input order
     * @param settings trials, seed, coverage probability, threads, adaptive procedure
     * @param listener told of progress on the calling thread, and asked whether to stop
     * @return the summaries of every output
     * @throws MonteCarloCancelledException when the listener asked to stop or the calling thread was interrupted
     * @throws IllegalArgumentException when the model and inputs do not match, or the values would not fit the
     *     heap
     * @throws IllegalStateException when an output gave no finite value in any trial
     * @throws RuntimeException whatever the model threw, unchanged
     */
    public static MonteCarloResult run(BlockEvaluator model, InputSampler inputs, MonteCarloSettings settings,
            ProgressListener listener) {
        return run(model, inputs, settings, listener, null);
    }

    /**
     * Runs the Monte Carlo method on the threads of {@code workers} (its own threads, made for this run and ended
     * with it, when null), which keep their arrays for the next run; the results are those of
     * {@link #run(BlockEvaluator, InputSampler, MonteCarloSettings, ProgressListener)}, trial for trial.
     *
     * @param workers the worker threads and arrays of many runs one after another, or null; runs on the same
     *     workers wait for each other
     * @throws IllegalArgumentException as the other {@code run}, and when {@code workers} are closed
     */
    public static MonteCarloResult run(BlockEvaluator model, InputSampler inputs, MonteCarloSettings settings,
            ProgressListener listener, Workers workers) {
        if (model == null) {
            throw new IllegalArgumentException(Messages.nullArgument("model"));
        }
        if (inputs == null) {
            throw new IllegalArgumentException(Messages.nullArgument("inputs"));
        }
        if (settings == null) {
            throw new IllegalArgumentException(Messages.nullArgument("settings"));
        }
        if (listener == null) {
            throw new IllegalArgumentException(Messages.nullArgument("progress listener"));
        }
        if (model.inputCount() != inputs.inputCount()) {
            throw new IllegalArgumentException(Messages.inputCountMismatch(model.inputCount(), inputs.inputCount()));
        }
        if (model.outputCount() < 1) {
            throw new IllegalArgumentException(Messages.noOutputs());
        }
        long maxTrials = settings.adaptive() ? settings.maxTrials() : settings.trials();
        if (settings.adaptive() && settings.maxTrials() < 2 * settings.adaptiveRunLength()) {
            throw new IllegalArgumentException(
                    Messages.maxTrialsTooSmall(settings.maxTrials(), settings.adaptiveRunLength()));
        }
        checkMemory(maxTrials, model.outputCount(), settings.keepValues());
        if (workers == null) {
            try (Runner runner = new Runner(model, inputs, settings, listener, null)) {
                return settings.adaptive() ? runner.adaptive() : runner.fixed();
            }
        }
        synchronized (workers) {
            if (workers.executor.isShutdown()) {
                throw new IllegalArgumentException(Messages.workersClosed());
            }
            try (Runner runner = new Runner(model, inputs, settings, listener, workers)) {
                return settings.adaptive() ? runner.adaptive() : runner.fixed();
            }
        }
    }

    /**
     * Worker threads kept for many runs one after another (a batch of budgets,
     * {@link #run(BlockEvaluator, InputSampler, MonteCarloSettings, ProgressListener, Workers)}), so that a run
     * starts no threads; the arrays of the trial values come from {@link SpareArrays}, as for every run.
     * Thread-safe: runs on the same workers take turns. Close to end the threads.
     */
    public static final class Workers implements AutoCloseable {
        private final int threads;
        private final ExecutorService executor;

        private Workers(int threads) {
            this.threads = threads;
            this.executor = newPool(threads);
        }

        /**
         * @param threads the number of worker threads, at least 1
         * @return started workers
         * @throws IllegalArgumentException when {@code threads} is less than 1
         */
        public static Workers of(int threads) {
            if (threads < 1) {
                throw new IllegalArgumentException(Messages.workerThreads(threads));
            }
            return new Workers(threads);
        }

        /** @return the number of worker threads */
        public int threads() {
            return threads;
        }

        /** Ends the worker threads, waiting for them. */
        @Override
        public void close() {
            synchronized (this) { // waits for a run on these workers to end (runs hold this lock)
                shutdown(executor);
            }
        }
    }

    private static ExecutorService newPool(int threads) {
        int pool = POOL_NUMBER.incrementAndGet();
        AtomicInteger n = new AtomicInteger();
        ThreadFactory factory = r -> {
            Thread t = new Thread(r, THREAD_PREFIX + pool + "-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
        return Executors.newFixedThreadPool(threads, factory);
    }

    /** Stops an executor's threads and waits for them to end. */
    private static void shutdown(ExecutorService executor) {
        executor.shutdownNow();
        boolean interrupted = false;
        while (true) {
            try {
                if (executor.awaitTermination(1, TimeUnit.MINUTES)) {
                    break;
                }
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }

    private static void checkMemory(long trials, int outputs, boolean keep) {
        long bytes = trials * outputs * 8L * (keep ? 2 : 1);
        long max = Runtime.getRuntime().maxMemory();
        if (bytes > max) {
            throw new IllegalArgumentException(Messages.notEnoughMemory(trials, outputs, bytes >> 20, max >> 20));
        }
    }

    /**
     * The random stream of block {@code block}: XoRoShiRo128++ seeded with SplitMix64 outputs 2b+1 and 2b+2 of
     * the sequence started at {@code seed}. References: JCGM 101:2008 C.3.1 (generators with long periods and
     * good statistical properties); Steele, Lea and Flood 2014 (SplitMix64).
     */
    static BlockStream blockStream(long seed, long block) {
        return new BlockStream(mix64(seed + GOLDEN_GAMMA * (2 * block + 1)), mix64(seed + GOLDEN_GAMMA * (2 * block + 2)));
    }

    /** Starts {@code stream} again as the stream of block {@code block} (see {@link #blockStream}). */
    static void restart(BlockStream stream, long seed, long block) {
        stream.restart(mix64(seed + GOLDEN_GAMMA * (2 * block + 1)), mix64(seed + GOLDEN_GAMMA * (2 * block + 2)));
    }

    /** The SplitMix64 output function (Stafford's Mix13 variant). */
    static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** The trials of one call of {@link Runner#simulate}: values and per-block moments. */
    private static final class Batch {
        final double[][] values;
        final Moments[] moments;
        final int trials;

        Batch(double[][] values, int trials, int blocks) {
            this.values = values;
            this.moments = new Moments[blocks];
            this.trials = trials;
        }
    }

    /** One run: its executor, cancellation flag and progress counters. Not thread-safe; used by the caller. */
    private static final class Runner implements AutoCloseable {
        private final BlockEvaluator model;
        private final InputSampler inputs;
        private final MonteCarloSettings settings;
        private final ProgressListener listener;
        private final ExecutorService executor;
        /** The workers lent for this run, or null when the executor is this run's own. */
        private final Workers workers;
        /** The tasks given to lent workers, waited for when the run ends. */
        private final List<Future<?>> tasks = new ArrayList<>();
        private final AtomicBoolean stop = new AtomicBoolean();
        private final AtomicLong done = new AtomicLong();
        private final long start = System.nanoTime();
        private long planned;

        Runner(BlockEvaluator model, InputSampler inputs, MonteCarloSettings settings, ProgressListener listener,
                Workers workers) {
            this.model = model;
            this.inputs = inputs;
            this.settings = settings;
            this.listener = listener;
            this.workers = workers;
            this.executor = workers == null ? newPool(settings.threads()) : workers.executor;
        }

        private int threads() {
            return workers == null ? settings.threads() : workers.threads();
        }

        private <T> Future<T> submit(java.util.concurrent.Callable<T> task) {
            Future<T> f = executor.submit(task);
            if (workers != null) {
                tasks.add(f);
            }
            return f;
        }

        MonteCarloResult fixed() {
            int trials = (int) settings.trials();
            planned = trials;
            int k = model.outputCount();
            Batch batch = simulate(0, trials, spare(k, trials));
            Moments total = combine(List.of(batch));
            return finish(batch.values, trials, total, 1, true);
        }

        /** JCGM 101:2008 7.9.4, steps a) to j). */
        MonteCarloResult adaptive() {
            int m = (int) settings.adaptiveRunLength();
            int k = model.outputCount();
            double p = settings.coverageProbability();
            int digits = settings.significantDigits();
            List<Batch> batches = new ArrayList<>();
            // per run h and output: y, u(y) and the ends of both coverage intervals
            List<double[][]> runStats = new ArrayList<>();
            long block = 0;
            boolean stable = false;
            while (true) {
                long used = (long) batches.size() * m;
                if (used + m > settings.maxTrials()) {
                    break;
                }
                planned = used + m;
                Batch batch = simulate(block, m, spare(k, m));
                block += blocks(m);
                batches.add(batch);
                Moments runMoments = combine(List.of(batch));
                double[][] stats = new double[k][];
                for (int o = 0; o < k; o++) {
                    double[] copy = SpareArrays.take(m);
                    System.arraycopy(batch.values[o], 0, copy, 0, m);
                    OutputSummary s = OutputSummary.summarize(o, copy, m, runMoments, p);
                    SpareArrays.give(copy);
                    stats[o] = new double[] {s.mean(), s.standardUncertainty(), s.symmetricInterval().lower(),
                        s.symmetricInterval().upper(), s.shortestInterval().lower(), s.shortestInterval().upper()};
                }
                runStats.add(stats);
                int h = runStats.size();
                if (h < 2) {
                    continue;
                }
                Moments all = combine(batches);
                stable = true;
                for (int o = 0; o < k && stable; o++) {
                    double delta = GumComparison.numericalTolerance(all.standardUncertainty(o), digits);
                    for (int q = 0; q < 6 && stable; q++) {
                        if (2.0 * standardDeviationOfMean(runStats, o, q) > delta) {
                            stable = false;
                        }
                    }
                }
                if (stable) {
                    break;
                }
            }
            int total = batches.size() * m;
            double[][] values = new double[k][];
            for (int o = 0; o < k; o++) {
                values[o] = SpareArrays.take(total);
            }
            for (int b = 0; b < batches.size(); b++) {
                for (int o = 0; o < k; o++) {
                    System.arraycopy(batches.get(b).values[o], 0, values[o], b * m, m);
                    SpareArrays.give(batches.get(b).values[o]);
                }
            }
            Moments moments = combine(batches);
            batches.clear();
            return finish(values, total, moments, runStats.size(), stable);
        }

        /** @return arrays for {@code outputs} x {@code trials} values from {@link SpareArrays} */
        private static double[][] spare(int outputs, int trials) {
            double[][] values = new double[outputs][];
            for (int o = 0; o < outputs; o++) {
                values[o] = SpareArrays.take(trials);
            }
            return values;
        }

        /** s_z with s_z^2 = sum (z_r - mean z)^2 / (h (h - 1)), JCGM 101:2008 7.9.4 f). */
        private static double standardDeviationOfMean(List<double[][]> runs, int output, int quantity) {
            int h = runs.size();
            double mean = 0;
            for (double[][] r : runs) {
                mean += r[output][quantity];
            }
            mean /= h;
            double s = 0;
            for (double[][] r : runs) {
                double d = r[output][quantity] - mean;
                s += d * d;
            }
            return Math.sqrt(s / ((double) h * (h - 1)));
        }

        private static int blocks(int trials) {
            return (trials + BLOCK_SIZE - 1) / BLOCK_SIZE;
        }

        private static Moments combine(List<Batch> batches) {
            Moments total = new Moments(batches.get(0).values.length);
            for (Batch b : batches) {
                for (Moments m : b.moments) {
                    total.add(m);
                }
            }
            return total;
        }

        private MonteCarloResult finish(double[][] values, int trials, Moments moments, int runs, boolean stable) {
            int k = values.length;
            double[][] kept = settings.keepValues() ? values : null;
            List<Future<OutputSummary>> futures = new ArrayList<>();
            // the summaries reorder the values: of kept values they work on a copy
            double[][] work = new double[k][];
            for (int o = 0; o < k; o++) {
                int output = o;
                if (settings.keepValues()) {
                    work[o] = SpareArrays.take(trials);
                    System.arraycopy(values[o], 0, work[o], 0, trials);
                } else {
                    work[o] = values[o];
                }
                double[] v = work[o];
                futures.add(submit(() -> OutputSummary.summarize(output, v, trials, moments,
                        settings.coverageProbability())));
            }
            List<OutputSummary> summaries = new ArrayList<>();
            for (Future<OutputSummary> f : futures) {
                summaries.add(await(f));
            }
            for (double[] w : work) {
                SpareArrays.give(w); // nothing refers to the reordered values any more
            }
            listener.progress(done.get(), planned);
            return new MonteCarloResult(settings, trials, summaries, moments.correlation(), inputs.usesCopula(),
                    runs, stable, kept, System.nanoTime() - start);
        }

        /** Evaluates trials of blocks firstBlock, firstBlock + 1, ... on the worker threads. */
        private Batch simulate(long firstBlock, int trials, double[][] values) {
            int nBlocks = blocks(trials);
            int k = model.outputCount();
            Batch batch = new Batch(values, trials, nBlocks);
            AtomicInteger next = new AtomicInteger();
            int parts = Math.min(threads(), nBlocks);
            List<Future<?>> futures = new ArrayList<>();
            for (int w = 0; w < parts; w++) {
                futures.add(submit(() -> {
                    BlockEvaluator.Session session = model.newSession(BLOCK_SIZE);
                    InputSampler.Block sampler = inputs.newBlock(BLOCK_SIZE);
                    double[][] in = new double[inputs.inputCount()][BLOCK_SIZE];
                    double[][] out = new double[k][BLOCK_SIZE];
                    BlockStream stream = blockStream(settings.seed(), firstBlock);
                    int b;
                    while (!stop.get() && (b = next.getAndIncrement()) < nBlocks) {
                        int from = b * BLOCK_SIZE;
                        int n = Math.min(BLOCK_SIZE, trials - from);
                        restart(stream, settings.seed(), firstBlock + b);
                        sampler.fill(stream, in, n);
                        session.evaluate(in, n, out);
                        for (int o = 0; o < k; o++) {
                            System.arraycopy(out[o], 0, batch.values[o], from, n);
                        }
                        batch.moments[b] = Moments.ofBlock(out, n);
                        done.addAndGet(n);
                    }
                    return null;
                }));
            }
            for (Future<?> f : futures) {
                await(f);
            }
            return batch;
        }

        /** Waits for a task, reporting progress and honouring cancellation meanwhile. */
        private <T> T await(Future<T> f) {
            while (true) {
                try {
                    T value = f.get(POLL_MILLIS, TimeUnit.MILLISECONDS);
                    checkCancel();
                    return value;
                } catch (TimeoutException e) {
                    listener.progress(done.get(), planned);
                    checkCancel();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    stop.set(true);
                    throw new MonteCarloCancelledException(done.get(), planned);
                } catch (ExecutionException e) {
                    stop.set(true);
                    Throwable cause = e.getCause();
                    if (cause instanceof RuntimeException re) {
                        throw re;
                    }
                    if (cause instanceof Error err) {
                        throw err;
                    }
                    throw new IllegalStateException(cause);
                }
            }
        }

        private void checkCancel() {
            if (listener.cancelRequested()) {
                stop.set(true);
                throw new MonteCarloCancelledException(done.get(), planned);
            }
        }

        /**
         * Stops the workers and waits for them to end, so that no thread outlives the run; lent workers are
         * kept, once every task of this run has ended (none then touches the arrays the next run reuses).
         */
        @Override
        public void close() {
            stop.set(true);
            if (workers == null) {
                shutdown(executor);
                return;
            }
            boolean interrupted = false;
            for (Future<?> f : tasks) {
                while (true) {
                    try {
                        f.get();
                        break;
                    } catch (InterruptedException e) {
                        interrupted = true;
                    } catch (ExecutionException | java.util.concurrent.CancellationException e) {
                        break;
                    }
                }
            }
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
        }
    }
}
