// strainmath for JShell: the library's packages and a few short factories.
//   jshell --class-path "$(docs/jshell/classpath.sh)" --startup DEFAULT --startup docs/jshell/strainmath.jsh
import org.strainmath.quantity.*;
import org.strainmath.bridge.*;
import org.strainmath.material.*;
import org.strainmath.history.*;
import org.strainmath.fatigue.*;
import org.strainmath.rosette.*;
import org.strainmath.calibration.*;
import org.strainmath.uncertainty.*;

/** A strain in µε: ue(250) is 250 µε. */
Strain ue(double microstrain) { return Strain.ofMicrostrain(microstrain); }

/** An output ratio in mV/V. */
VoltageRatio mvv(double millivoltsPerVolt) { return VoltageRatio.ofMillivoltsPerVolt(millivoltsPerVolt); }

/** A stress or modulus in MPa and in GPa. */
Stress mpa(double megapascals) { return Stress.ofMegapascals(megapascals); }
Stress gpa(double gigapascals) { return Stress.ofGigapascals(gigapascals); }

/** A resistance in Ω, a temperature in °C, an angle in degrees. */
Resistance ohm(double ohms) { return Resistance.ofOhms(ohms); }
Temperature celsius(double degreesCelsius) { return Temperature.ofCelsius(degreesCelsius); }
Angle deg(double degrees) { return Angle.ofDegrees(degrees); }
