package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;

/**
 * The block stream against an independent implementation of the same generator, and the normal variates drawn from
 * it against the standard normal distribution.
 */
class BlockStreamTest {

    @Test
    void isTheXoRoShiRo128PlusPlusGeneratorOfCommonsRng() {
        // Blackman and Vigna (2021) xoroshiro128++, as implemented independently by Apache Commons RNG
        long s0 = MonteCarlo.mix64(42 + 0x9E3779B97F4A7C15L);
        long s1 = MonteCarlo.mix64(42 + 2 * 0x9E3779B97F4A7C15L);
        UniformRandomProvider reference = RandomSource.XO_RO_SHI_RO_128_PP.create(new long[] {s0, s1});
        BlockStream single = new BlockStream(s0, s1);
        BlockStream bulk = new BlockStream(s0, s1);
        double[] u = new double[1000];
        bulk.uniforms(u, 0, u.length);
        for (int i = 0; i < u.length; i++) {
            long r = reference.nextLong();
            assertEquals(r, single.nextLong(), "output " + i);
            assertEquals((r >>> 11) * 0x1.0p-53, u[i], 0.0, "uniform " + i);
        }
    }

    @Test
    void bulkDrawsGiveTheValuesOfDrawingOneByOne() {
        // the column methods keep the generator's state in locals; they must give exactly the sequence of the
        // single-value methods (Blackman and Vigna's generator as above), trial by trial and pair by pair
        int n = 1001;
        BlockStream single = MonteCarlo.blockStream(99, 3);
        BlockStream bulk = MonteCarlo.blockStream(99, 3);
        double[] first = new double[n + 2];
        double[] second = new double[n + 2];
        bulk.uniformPairs(first, second, 2, n);
        for (int t = 2; t < n + 2; t++) {
            assertEquals(single.nextDouble(), first[t], 0.0, "first of pair " + t);
            assertEquals(single.nextDouble(), second[t], 0.0, "second of pair " + t);
        }
        double[] open = new double[n];
        bulk.openUniforms(open, 0, n);
        for (int t = 0; t < n; t++) {
            assertEquals(single.nextOpenDouble(), open[t], 0.0, "open uniform " + t);
            assertTrue(open[t] > 0.0 && open[t] < 1.0);
        }
        double[] scaled = new double[n];
        bulk.uniforms(scaled, 0, n, -2.5, 0.75);
        for (int t = 0; t < n; t++) {
            assertEquals(-2.5 + 0.75 * single.nextDouble(), scaled[t], 0.0, "rectangular " + t);
        }
        assertEquals(single.nextLong(), bulk.nextLong(), "the streams end in the same state");
    }

    @Test
    void bulkNormalsAreTheZigguratSamplerOfCommonsRngDrawByDraw() {
        // McFarland's modified Ziggurat as Apache Commons RNG implements it, reading Commons RNG's own
        // xoroshiro128++ started at the same state: the bulk fast path must give exactly its values, the rare
        // draws outside the fast path included, and leave the stream where the sampler leaves it
        assertTrue(BlockStream.FastPath.X != null, "the fast path's layers were read from the sampler");
        long s0 = MonteCarlo.mix64(5 + 0x9E3779B97F4A7C15L);
        long s1 = MonteCarlo.mix64(5 + 2 * 0x9E3779B97F4A7C15L);
        UniformRandomProvider reference = RandomSource.XO_RO_SHI_RO_128_PP.create(new long[] {s0, s1});
        org.apache.commons.rng.sampling.distribution.NormalizedGaussianSampler g =
                org.apache.commons.rng.sampling.distribution.ZigguratSampler.NormalizedGaussian.of(reference);
        BlockStream bulk = new BlockStream(s0, s1);
        int n = 1_000_000;
        double[] z = new double[n + 3];
        bulk.normals(z, 3, n / 2);
        bulk.normals(z, 3 + n / 2, n - n / 2);
        int slow = 0;
        for (int t = 3; t < n + 3; t++) {
            double expected = g.sample();
            assertEquals(expected, z[t], 0.0, "normal " + t);
            slow += Math.abs(expected) > 3.6360066 ? 1 : 0; // beyond the base layer: drawn outside the fast path
        }
        assertTrue(slow > 0, "the tail, outside the fast path, was drawn (" + slow + " draws)");
        assertEquals(reference.nextLong(), bulk.nextLong(), "the streams end in the same state");
    }

    @Test
    void normalsHaveTheMomentsAndTailsOfTheStandardNormal() {
        int n = 4_000_000;
        double[] z = new double[n];
        BlockStream s = MonteCarlo.blockStream(7, 0);
        s.normals(z, 0, n / 2);
        for (int i = n / 2; i < n; i++) {
            z[i] = s.nextNormal();
        }
        double m1 = 0;
        double m2 = 0;
        double m4 = 0;
        long beyond2 = 0;
        long beyond4 = 0;
        for (double v : z) {
            m1 += v;
            m2 += v * v;
            m4 += v * v * v * v;
            beyond2 += Math.abs(v) > 2 ? 1 : 0;
            beyond4 += Math.abs(v) > 4 ? 1 : 0;
        }
        m1 /= n;
        m2 /= n;
        m4 /= n;
        // standard errors for n draws: mean 1/sqrt(n), variance sqrt(2/n), fourth moment sqrt(96/n); five of each
        assertEquals(0.0, m1, 5 / Math.sqrt(n));
        assertEquals(1.0, m2, 5 * Math.sqrt(2.0 / n));
        assertEquals(3.0, m4, 5 * Math.sqrt(96.0 / n));
        // Pr(|Z| > 2) = 0.0455003, Pr(|Z| > 4) = 6.334e-5 (NIST/SEMATECH e-Handbook, normal table; from memory)
        double p2 = 0.0455003;
        double p4 = 6.334e-5;
        assertEquals(p2 * n, beyond2, 5 * Math.sqrt(n * p2));
        assertEquals(p4 * n, beyond4, 5 * Math.sqrt(n * p4));
        // the far tail, which the Ziggurat samples apart from its layers, is reached
        assertTrue(beyond4 > 0);
    }
}
