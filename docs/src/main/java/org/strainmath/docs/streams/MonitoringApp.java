package org.strainmath.docs.streams;

import java.util.Map;
import java.util.Properties;
import java.util.concurrent.CountDownLatch;

import org.apache.kafka.streams.KafkaStreams;
import org.apache.kafka.streams.StreamsConfig;

/**
 * Runs the monitoring topology against a Kafka cluster (docs/streaming.md):
 * <pre>
 *   mvn -B -q -pl docs -am install -DskipTests
 *   mvn -B -q -pl docs dependency:build-classpath -Dmdep.outputFile=target/classpath.txt
 *   java -cp "docs/target/classes:$(cat docs/target/classpath.txt)" \
 *       org.strainmath.docs.streams.MonitoringApp localhost:9092 2 hanger-north hanger-south
 * </pre>
 * The arguments: the bootstrap servers, the stream threads of this instance, and the gateways
 * (each with the invented setup of the examples). Exactly-once processing is on; the topics
 * {@code strain-frames}, {@code strain-stresses}, {@code strain-cycle-windows} and
 * {@code strain-frames-dead-letter} must exist. Stops on Ctrl-C.
 */
public final class MonitoringApp {

    private MonitoringApp() {
    }

    public static void main(String[] args) throws InterruptedException {
        if (args.length < 3) {
            System.err.println("usage: MonitoringApp <bootstrap servers> <threads> <gateway>...");
            System.exit(2);
        }
        Properties props = new Properties();
        props.put(StreamsConfig.APPLICATION_ID_CONFIG, "strain-monitor");
        props.put(StreamsConfig.BOOTSTRAP_SERVERS_CONFIG, args[0]);
        props.put(StreamsConfig.NUM_STREAM_THREADS_CONFIG, Integer.parseInt(args[1]));
        props.put(StreamsConfig.PROCESSING_GUARANTEE_CONFIG, StreamsConfig.EXACTLY_ONCE_V2);
        props.put(StreamsConfig.NUM_STANDBY_REPLICAS_CONFIG, 1);
        Map<String, GatewaySetup> setups = new java.util.HashMap<>();
        for (int i = 2; i < args.length; i++) {
            setups.put(args[i], GatewaySetup.footbridgeHanger());
        }
        KafkaStreams streams = new KafkaStreams(MonitoringTopology.build(setups), props);
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            streams.close();
            stopped.countDown();
        }));
        streams.start();
        stopped.await();
    }
}
