package org.strainmath.docs.streams;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;

import org.apache.kafka.common.serialization.Serdes;
import org.apache.kafka.streams.KeyValue;
import org.apache.kafka.streams.StreamsConfig;
import org.apache.kafka.streams.TestInputTopic;
import org.apache.kafka.streams.TestOutputTopic;
import org.apache.kafka.streams.TopologyTestDriver;
import org.apache.kafka.streams.state.KeyValueStore;
import org.apache.kafka.streams.test.TestRecord;
import org.junit.jupiter.api.Test;

/**
 * The monitoring topology under Kafka Streams' own {@link TopologyTestDriver} (no broker): the
 * same bits as the chain run in one plain loop, a restart from the store's changelog that loses
 * and repeats nothing, and malformed records in the dead-letter topic with their reasons.
 */
class MonitoringTopologyTest {

    private static final long START = Instant.parse("2026-12-03T06:00:00Z").toEpochMilli();
    private static final String NORTH = "hanger-north";
    private static final String SOUTH = "hanger-south";
    private static final String APPLICATION = "strain-monitor-test";

    /** Two gateways, 150 blocks of 200 frames each (25 minutes at 20 Hz), interleaved. */
    private static List<KeyValue<String, FrameBlock>> fleet() {
        List<FrameBlock> north = InventedFleet.blocks(1, START, 150, 200);
        List<FrameBlock> south = InventedFleet.blocks(2, START, 150, 200);
        List<KeyValue<String, FrameBlock>> records = new ArrayList<>();
        for (int b = 0; b < 150; b++) {
            records.add(KeyValue.pair(NORTH, north.get(b)));
            records.add(KeyValue.pair(SOUTH, south.get(b)));
        }
        return records;
    }

    /** The setups of the fleet, each through Java serialization as from a configuration topic. */
    private static Map<String, GatewaySetup> setups() throws Exception {
        GatewaySetup setup = GatewaySetup.footbridgeHanger();
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(setup);
        }
        GatewaySetup shipped;
        try (ObjectInputStream in = new ObjectInputStream(
                new ByteArrayInputStream(bytes.toByteArray()))) {
            shipped = (GatewaySetup) in.readObject();
        }
        return Map.of(NORTH, shipped, SOUTH, shipped);
    }

    /** What the chain gives in one plain loop, with live tallies in a map: the reference. */
    private static Outputs reference(List<KeyValue<String, FrameBlock>> records) {
        GatewaySetup setup = GatewaySetup.footbridgeHanger();
        Map<String, Monitor> monitors = new HashMap<>();
        Map<String, ChannelTally> tallies = new HashMap<>();
        Outputs out = new Outputs();
        for (KeyValue<String, FrameBlock> r : records) {
            Monitor.Output o = monitors.computeIfAbsent(r.key, g -> new Monitor(setup)).process(
                    r.value, h -> tallies.get(r.key + "/" + h), (h, t) -> tallies.put(r.key + "/" + h, t));
            out.stresses.add(KeyValue.pair(r.key, o.stresses()));
            for (WindowReport w : o.reports()) {
                out.windows.add(KeyValue.pair(r.key + "/" + w.history(), w));
            }
        }
        return out;
    }

    /** Stresses and window reports, in order, as the topics hold them. */
    static final class Outputs {
        final List<KeyValue<String, StressBlock>> stresses = new ArrayList<>();
        final List<KeyValue<String, WindowReport>> windows = new ArrayList<>();
        final List<TestRecord<String, byte[]>> deadLetters = new ArrayList<>();

        void readFrom(TopologyTestDriver driver) {
            TestOutputTopic<String, byte[]> s = driver.createOutputTopic(
                    MonitoringTopology.STRESSES, Serdes.String().deserializer(),
                    Serdes.ByteArray().deserializer());
            for (KeyValue<String, byte[]> kv : s.readKeyValuesToList()) {
                stresses.add(KeyValue.pair(kv.key, StressBlock.parse(kv.value)));
            }
            TestOutputTopic<String, byte[]> w = driver.createOutputTopic(
                    MonitoringTopology.WINDOWS, Serdes.String().deserializer(),
                    Serdes.ByteArray().deserializer());
            for (KeyValue<String, byte[]> kv : w.readKeyValuesToList()) {
                windows.add(KeyValue.pair(kv.key, WindowReport.parse(kv.value)));
            }
            deadLetters.addAll(driver.createOutputTopic(MonitoringTopology.DEAD_LETTERS,
                    Serdes.String().deserializer(), Serdes.ByteArray().deserializer())
                    .readRecordsToList());
        }
    }

    private static TopologyTestDriver driver(Map<String, GatewaySetup> setups) {
        Properties props = new Properties();
        props.put(StreamsConfig.APPLICATION_ID_CONFIG, APPLICATION);
        props.put(StreamsConfig.BOOTSTRAP_SERVERS_CONFIG, "no-broker:9092");
        return new TopologyTestDriver(MonitoringTopology.build(setups), props);
    }

    private static TestInputTopic<String, byte[]> frames(TopologyTestDriver driver) {
        return driver.createInputTopic(MonitoringTopology.FRAMES, Serdes.String().serializer(),
                Serdes.ByteArray().serializer());
    }

    private static void send(TestInputTopic<String, byte[]> topic, KeyValue<String, FrameBlock> r) {
        topic.pipeInput(r.key, r.value.toBytes(), r.value.firstMillis());
    }

    @Test
    void theTopologyGivesTheBitsOfThePlainLoopAndDeadLettersTheMalformed() throws Exception {
        List<KeyValue<String, FrameBlock>> records = fleet();
        Outputs expected = reference(records);
        Outputs got = new Outputs();
        try (TopologyTestDriver driver = driver(setups())) {
            TestInputTopic<String, byte[]> in = frames(driver);
            for (int i = 0; i < records.size(); i++) {
                send(in, records.get(i));
                if (i == 40) {
                    // malformed and unknown records among the good ones
                    byte[] good = records.get(i).value.toBytes();
                    in.pipeInput(NORTH, java.util.Arrays.copyOf(good, good.length - 3), START);
                    in.pipeInput("hanger-east", good, START);
                    in.pipeInput(SOUTH, new FrameBlock(999, START, 20, 3, new int[6]).toBytes(),
                            START);
                    in.pipeInput(SOUTH, "not a frame block".getBytes(StandardCharsets.UTF_8), START);
                    in.pipeInput(SOUTH, "text of 33 bytes or more, not frames"
                            .getBytes(StandardCharsets.UTF_8), START);
                }
            }
            got.readFrom(driver);
        }
        assertThat(got.stresses).hasSize(300);
        assertThat(got.stresses).containsExactlyElementsOf(expected.stresses);
        assertThat(got.windows).containsExactlyElementsOf(expected.windows);
        // 25 minutes: the windows of 06:00 and 06:10 close, for two histories of two gateways
        assertThat(got.windows).hasSize(8);
        assertThat(got.windows.get(0).value.cycles()).isGreaterThan(1000);
        assertThat(got.windows.get(0).value.damage()).isPositive();
        assertThat(reasons(got.deadLetters)).containsExactly(
                "a frame block of 200 frames of 4 channels has 3233 bytes: 3230",
                "no setup for gateway hanger-east",
                "gateway hanger-south has 4 channels: 3 in the block",
                "a frame block needs a header of 33 bytes: 17 bytes",
                "a frame block begins with SMFB");
    }

    @Test
    void oneStreamThreadKeepsUpWithAFleet() throws Exception {
        // Throughput of one stream thread (the test driver runs the topology in the calling
        // thread): 2 × 1000 blocks of 200 frames of 4 codes after 2 × 200 blocks of warm-up.
        // Printed for docs/streaming.md, not asserted: timing is for JMH, not unit tests.
        List<FrameBlock> north = InventedFleet.blocks(3, START, 1200, 200);
        List<FrameBlock> south = InventedFleet.blocks(4, START, 1200, 200);
        try (TopologyTestDriver driver = driver(setups())) {
            TestInputTopic<String, byte[]> in = frames(driver);
            long samples = 0;
            long started = 0;
            for (int b = 0; b < 1200; b++) {
                if (b == 200) {
                    started = System.nanoTime();
                }
                send(in, KeyValue.pair(NORTH, north.get(b)));
                send(in, KeyValue.pair(SOUTH, south.get(b)));
                samples += b >= 200 ? 2 * 800 : 0;
            }
            double seconds = (System.nanoTime() - started) / 1e9;
            Outputs out = new Outputs();
            out.readFrom(driver);
            assertThat(out.stresses).hasSize(2400);
            assertThat(out.deadLetters).isEmpty();
            System.out.printf("one stream thread (TopologyTestDriver, %s): %.2f M codes/s,"
                    + " %.0f blocks/s%n", System.getProperty("java.version"), samples / seconds / 1e6,
                    2000 / seconds);
        }
    }

    @Test
    void aRestartFromTheChangelogLosesAndRepeatsNothing() throws Exception {
        List<KeyValue<String, FrameBlock>> records = fleet();
        Outputs expected = reference(records);
        Map<String, GatewaySetup> setups = setups();
        Outputs got = new Outputs();
        int half = 157;                   // mid-window, with the two gateways out of step
        Map<String, byte[]> changelog = new LinkedHashMap<>();
        try (TopologyTestDriver first = driver(setups)) {
            TestInputTopic<String, byte[]> in = frames(first);
            for (KeyValue<String, FrameBlock> r : records.subList(0, half)) {
                send(in, r);
            }
            got.readFrom(first);
            // What Kafka would restore the store from: the changelog topic, last value per key.
            for (KeyValue<String, byte[]> kv : first.createOutputTopic(
                    APPLICATION + "-" + MonitoringTopology.STORE + "-changelog",
                    Serdes.String().deserializer(), Serdes.ByteArray().deserializer())
                    .readKeyValuesToList()) {
                changelog.put(kv.key, kv.value);
            }
            KeyValueStore<String, byte[]> store = first.getKeyValueStore(MonitoringTopology.STORE);
            for (Map.Entry<String, byte[]> e : changelog.entrySet()) {
                assertThat(store.get(e.getKey())).as(e.getKey()).isEqualTo(e.getValue());
            }
        }
        assertThat(changelog).containsKeys(NORTH, SOUTH, NORTH + "/rod", SOUTH + "/gusset");
        try (TopologyTestDriver second = driver(setups)) {
            KeyValueStore<String, byte[]> store = second.getKeyValueStore(MonitoringTopology.STORE);
            changelog.forEach(store::put);
            TestInputTopic<String, byte[]> in = frames(second);
            // the last two records of the first process are delivered again after the restart
            send(in, records.get(half - 2));
            send(in, records.get(half - 1));
            for (KeyValue<String, FrameBlock> r : records.subList(half, records.size())) {
                send(in, r);
            }
            got.readFrom(second);
        }
        assertThat(got.stresses).containsExactlyElementsOf(expected.stresses);
        assertThat(got.windows).containsExactlyElementsOf(expected.windows);
        assertThat(reasons(got.deadLetters)).containsExactly(
                "block 77 of gateway hanger-south is counted already (last 77)",
                "block 78 of gateway hanger-north is counted already (last 78)");
    }

    private static List<String> reasons(List<TestRecord<String, byte[]>> letters) {
        List<String> reasons = new ArrayList<>();
        for (TestRecord<String, byte[]> r : letters) {
            reasons.add(new String(r.headers().lastHeader(MonitoringTopology.REASON).value(),
                    StandardCharsets.UTF_8));
        }
        return reasons;
    }
}
