package org.strainmath.docs.streams;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiConsumer;
import java.util.function.Function;

import org.strainmath.history.Histories;

/**
 * The chain of one gateway, whatever runs it: converter codes to strain (the setup's
 * {@code ChannelFrames}), the rod's strain to stress, the rosette's strains to principal and von
 * Mises stresses, and both stress histories into their tallies, with the reports of the windows
 * each block closes. The Kafka Streams processor runs it with tallies from its state store; a
 * plain loop runs it with tallies in a map, and the two give the same bits.
 *
 * <p>Mutable working arrays: one per stream thread (not thread-safe).
 */
public final class Monitor {

    /** What one block gives: its stresses and the reports of the windows it closed. */
    public record Output(StressBlock stresses, List<WindowReport> reports) {
    }

    private final GatewaySetup setup;

    /** A monitor of a gateway with {@code setup}. */
    public Monitor(GatewaySetup setup) {
        this.setup = setup;
    }

    /**
     * Runs {@code block} through the chain. {@code load} gives the tally of a history (or
     * null for a new one), {@code save} takes it back after the block.
     */
    public Output process(FrameBlock block, Function<String, ChannelTally> load,
            BiConsumer<String, ChannelTally> save) {
        int n = block.frames();
        int channels = setup.frames().channelsPerFrame();
        double[][] strain = new double[channels][n];
        setup.frames().toStrain(block.codes(), 0, n, null, 0, strain, 0);

        double[] rod = strain[setup.rodChannel()].clone();
        for (int i = 0; i < n; i++) {
            rod[i] *= setup.rodModulus();
        }
        int[] grids = setup.rosetteChannels();
        double[][] readings = {strain[grids[0]], strain[grids[1]], strain[grids[2]]};
        double[] s1 = new double[n];
        double[] s2 = new double[n];
        double[] vonMises = new double[n];
        setup.rosette().toPrincipalStresses(readings, 0, s1, s2, 0, n);
        setup.rosette().toVonMises(readings, 0, vonMises, 0, n);
        double[] gusset = new double[n];
        Histories.largerMagnitude(s1, s2, 0, gusset, 0, n);

        List<WindowReport> reports = new ArrayList<>();
        count(GatewaySetup.ROD, rod, block, load, save, reports);
        count(GatewaySetup.GUSSET, gusset, block, load, save, reports);
        return new Output(new StressBlock(block.sequence(), block.firstMillis(), rod, s1, s2,
                vonMises), reports);
    }

    private void count(String history, double[] stress, FrameBlock block,
            Function<String, ChannelTally> load, BiConsumer<String, ChannelTally> save,
            List<WindowReport> reports) {
        ChannelTally tally = load.apply(history);
        if (tally == null) {
            tally = ChannelTally.start(history, setup);
        }
        tally.closeWindowBefore(block.firstMillis()).ifPresent(reports::add);
        tally.accept(stress, stress.length);
        save.accept(history, tally);
    }
}
