package org.strainmath.docs.streams;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import java.util.Objects;

import org.apache.kafka.common.header.internals.RecordHeaders;
import org.apache.kafka.common.serialization.Serdes;
import org.apache.kafka.streams.Topology;
import org.apache.kafka.streams.processor.api.Processor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.state.KeyValueStore;
import org.apache.kafka.streams.state.StoreBuilder;
import org.apache.kafka.streams.state.Stores;

/**
 * The Kafka Streams topology of a monitoring fleet: frame blocks of converter codes from many
 * gateways in, stresses and per-window cycle reports out, with each history's rainflow count in
 * a state store and malformed records in a dead-letter topic.
 *
 * <pre>
 *   strain-frames (gateway → FrameBlock bytes)
 *     └─ monitor: parse, check, Monitor.process; tallies in the store strain-tallies
 *          ├─ strain-stresses (gateway → StressBlock bytes)
 *          ├─ strain-cycle-windows (gateway/history → WindowReport bytes)
 *          └─ strain-frames-dead-letter (the record as it came, header strainmath.reason)
 * </pre>
 * Records are keyed by gateway, so Kafka's partitioning by key keeps each gateway on one task
 * and its tallies in that task's part of the store (keys {@code gateway/history}, and
 * {@code gateway} for the last block counted); the work spreads over as many stream threads and
 * instances as the topic has partitions. The store is an in-memory store backed by its
 * changelog topic, from which Kafka Streams restores it after a restart or a move of the task.
 *
 * <p>A block whose sequence number is not above the last one counted for its gateway (a
 * record delivered again after a failure, without exactly-once processing) is not counted again:
 * it goes to the dead-letter topic with that reason.
 */
public final class MonitoringTopology {

    /** The input topic. */
    public static final String FRAMES = "strain-frames";
    /** The stresses of each block. */
    public static final String STRESSES = "strain-stresses";
    /** The window reports of each history. */
    public static final String WINDOWS = "strain-cycle-windows";
    /** The records that could not be counted, with the reason in a header. */
    public static final String DEAD_LETTERS = "strain-frames-dead-letter";
    /** The state store of the tallies. */
    public static final String STORE = "strain-tallies";
    /** The header of a dead letter that says why. */
    public static final String REASON = "strainmath.reason";

    private MonitoringTopology() {
    }

    /** The topology for the gateways of {@code setups}, by gateway name. */
    public static Topology build(Map<String, GatewaySetup> setups) {
        Map<String, GatewaySetup> copy = Map.copyOf(setups);
        StoreBuilder<KeyValueStore<String, byte[]>> store = Stores.keyValueStoreBuilder(
                Stores.inMemoryKeyValueStore(STORE), Serdes.String(), Serdes.ByteArray());
        Topology topology = new Topology();
        topology.addSource("frames", Serdes.String().deserializer(),
                Serdes.ByteArray().deserializer(), FRAMES);
        topology.addProcessor("monitor", () -> new MonitorProcessor(copy), "frames");
        topology.addStateStore(store, "monitor");
        topology.addSink("stresses", STRESSES, Serdes.String().serializer(),
                Serdes.ByteArray().serializer(), "monitor");
        topology.addSink("windows", WINDOWS, Serdes.String().serializer(),
                Serdes.ByteArray().serializer(), "monitor");
        topology.addSink("dead-letters", DEAD_LETTERS, Serdes.String().serializer(),
                Serdes.ByteArray().serializer(), "monitor");
        return topology;
    }

    /** The processor of one task: one monitor per gateway it has seen. */
    private static final class MonitorProcessor implements Processor<String, byte[], String, byte[]> {

        private final Map<String, GatewaySetup> setups;
        private final Map<String, Monitor> monitors = new HashMap<>();
        private ProcessorContext<String, byte[]> context;
        private KeyValueStore<String, byte[]> store;

        MonitorProcessor(Map<String, GatewaySetup> setups) {
            this.setups = setups;
        }

        @Override
        public void init(ProcessorContext<String, byte[]> context) {
            this.context = context;
            this.store = context.getStateStore(STORE);
        }

        @Override
        public void process(Record<String, byte[]> record) {
            String gateway = record.key();
            GatewaySetup setup = gateway == null ? null : setups.get(gateway);
            if (setup == null) {
                deadLetter(record, "no setup for gateway " + gateway);
                return;
            }
            FrameBlock block;
            try {
                block = FrameBlock.parse(record.value());
            } catch (IllegalArgumentException e) {
                deadLetter(record, e.getMessage());
                return;
            }
            int channels = setup.frames().channelsPerFrame();
            if (block.channels() != channels) {
                deadLetter(record, "gateway " + gateway + " has " + channels + " channels: "
                        + block.channels() + " in the block");
                return;
            }
            byte[] last = store.get(gateway);
            if (last != null && block.sequence() <= ByteBuffer.wrap(last).getLong()) {
                deadLetter(record, "block " + block.sequence() + " of gateway " + gateway
                        + " is counted already (last " + ByteBuffer.wrap(last).getLong() + ")");
                return;
            }
            Monitor monitor = monitors.computeIfAbsent(gateway, g -> new Monitor(setup));
            Monitor.Output out = monitor.process(block, history -> {
                byte[] state = store.get(gateway + "/" + history);
                return state == null ? null : ChannelTally.fromBytes(history, setup, state);
            }, (history, tally) -> store.put(gateway + "/" + history, tally.toBytes()));
            store.put(gateway, ByteBuffer.allocate(8).putLong(block.sequence()).array());
            context.forward(record.withValue(out.stresses().toBytes()), "stresses");
            for (WindowReport report : out.reports()) {
                context.forward(new Record<>(gateway + "/" + report.history(), report.toBytes(),
                        record.timestamp()), "windows");
            }
        }

        private void deadLetter(Record<String, byte[]> record, String reason) {
            RecordHeaders headers = new RecordHeaders(record.headers().toArray());
            headers.add(REASON, Objects.requireNonNullElse(reason, "unreadable")
                    .getBytes(StandardCharsets.UTF_8));
            context.forward(new Record<>(record.key(), record.value(), record.timestamp(),
                    headers), "dead-letters");
        }
    }
}
