<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de_DE">
<context>
    <name>CaseFields</name>
    <message>
        <source>Gas model</source>
        <translation>Gasmodell</translation>
    </message>
    <message>
        <source>Nozzle</source>
        <translation>Schubdüse</translation>
    </message>
    <message>
        <source>Flight</source>
        <translation>Flugzustand</translation>
    </message>
    <message>
        <source>Design and sizing</source>
        <translation>Auslegung und Größe</translation>
    </message>
    <message>
        <source>Fuel</source>
        <translation>Kraftstoff</translation>
    </message>
    <message>
        <source>Inlet</source>
        <translation>Einlauf</translation>
    </message>
    <message>
        <source>Burner</source>
        <translation>Brennkammer</translation>
    </message>
    <message>
        <source>Jet pipe</source>
        <translation>Strahlrohr</translation>
    </message>
    <message>
        <source>Afterburner</source>
        <translation>Nachbrenner</translation>
    </message>
    <message>
        <source>%1
Valid range: %2</source>
        <translation>%1
Gültiger Bereich: %2</translation>
    </message>
    <message>
        <source>Case</source>
        <translation>Fall</translation>
    </message>
</context>
<context>
    <name>Caution</name>
    <message>
        <source>Results are conceptual-design estimates. For anything that affects flight safety, defer to the engine manufacturer&apos;s data, your organisation&apos;s procedures and licensed engineering practice.</source>
        <translation>Die Ergebnisse sind Schätzungen für den Konzeptentwurf. Für alles, was die Flugsicherheit berührt, gelten die Daten des Triebwerksherstellers, die Verfahren Ihrer Organisation und die zugelassene Ingenieurpraxis.</translation>
    </message>
</context>
<context>
    <name>CycleChart</name>
    <message>
        <source>Stale: showing the last valid result</source>
        <translation>Veraltet: letztes gültiges Ergebnis</translation>
    </message>
    <message>
        <source>No result:
these inputs have no cycle</source>
        <translation>Kein Ergebnis:
kein Kreisprozess mit diesen Eingaben</translation>
    </message>
</context>
<context>
    <name>LossNames</name>
    <message>
        <source>Inlet pressure recovery</source>
        <translation>Druckrückgewinn im Einlauf</translation>
    </message>
    <message>
        <source>Inlet</source>
        <translation>Einlauf</translation>
    </message>
    <message>
        <source>Compressor efficiency</source>
        <translation>Verdichterwirkungsgrad</translation>
    </message>
    <message>
        <source>Compressor</source>
        <translation>Verdichter</translation>
    </message>
    <message>
        <source>Burner pressure loss</source>
        <translation>Druckverlust der Brennkammer</translation>
    </message>
    <message>
        <source>Burner Δp</source>
        <translation>Brennkammer-Δp</translation>
    </message>
    <message>
        <source>Combustion efficiency</source>
        <translation>Ausbrenngrad</translation>
    </message>
    <message>
        <source>Combustion</source>
        <translation>Ausbrand</translation>
    </message>
    <message>
        <source>Turbine efficiency</source>
        <translation>Turbinenwirkungsgrad</translation>
    </message>
    <message>
        <source>Turbine</source>
        <translation>Turbine</translation>
    </message>
    <message>
        <source>Mechanical efficiency</source>
        <translation>Mechanischer Wirkungsgrad</translation>
    </message>
    <message>
        <source>Shaft</source>
        <translation>Welle</translation>
    </message>
    <message>
        <source>Jet pipe pressure loss</source>
        <translation>Druckverlust im Strahlrohr</translation>
    </message>
    <message>
        <source>Jet pipe</source>
        <translation>Strahlrohr</translation>
    </message>
    <message>
        <source>Afterburner losses</source>
        <translation>Nachbrennerverluste</translation>
    </message>
    <message>
        <source>Afterburner</source>
        <translation>Nachbrenner</translation>
    </message>
    <message>
        <source>Nozzle velocity coefficient</source>
        <translation>Geschwindigkeitsbeiwert der Düse</translation>
    </message>
    <message>
        <source>Nozzle Cv</source>
        <translation>Düse Cv</translation>
    </message>
    <message>
        <source>Nozzle discharge coefficient</source>
        <translation>Durchflussbeiwert der Düse</translation>
    </message>
    <message>
        <source>Nozzle Cd</source>
        <translation>Düse Cd</translation>
    </message>
    <message>
        <source>Incomplete nozzle expansion</source>
        <translation>Unvollständige Expansion in der Düse</translation>
    </message>
    <message>
        <source>Expansion</source>
        <translation>Expansion</translation>
    </message>
    <message>
        <source>Compressor bleed</source>
        <translation>Zapfluft am Verdichter</translation>
    </message>
    <message>
        <source>Bleed</source>
        <translation>Zapfluft</translation>
    </message>
    <message>
        <source>Shaft power offtake</source>
        <translation>Wellenleistungsentnahme</translation>
    </message>
    <message>
        <source>Offtake</source>
        <translation>Entnahme</translation>
    </message>
    <message>
        <source>point of efficiency (0.01)</source>
        <translation>Punkt Wirkungsgrad (0,01)</translation>
    </message>
    <message>
        <source>percent of pressure-loss fraction (0.01)</source>
        <translation>Prozent relativer Druckverlust (0,01)</translation>
    </message>
    <message>
        <source>point of recovery or ram efficiency (0.01)</source>
        <translation>Punkt Druckrückgewinn oder Stauwirkungsgrad (0,01)</translation>
    </message>
    <message>
        <source>point of velocity coefficient or nozzle efficiency (0.01)</source>
        <translation>Punkt Geschwindigkeitsbeiwert oder Düsenwirkungsgrad (0,01)</translation>
    </message>
    <message>
        <source>point of discharge coefficient (0.01)</source>
        <translation>Punkt Durchflussbeiwert (0,01)</translation>
    </message>
    <message>
        <source>percent of bleed (0.01)</source>
        <translation>Prozent Zapfluft (0,01)</translation>
    </message>
    <message>
        <source>kW of offtake (1000 W)</source>
        <translation>kW Entnahme (1000 W)</translation>
    </message>
    <message>
        <source>Burner</source>
        <translation>Brennkammer</translation>
    </message>
    <message>
        <source>Nozzle</source>
        <translation>Schubdüse</translation>
    </message>
    <message>
        <source>LP compressor efficiency</source>
        <translation>ND-Verdichterwirkungsgrad</translation>
    </message>
    <message>
        <source>LP compressor</source>
        <translation>ND-Verdichter</translation>
    </message>
    <message>
        <source>LP turbine efficiency</source>
        <translation>ND-Turbinenwirkungsgrad</translation>
    </message>
    <message>
        <source>LP turbine</source>
        <translation>ND-Turbine</translation>
    </message>
    <message>
        <source>LP shaft mechanical efficiency</source>
        <translation>Mechanischer Wirkungsgrad der ND-Welle</translation>
    </message>
    <message>
        <source>LP shaft</source>
        <translation>ND-Welle</translation>
    </message>
    <message>
        <source>LP compressor bleed</source>
        <translation>Zapfluft am ND-Verdichter</translation>
    </message>
    <message>
        <source>LP bleed</source>
        <translation>ND-Zapfluft</translation>
    </message>
    <message>
        <source>LP shaft power offtake</source>
        <translation>Leistungsentnahme an der ND-Welle</translation>
    </message>
    <message>
        <source>LP offtake</source>
        <translation>ND-Entnahme</translation>
    </message>
</context>
<context>
    <name>Parameters</name>
    <message>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <source>A short name for the case; saved in the case file.</source>
        <translation>Ein kurzer Name für den Fall; wird in der Falldatei gespeichert.</translation>
    </message>
    <message>
        <source>Notes</source>
        <translation>Notizen</translation>
    </message>
    <message>
        <source>Free text about the case: what it is for, where its inputs come from; saved in the case file.</source>
        <translation>Freier Text zum Fall: wozu er dient, woher seine Eingaben stammen; wird in der Falldatei gespeichert.</translation>
    </message>
    <message>
        <source>Architecture</source>
        <translation>Bauart</translation>
    </message>
    <message>
        <source>Single-spool turbojet, or two-spool turbojet (a low-pressure compressor and turbine on their own shaft).</source>
        <translation>Einwellen-Strahltriebwerk oder Zweiwellen-Strahltriebwerk (Niederdruckverdichter und -turbine auf einer eigenen Welle).</translation>
    </message>
    <message>
        <source>Turbojet</source>
        <translation>Strahltriebwerk</translation>
    </message>
    <message>
        <source>Two-spool turbojet</source>
        <translation>Zweiwellen-Strahltriebwerk</translation>
    </message>
    <message>
        <source>Ambient state</source>
        <translation>Umgebungszustand</translation>
    </message>
    <message>
        <source>Take the free-stream static state from the U.S. Standard Atmosphere 1976, or give its temperature and pressure directly.</source>
        <translation>Den statischen Zustand der Anströmung der U.S. Standard Atmosphere 1976 entnehmen oder Temperatur und Druck direkt angeben.</translation>
    </message>
    <message>
        <source>Standard atmosphere</source>
        <translation>Standardatmosphäre</translation>
    </message>
    <message>
        <source>Given ambient</source>
        <translation>Vorgegebene Umgebung</translation>
    </message>
    <message>
        <source>Altitude</source>
        <translation>Flughöhe</translation>
    </message>
    <message>
        <source>Flight altitude; geopotential unless marked geometric.</source>
        <translation>Flughöhe; geopotentiell, sofern nicht als geometrisch markiert.</translation>
    </message>
    <message>
        <source>Geometric altitude</source>
        <translation>Geometrische Höhe</translation>
    </message>
    <message>
        <source>The altitude is geometric (checked) or geopotential (unchecked).</source>
        <translation>Die Höhe ist geometrisch (markiert) oder geopotentiell (nicht markiert).</translation>
    </message>
    <message>
        <source>Temperature offset from standard</source>
        <translation>Temperaturabweichung vom Standardtag</translation>
    </message>
    <message>
        <source>Added to the standard-day temperature; the pressure is unchanged.</source>
        <translation>Wird zur Temperatur des Standardtags addiert; der Druck bleibt unverändert.</translation>
    </message>
    <message>
        <source>Ambient static temperature</source>
        <translation>Statische Umgebungstemperatur</translation>
    </message>
    <message>
        <source>Free-stream static temperature, e.g. of a test cell.</source>
        <translation>Statische Temperatur der Anströmung, z. B. eines Prüfstands.</translation>
    </message>
    <message>
        <source>Ambient static pressure</source>
        <translation>Statischer Umgebungsdruck</translation>
    </message>
    <message>
        <source>Free-stream static pressure.</source>
        <translation>Statischer Druck der Anströmung.</translation>
    </message>
    <message>
        <source>Flight Mach number</source>
        <translation>Flug-Machzahl</translation>
    </message>
    <message>
        <source>Free-stream Mach number M0.</source>
        <translation>Machzahl der Anströmung M0.</translation>
    </message>
    <message>
        <source>Specific humidity</source>
        <translation>Spezifische Feuchte</translation>
    </message>
    <message>
        <source>Water vapour per unit mass of humid air.</source>
        <translation>Wasserdampf je Masseneinheit feuchter Luft.</translation>
    </message>
    <message>
        <source>Engine size set by</source>
        <translation>Triebwerksgröße festgelegt durch</translation>
    </message>
    <message>
        <source>Fix the engine-face air mass flow, or the net thrust (the mass flow follows).</source>
        <translation>Den Luftmassenstrom am Verdichtereintritt oder den Nettoschub festlegen (der Massenstrom folgt daraus).</translation>
    </message>
    <message>
        <source>Air mass flow</source>
        <translation>Luftmassenstrom</translation>
    </message>
    <message>
        <source>Net thrust</source>
        <translation>Nettoschub</translation>
    </message>
    <message>
        <source>Air mass flow W2</source>
        <translation>Luftmassenstrom W2</translation>
    </message>
    <message>
        <source>Engine-face air mass flow.</source>
        <translation>Luftmassenstrom am Verdichtereintritt.</translation>
    </message>
    <message>
        <source>Required net thrust</source>
        <translation>Geforderter Nettoschub</translation>
    </message>
    <message>
        <source>Net thrust at the design point; the air mass flow is sized to give it.</source>
        <translation>Nettoschub im Auslegungspunkt; der Luftmassenstrom wird passend ausgelegt.</translation>
    </message>
    <message>
        <source>Lower heating value</source>
        <translation>Unterer Heizwert</translation>
    </message>
    <message>
        <source>Fuel&apos;s lower heating value at 298.15 K.</source>
        <translation>Unterer Heizwert des Kraftstoffs bei 298,15 K.</translation>
    </message>
    <message>
        <source>Hydrogen-carbon ratio</source>
        <translation>Wasserstoff-Kohlenstoff-Verhältnis</translation>
    </message>
    <message>
        <source>Molar H/C ratio y of the fuel CHy.</source>
        <translation>Molares H/C-Verhältnis y des Kraftstoffs CHy.</translation>
    </message>
    <message>
        <source>Fuel temperature</source>
        <translation>Kraftstofftemperatur</translation>
    </message>
    <message>
        <source>Delivery temperature of the fuel at the burner.</source>
        <translation>Temperatur des Kraftstoffs am Brennkammereintritt.</translation>
    </message>
    <message>
        <source>Gas model</source>
        <translation>Gasmodell</translation>
    </message>
    <message>
        <source>Thermally perfect: species data with variable composition. Constant cp: one cp and ratio of specific heats. Two-gamma: air values before the burner, product values after it.</source>
        <translation>Thermisch ideal: Stoffdaten mit veränderlicher Zusammensetzung. Konstantes cp: ein cp und ein Isentropenexponent. Zwei-Gamma: Luftwerte vor der Brennkammer, Werte der Verbrennungsprodukte danach.</translation>
    </message>
    <message>
        <source>Thermally perfect</source>
        <translation>Thermisch ideal</translation>
    </message>
    <message>
        <source>Constant cp</source>
        <translation>Konstantes cp</translation>
    </message>
    <message>
        <source>Two-gamma</source>
        <translation>Zwei-Gamma</translation>
    </message>
    <message>
        <source>Specific heat cp</source>
        <translation>Spezifische Wärmekapazität cp</translation>
    </message>
    <message>
        <source>Specific heat at constant pressure, everywhere.</source>
        <translation>Spezifische Wärmekapazität bei konstantem Druck, überall.</translation>
    </message>
    <message>
        <source>Ratio of specific heats γ</source>
        <translation>Isentropenexponent γ</translation>
    </message>
    <message>
        <source>cp/cv, everywhere.</source>
        <translation>cp/cv, überall.</translation>
    </message>
    <message>
        <source>Cold-section cp</source>
        <translation>cp im kalten Teil</translation>
    </message>
    <message>
        <source>Specific heat of air up to the burner.</source>
        <translation>Spezifische Wärmekapazität der Luft bis zur Brennkammer.</translation>
    </message>
    <message>
        <source>Cold-section γ</source>
        <translation>γ im kalten Teil</translation>
    </message>
    <message>
        <source>Ratio of specific heats of air up to the burner.</source>
        <translation>Isentropenexponent der Luft bis zur Brennkammer.</translation>
    </message>
    <message>
        <source>Hot-section cp</source>
        <translation>cp im heißen Teil</translation>
    </message>
    <message>
        <source>Specific heat of the combustion products after the burner.</source>
        <translation>Spezifische Wärmekapazität der Verbrennungsprodukte nach der Brennkammer.</translation>
    </message>
    <message>
        <source>Hot-section γ</source>
        <translation>γ im heißen Teil</translation>
    </message>
    <message>
        <source>Ratio of specific heats of the products after the burner.</source>
        <translation>Isentropenexponent der Produkte nach der Brennkammer.</translation>
    </message>
    <message>
        <source>Neglect fuel mass</source>
        <translation>Kraftstoffmasse vernachlässigen</translation>
    </message>
    <message>
        <source>Leave the fuel&apos;s mass out of the flow (constant-cp and two-gamma only).</source>
        <translation>Die Masse des Kraftstoffs im Massenstrom nicht berücksichtigen (nur konstantes cp und Zwei-Gamma).</translation>
    </message>
    <message>
        <source>Loss given as</source>
        <translation>Verlust angegeben als</translation>
    </message>
    <message>
        <source>Pressure recovery pt2/pt0, or ram efficiency: the fraction of the ram enthalpy rise kept as pressure.</source>
        <translation>Druckrückgewinn pt2/pt0 oder Stauwirkungsgrad: der Anteil des Staudruck-Enthalpieanstiegs, der als Druck erhalten bleibt.</translation>
    </message>
    <message>
        <source>Pressure recovery</source>
        <translation>Druckrückgewinn</translation>
    </message>
    <message>
        <source>Ram efficiency</source>
        <translation>Stauwirkungsgrad</translation>
    </message>
    <message>
        <source>Pressure recovery pt2/pt0</source>
        <translation>Druckrückgewinn pt2/pt0</translation>
    </message>
    <message>
        <source>pt2/pt0 of the inlet; 1 is loss-free.</source>
        <translation>pt2/pt0 des Einlaufs; 1 ist verlustfrei.</translation>
    </message>
    <message>
        <source>The fraction of the ram enthalpy rise kept as pressure; 1 is loss-free.</source>
        <translation>Der Anteil des Stau-Enthalpieanstiegs, der als Druck erhalten bleibt; 1 ist verlustfrei.</translation>
    </message>
    <message>
        <source>Supersonic shock loss</source>
        <translation>Stoßverlust im Überschall</translation>
    </message>
    <message>
        <source>A multiplier on the recovery above Mach 1: none, or the military specification rule 1 − 0.075 (M0 − 1)^1.35.</source>
        <translation>Ein Faktor auf den Druckrückgewinn oberhalb Mach 1: keiner oder die Regel der Militärspezifikation 1 − 0,075 (M0 − 1)^1,35.</translation>
    </message>
    <message>
        <source>None</source>
        <translation>Keiner</translation>
    </message>
    <message>
        <source>MIL-E-5008B</source>
        <translation>MIL-E-5008B</translation>
    </message>
    <message>
        <source>Efficiency basis</source>
        <translation>Art des Wirkungsgrads</translation>
    </message>
    <message>
        <source>Give the isentropic or the polytropic efficiency; the other is derived.</source>
        <translation>Den isentropen oder den polytropen Wirkungsgrad angeben; der andere wird abgeleitet.</translation>
    </message>
    <message>
        <source>Isentropic</source>
        <translation>Isentrop</translation>
    </message>
    <message>
        <source>Polytropic</source>
        <translation>Polytrop</translation>
    </message>
    <message>
        <source>Isentropic efficiency</source>
        <translation>Isentroper Wirkungsgrad</translation>
    </message>
    <message>
        <source>Isentropic efficiency; 1 is loss-free.</source>
        <translation>Isentroper Wirkungsgrad; 1 ist verlustfrei.</translation>
    </message>
    <message>
        <source>Polytropic efficiency</source>
        <translation>Polytroper Wirkungsgrad</translation>
    </message>
    <message>
        <source>Small-stage efficiency, the same through the machine; 1 is loss-free.</source>
        <translation>Wirkungsgrad einer kleinen Stufe, in der ganzen Maschine gleich; 1 ist verlustfrei.</translation>
    </message>
    <message>
        <source>Compressor total-pressure ratio.</source>
        <translation>Totaldruckverhältnis des Verdichters.</translation>
    </message>
    <message>
        <source>Bleed fraction</source>
        <translation>Zapfluftanteil</translation>
    </message>
    <message>
        <source>Air bled off at compressor exit, per unit of inlet air.</source>
        <translation>Am Verdichteraustritt entnommene Luft je Einheit Eintrittsluft.</translation>
    </message>
    <message>
        <source>Mechanical efficiency</source>
        <translation>Mechanischer Wirkungsgrad</translation>
    </message>
    <message>
        <source>Compressor power over turbine power (shaft losses).</source>
        <translation>Verdichterleistung durch Turbinenleistung (Wellenverluste).</translation>
    </message>
    <message>
        <source>Power offtake</source>
        <translation>Wellenleistungsentnahme</translation>
    </message>
    <message>
        <source>Shaft power taken for accessories.</source>
        <translation>Für Hilfsgeräte entnommene Wellenleistung.</translation>
    </message>
    <message>
        <source>Burner set by</source>
        <translation>Brennkammer festgelegt durch</translation>
    </message>
    <message>
        <source>Fix the burner exit temperature Tt4, or the fuel-air ratio.</source>
        <translation>Die Brennkammeraustrittstemperatur Tt4 oder das Kraftstoff-Luft-Verhältnis festlegen.</translation>
    </message>
    <message>
        <source>Exit temperature</source>
        <translation>Austrittstemperatur</translation>
    </message>
    <message>
        <source>Fuel-air ratio</source>
        <translation>Kraftstoff-Luft-Verhältnis</translation>
    </message>
    <message>
        <source>Exit temperature Tt4</source>
        <translation>Austrittstemperatur Tt4</translation>
    </message>
    <message>
        <source>Burner exit (turbine entry) total temperature.</source>
        <translation>Totaltemperatur am Brennkammeraustritt (Turbineneintritt).</translation>
    </message>
    <message>
        <source>Fuel per unit of burner air.</source>
        <translation>Kraftstoff je Einheit Brennkammerluft.</translation>
    </message>
    <message>
        <source>Pressure-loss fraction</source>
        <translation>Relativer Druckverlust</translation>
    </message>
    <message>
        <source>1 − pt4/pt3.</source>
        <translation>1 − pt4/pt3.</translation>
    </message>
    <message>
        <source>Combustion efficiency</source>
        <translation>Ausbrenngrad</translation>
    </message>
    <message>
        <source>Fraction of the fuel&apos;s heating value released.</source>
        <translation>Anteil des Heizwerts, der freigesetzt wird.</translation>
    </message>
    <message>
        <source>1 − pt_out/pt_in of the duct from turbine exit to nozzle entry.</source>
        <translation>1 − pt_aus/pt_ein des Kanals vom Turbinenaustritt zum Düseneintritt.</translation>
    </message>
    <message>
        <source>Afterburner lit</source>
        <translation>Nachbrenner gezündet</translation>
    </message>
    <message>
        <source>Light the afterburner (reheat) between jet pipe and nozzle.</source>
        <translation>Den Nachbrenner zwischen Strahlrohr und Düse zünden.</translation>
    </message>
    <message>
        <source>Exit temperature Tt7</source>
        <translation>Austrittstemperatur Tt7</translation>
    </message>
    <message>
        <source>Afterburner exit total temperature when lit.</source>
        <translation>Totaltemperatur am Nachbrenneraustritt, wenn gezündet.</translation>
    </message>
    <message>
        <source>Pressure-loss fraction, lit</source>
        <translation>Relativer Druckverlust, gezündet</translation>
    </message>
    <message>
        <source>1 − pt_out/pt_in when lit.</source>
        <translation>1 − pt_aus/pt_ein, wenn gezündet.</translation>
    </message>
    <message>
        <source>Pressure-loss fraction, unlit</source>
        <translation>Relativer Druckverlust, nicht gezündet</translation>
    </message>
    <message>
        <source>1 − pt_out/pt_in when not lit; 0 for an engine without afterburner.</source>
        <translation>1 − pt_aus/pt_ein, wenn nicht gezündet; 0 für ein Triebwerk ohne Nachbrenner.</translation>
    </message>
    <message>
        <source>Fraction of the heating value released when lit.</source>
        <translation>Anteil des Heizwerts, der bei gezündetem Nachbrenner freigesetzt wird.</translation>
    </message>
    <message>
        <source>Nozzle</source>
        <translation>Schubdüse</translation>
    </message>
    <message>
        <source>Convergent (exit at the throat), or convergent-divergent (expanding fully to ambient pressure or of fixed area ratio).</source>
        <translation>Konvergent (Austritt im engsten Querschnitt) oder konvergent-divergent (vollständige Expansion auf Umgebungsdruck oder festes Flächenverhältnis).</translation>
    </message>
    <message>
        <source>Convergent</source>
        <translation>Konvergent</translation>
    </message>
    <message>
        <source>Convergent-divergent</source>
        <translation>Konvergent-divergent</translation>
    </message>
    <message>
        <source>Expansion</source>
        <translation>Expansion</translation>
    </message>
    <message>
        <source>Full expansion to ambient pressure, or a fixed exit-to-throat area ratio.</source>
        <translation>Vollständige Expansion auf Umgebungsdruck oder ein festes Verhältnis von Austritts- zu Halsfläche.</translation>
    </message>
    <message>
        <source>Full expansion</source>
        <translation>Vollständige Expansion</translation>
    </message>
    <message>
        <source>Fixed area ratio</source>
        <translation>Festes Flächenverhältnis</translation>
    </message>
    <message>
        <source>Exit-to-throat area ratio A9/A8</source>
        <translation>Flächenverhältnis Austritt zu Hals A9/A8</translation>
    </message>
    <message>
        <source>Geometric area ratio of the divergent part.</source>
        <translation>Geometrisches Flächenverhältnis des divergenten Teils.</translation>
    </message>
    <message>
        <source>Velocity coefficient V9/V9,ideal, or isentropic efficiency of the expansion.</source>
        <translation>Geschwindigkeitsbeiwert V9/V9,ideal oder isentroper Wirkungsgrad der Expansion.</translation>
    </message>
    <message>
        <source>Velocity coefficient</source>
        <translation>Geschwindigkeitsbeiwert</translation>
    </message>
    <message>
        <source>Nozzle efficiency</source>
        <translation>Düsenwirkungsgrad</translation>
    </message>
    <message>
        <source>V9/V9,ideal; 1 is loss-free.</source>
        <translation>V9/V9,ideal; 1 ist verlustfrei.</translation>
    </message>
    <message>
        <source>Isentropic efficiency of the expansion; 1 is loss-free.</source>
        <translation>Isentroper Wirkungsgrad der Expansion; 1 ist verlustfrei.</translation>
    </message>
    <message>
        <source>Discharge coefficient</source>
        <translation>Durchflussbeiwert</translation>
    </message>
    <message>
        <source>Actual over ideal throat mass flow; sizes the geometric throat.</source>
        <translation>Tatsächlicher durch idealen Massenstrom im Hals; bestimmt den geometrischen Halsquerschnitt.</translation>
    </message>
    <message>
        <source>Engine-face Mach number</source>
        <translation>Machzahl am Verdichtereintritt</translation>
    </message>
    <message>
        <source>Axial Mach number at the compressor face, for the face area.</source>
        <translation>Axiale Machzahl am Verdichtereintritt, für die Eintrittsfläche.</translation>
    </message>
    <message>
        <source>Hub-to-tip radius ratio</source>
        <translation>Nabenverhältnis</translation>
    </message>
    <message>
        <source>Hub radius over tip radius at the engine face.</source>
        <translation>Nabenradius durch Spitzenradius am Verdichtereintritt.</translation>
    </message>
    <message>
        <source>Pressure ratio pt3/pt2</source>
        <translation>Druckverhältnis pt3/pt2</translation>
    </message>
    <message>
        <source>Pressure ratio pt25/pt2</source>
        <translation>Druckverhältnis pt25/pt2</translation>
    </message>
    <message>
        <source>Pressure ratio pt3/pt25</source>
        <translation>Druckverhältnis pt3/pt25</translation>
    </message>
    <message>
        <source>Compressor</source>
        <translation>Verdichter</translation>
    </message>
    <message>
        <source>LP compressor</source>
        <translation>ND-Verdichter</translation>
    </message>
    <message>
        <source>HP compressor</source>
        <translation>HD-Verdichter</translation>
    </message>
    <message>
        <source>Turbine</source>
        <translation>Turbine</translation>
    </message>
    <message>
        <source>HP turbine</source>
        <translation>HD-Turbine</translation>
    </message>
    <message>
        <source>LP turbine</source>
        <translation>ND-Turbine</translation>
    </message>
</context>
<context>
    <name>cw::gui::AuditChart</name>
    <message>
        <source>Ideal twin</source>
        <translation>Idealer Zwilling</translation>
    </message>
    <message>
        <source>With losses</source>
        <translation>Mit Verlusten</translation>
    </message>
    <message>
        <source>TSFC</source>
        <translation>Spez. Verbrauch</translation>
    </message>
    <message>
        <source>Specific thrust F_s</source>
        <translation>Spezifischer Schub F_s</translation>
    </message>
    <message>
        <source>Waterfall of TSFC</source>
        <translation>Wasserfall des spezifischen Verbrauchs</translation>
    </message>
    <message>
        <source>Waterfall of specific thrust</source>
        <translation>Wasserfall des spezifischen Schubs</translation>
    </message>
    <message>
        <source>F_s</source>
        <translation>F_s</translation>
    </message>
    <message>
        <source>Baseline: %1</source>
        <translation>Basis: %1</translation>
    </message>
</context>
<context>
    <name>cw::gui::AuditPanel</name>
    <message>
        <source>Figure:</source>
        <translation>Größe:</translation>
    </message>
    <message>
        <source>Specific thrust</source>
        <translation>Spezifischer Schub</translation>
    </message>
    <message>
        <source>TSFC</source>
        <translation>Spez. Verbrauch</translation>
    </message>
    <message>
        <source>Table:</source>
        <translation>Tabelle:</translation>
    </message>
    <message>
        <source>Each loss removed alone</source>
        <translation>Jeder Verlust einzeln entfernt</translation>
    </message>
    <message>
        <source>Waterfall steps</source>
        <translation>Wasserfallstufen</translation>
    </message>
    <message>
        <source>Sensitivities per unit</source>
        <translation>Empfindlichkeiten je Einheit</translation>
    </message>
    <message>
        <source>Exergy destroyed</source>
        <translation>Exergievernichtung</translation>
    </message>
    <message>
        <source>&amp;Order…</source>
        <translation>&amp;Reihenfolge…</translation>
    </message>
    <message>
        <source>&amp;Baseline beside</source>
        <translation>Basis &amp;daneben</translation>
    </message>
    <message>
        <source>Show the baseline&apos;s waterfall, in grey, beside the current one (Edit &gt; Pin as Baseline)</source>
        <translation>Den Wasserfall der Basis grau neben dem aktuellen zeigen (Bearbeiten &gt; Als Basis festhalten)</translation>
    </message>
    <message>
        <source>The order in which the waterfall adds the losses to the ideal cycle</source>
        <translation>Die Reihenfolge, in der der Wasserfall die Verluste zum idealen Kreisprozess hinzufügt</translation>
    </message>
    <message>
        <source>The waterfall steps depend on the order in which the losses are added, because the losses interact; their sum does not.</source>
        <translation>Die Wasserfallstufen hängen von der Reihenfolge ab, in der die Verluste hinzugefügt werden, weil die Verluste zusammenwirken; ihre Summe nicht.</translation>
    </message>
</context>
<context>
    <name>cw::gui::AuditTableModel</name>
    <message>
        <source>Loss removed alone</source>
        <translation>Einzeln entfernter Verlust</translation>
    </message>
    <message>
        <source>ΔF_s [%1]</source>
        <translation>ΔF_s [%1]</translation>
    </message>
    <message>
        <source>ΔTSFC [%1]</source>
        <translation>Δ spez. Verbrauch [%1]</translation>
    </message>
    <message>
        <source>Step</source>
        <translation>Stufe</translation>
    </message>
    <message>
        <source>Loss added</source>
        <translation>Hinzugefügter Verlust</translation>
    </message>
    <message>
        <source>F_s step [%1]</source>
        <translation>F_s-Stufe [%1]</translation>
    </message>
    <message>
        <source>TSFC step [%1]</source>
        <translation>Verbrauchsstufe [%1]</translation>
    </message>
    <message>
        <source>Loss</source>
        <translation>Verlust</translation>
    </message>
    <message>
        <source>Per</source>
        <translation>Je</translation>
    </message>
    <message>
        <source>F_s per unit [%1]</source>
        <translation>F_s je Einheit [%1]</translation>
    </message>
    <message>
        <source>TSFC per unit [%1]</source>
        <translation>Spez. Verbrauch je Einheit [%1]</translation>
    </message>
    <message>
        <source>Difference</source>
        <translation>Differenz</translation>
    </message>
    <message>
        <source>Component</source>
        <translation>Komponente</translation>
    </message>
    <message>
        <source>Exergy destroyed [%1]</source>
        <translation>Vernichtete Exergie [%1]</translation>
    </message>
    <message>
        <source>Share of fuel exergy [%]</source>
        <translation>Anteil an der Kraftstoffexergie [%]</translation>
    </message>
    <message>
        <source>Ideal twin</source>
        <translation>Idealer Zwilling</translation>
    </message>
    <message>
        <source>With losses</source>
        <translation>Mit Verlusten</translation>
    </message>
    <message>
        <source>Sum of the steps (with losses − ideal)</source>
        <translation>Summe der Stufen (mit Verlusten − ideal)</translation>
    </message>
    <message>
        <source>central</source>
        <translation>zentral</translation>
    </message>
    <message>
        <source>forward</source>
        <translation>vorwärts</translation>
    </message>
    <message>
        <source>backward</source>
        <translation>rückwärts</translation>
    </message>
    <message>
        <source>All components</source>
        <translation>Alle Komponenten</translation>
    </message>
    <message>
        <source>Fuel exergy</source>
        <translation>Kraftstoffexergie</translation>
    </message>
    <message>
        <source>Closure (residual / fuel exergy)</source>
        <translation>Bilanzschluss (Rest / Kraftstoffexergie)</translation>
    </message>
</context>
<context>
    <name>cw::gui::CaseDocument</name>
    <message>
        <source>No solution for these inputs: %1</source>
        <translation>Keine Lösung für diese Eingaben: %1</translation>
    </message>
    <message>
        <source>The solver did not converge: %1</source>
        <translation>Der Löser ist nicht konvergiert: %1</translation>
    </message>
    <message>
        <source>A property is outside its data range: %1</source>
        <translation>Eine Stoffgröße liegt außerhalb ihres Datenbereichs: %1</translation>
    </message>
    <message>
        <source>Invalid input: %1</source>
        <translation>Ungültige Eingabe: %1</translation>
    </message>
    <message>
        <source>The evaluation gave a value that is not a finite number; the inputs are probably extreme.</source>
        <translation>Die Berechnung ergab einen Wert, der keine endliche Zahl ist; die Eingaben sind vermutlich extrem.</translation>
    </message>
    <message>
        <source>Evaluation failed: %1</source>
        <translation>Berechnung fehlgeschlagen: %1</translation>
    </message>
    <message>
        <source>Untitled case</source>
        <translation>Unbenannter Fall</translation>
    </message>
</context>
<context>
    <name>cw::gui::CaseForm</name>
    <message>
        <source>%1 = %2 is outside the valid range %3.</source>
        <translation>%1 = %2 liegt außerhalb des gültigen Bereichs %3.</translation>
    </message>
    <message>
        <source>%1: “%2” is not a number.</source>
        <translation>%1: „%2“ ist keine Zahl.</translation>
    </message>
    <message>
        <source>Change %1</source>
        <translation>%1 ändern</translation>
    </message>
</context>
<context>
    <name>cw::gui::CoreFailure</name>
    <message>
        <source>the temperature</source>
        <translation>die Temperatur</translation>
    </message>
    <message>
        <source>the enthalpy</source>
        <translation>die Enthalpie</translation>
    </message>
    <message>
        <source>the entropy</source>
        <translation>die Entropie</translation>
    </message>
    <message>
        <source>the pressure</source>
        <translation>der Druck</translation>
    </message>
    <message>
        <source>the Mach number</source>
        <translation>die Machzahl</translation>
    </message>
    <message>
        <source>the total-to-static pressure ratio</source>
        <translation>das Verhältnis von Total- zu statischem Druck</translation>
    </message>
    <message>
        <source>the fuel-air ratio</source>
        <translation>das Kraftstoff-Luft-Verhältnis</translation>
    </message>
    <message>
        <source>the efficiency</source>
        <translation>der Wirkungsgrad</translation>
    </message>
    <message>
        <source>the polytropic efficiency</source>
        <translation>der polytrope Wirkungsgrad</translation>
    </message>
    <message>
        <source>the area ratio A/A*</source>
        <translation>das Flächenverhältnis A/A*</translation>
    </message>
    <message>
        <source>the ambient temperature</source>
        <translation>die Umgebungstemperatur</translation>
    </message>
    <message>
        <source>the temperature at an enthalpy</source>
        <translation>die Temperatur zu einer Enthalpie</translation>
    </message>
    <message>
        <source>the temperature at an entropy</source>
        <translation>die Temperatur zu einer Entropie</translation>
    </message>
    <message>
        <source>the static temperature at a total temperature and Mach number</source>
        <translation>die statische Temperatur zu Totaltemperatur und Machzahl</translation>
    </message>
    <message>
        <source>the subsonic Mach number of an area ratio</source>
        <translation>die Unterschall-Machzahl eines Flächenverhältnisses</translation>
    </message>
    <message>
        <source>the supersonic Mach number of an area ratio</source>
        <translation>die Überschall-Machzahl eines Flächenverhältnisses</translation>
    </message>
    <message>
        <source>the velocity behind a normal shock</source>
        <translation>die Geschwindigkeit hinter einem senkrechten Verdichtungsstoß</translation>
    </message>
    <message>
        <source>the nozzle exit pressure of its area ratio</source>
        <translation>der Austrittsdruck der Schubdüse zu ihrem Flächenverhältnis</translation>
    </message>
    <message>
        <source>the air mass flow of the required net thrust</source>
        <translation>der Luftmassenstrom zum geforderten Nettoschub</translation>
    </message>
    <message>
        <source>%1 = %2 is outside the valid range %3</source>
        <translation>%1 = %2 liegt außerhalb des gültigen Bereichs %3</translation>
    </message>
    <message>
        <source>%1 meets a state beyond the gas data: %2</source>
        <translation>%1 erreicht einen Zustand außerhalb der Stoffdaten: %2</translation>
    </message>
    <message>
        <source>%1 cannot be reached at the engine face: %2</source>
        <translation>%1 ist am Verdichtereintritt nicht erreichbar: %2</translation>
    </message>
    <message>
        <source>%1 was not found after %2 iterations (residual %3)</source>
        <translation>%1 wurde nach %2 Iterationen nicht gefunden (Residuum %3)</translation>
    </message>
    <message>
        <source>the turbine cannot drive the compressor: it would need a specific work of %1, more than the gas at %2 holds</source>
        <translation>Die Turbine kann den Verdichter nicht antreiben: Sie bräuchte eine spezifische Arbeit von %1, mehr als das Gas bei %2 hergibt</translation>
    </message>
    <message>
        <source>the turbine cannot drive the compressor: the expansion for a specific work of %1 leaves the range of the gas data</source>
        <translation>Die Turbine kann den Verdichter nicht antreiben: Die Expansion für eine spezifische Arbeit von %1 verlässt den Bereich der Stoffdaten</translation>
    </message>
    <message>
        <source>the turbine cannot drive the compressor: no exit pressure gives a specific work of %1</source>
        <translation>Die Turbine kann den Verdichter nicht antreiben: Kein Austrittsdruck ergibt eine spezifische Arbeit von %1</translation>
    </message>
    <message>
        <source>%1: the entering gas holds no oxygen left to burn (fuel-air ratio %2)</source>
        <translation>%1: Das eintretende Gas enthält keinen Sauerstoff mehr zum Verbrennen (Kraftstoff-Luft-Verhältnis %2)</translation>
    </message>
    <message>
        <source>%1: the exit temperature %2 is below what the entering gas already has; no fuel can be burnt</source>
        <translation>%1: Die Austrittstemperatur %2 liegt unter der des eintretenden Gases; es kann kein Kraftstoff verbrannt werden</translation>
    </message>
    <message>
        <source>%1: the exit temperature %2 needs more fuel than the stoichiometric fuel-air ratio %3 allows</source>
        <translation>%1: Die Austrittstemperatur %2 braucht mehr Kraftstoff, als das stöchiometrische Kraftstoff-Luft-Verhältnis %3 zulässt</translation>
    </message>
    <message>
        <source>%1: the fuel-air ratio %2 is above the stoichiometric %3</source>
        <translation>%1: Das Kraftstoff-Luft-Verhältnis %2 liegt über dem stöchiometrischen %3</translation>
    </message>
    <message>
        <source>%1: the exit temperature %2 is not above the entry temperature %3; it only heats the stream</source>
        <translation>%1: Die Austrittstemperatur %2 liegt nicht über der Eintrittstemperatur %3; hier wird der Strom nur erwärmt</translation>
    </message>
    <message>
        <source>the nozzle&apos;s exit-to-throat area ratio %1 expands the jet below %2, the lowest temperature of the gas data</source>
        <translation>Das Flächenverhältnis Austritt zu Hals der Schubdüse %1 entspannt den Strahl unter %2, die tiefste Temperatur der Stoffdaten</translation>
    </message>
    <message>
        <source>the ambient pressure %1 is above %2, the pressure behind a normal shock at the exit of the nozzle&apos;s exit-to-throat area ratio %3: a shock would stand inside the nozzle, which the model does not cover (choose a smaller area ratio, full expansion or a convergent nozzle)</source>
        <translation>Der Umgebungsdruck %1 liegt über %2, dem Druck hinter einem senkrechten Verdichtungsstoß am Austritt der Schubdüse mit dem Flächenverhältnis Austritt zu Hals %3: Ein Stoß stünde in der Düse, was das Modell nicht abdeckt (ein kleineres Flächenverhältnis, volle Expansion oder eine konvergente Düse wählen)</translation>
    </message>
    <message>
        <source>the nozzle entry total pressure %1 is not above the ambient pressure %2, so there is no jet</source>
        <translation>Der Totaldruck am Schubdüseneintritt %1 liegt nicht über dem Umgebungsdruck %2, es entsteht also kein Strahl</translation>
    </message>
    <message>
        <source>the nozzle&apos;s velocity coefficient %1 leaves the jet too slow for a finite nozzle area</source>
        <translation>Der Geschwindigkeitsbeiwert %1 der Schubdüse lässt den Strahl zu langsam für eine endliche Düsenfläche</translation>
    </message>
    <message>
        <source>the nozzle&apos;s losses keep its throat from choking, so its divergent part cannot run supersonic; the model does not cover that regime</source>
        <translation>Die Verluste der Schubdüse halten ihren Hals vom Sperren ab, ihr divergenter Teil kann also nicht mit Überschall durchströmt werden; diesen Bereich deckt das Modell nicht ab</translation>
    </message>
    <message>
        <source>the net thrust %1 is not positive: the jet is slower than the flight speed</source>
        <translation>Der Nettoschub %1 ist nicht positiv: Der Strahl ist langsamer als die Fluggeschwindigkeit</translation>
    </message>
    <message>
        <source>a result is not a finite number: the inputs are beyond what the model can evaluate</source>
        <translation>Ein Ergebnis ist keine endliche Zahl: Die Eingaben liegen jenseits dessen, was das Modell auswerten kann</translation>
    </message>
    <message>
        <source>the search for %1 found no solution in its interval</source>
        <translation>Die Suche nach %1 fand in ihrem Intervall keine Lösung</translation>
    </message>
    <message>
        <source>the equations for %1 are not finite on the way to a solution</source>
        <translation>Die Gleichungen für %1 werden auf dem Weg zur Lösung nicht endlich</translation>
    </message>
    <message>
        <source>the search for %1 stopped after %2 iterations (scaled residual %3): there is no solution near its start</source>
        <translation>Die Suche nach %1 brach nach %2 Iterationen ab (skaliertes Residuum %3): Nahe ihrem Startwert gibt es keine Lösung</translation>
    </message>
    <message>
        <source>a normal shock has no downstream state below the sonic velocity</source>
        <translation>Ein senkrechter Verdichtungsstoß hat keinen Zustand dahinter unter der Schallgeschwindigkeit</translation>
    </message>
</context>
<context>
    <name>cw::gui::CycleChart</name>
    <message>
        <source>Closure to ambient</source>
        <translation>Schließung zur Umgebung</translation>
    </message>
    <message>
        <source>Temperature–entropy</source>
        <translation>Temperatur–Entropie</translation>
    </message>
    <message>
        <source>Specific entropy s</source>
        <translation>Spezifische Entropie s</translation>
    </message>
    <message>
        <source>Entropy s</source>
        <translation>Entropie s</translation>
    </message>
    <message>
        <source>Temperature T</source>
        <translation>Temperatur T</translation>
    </message>
    <message>
        <source>Pressure–volume</source>
        <translation>Druck–Volumen</translation>
    </message>
    <message>
        <source>Specific volume v</source>
        <translation>Spezifisches Volumen v</translation>
    </message>
    <message>
        <source>Pressure p</source>
        <translation>Druck p</translation>
    </message>
    <message>
        <source>Enthalpy–entropy</source>
        <translation>Enthalpie–Entropie</translation>
    </message>
    <message>
        <source>Sensible enthalpy h − h(298.15 K)</source>
        <translation>Fühlbare Enthalpie h − h(298,15 K)</translation>
    </message>
    <message>
        <source>h − h(298.15 K)</source>
        <translation>h − h(298,15 K)</translation>
    </message>
    <message>
        <source>Cycle with losses</source>
        <translation>Kreisprozess mit Verlusten</translation>
    </message>
    <message>
        <source>Ideal cycle</source>
        <translation>Idealer Kreisprozess</translation>
    </message>
    <message>
        <source>Closure, with losses</source>
        <translation>Schließung, mit Verlusten</translation>
    </message>
    <message>
        <source>Closure, ideal</source>
        <translation>Schließung, ideal</translation>
    </message>
    <message>
        <source>Station isobars</source>
        <translation>Isobaren der Stationen</translation>
    </message>
    <message>
        <source>Stations: 0, 8, 9 static;
2 to 7 total</source>
        <translation>Stationen: 0, 8, 9 statisch;
2 bis 7 Totalzustände</translation>
    </message>
    <message>
        <source>s = 0 at the free-stream
static state</source>
        <translation>s = 0 im statischen Zustand
der Anströmung</translation>
    </message>
    <message>
        <source>Selected: %1</source>
        <translation>Gewählt: %1</translation>
    </message>
    <message>
        <source>Ideal</source>
        <translation>Ideal</translation>
    </message>
    <message>
        <source>With losses</source>
        <translation>Mit Verlusten</translation>
    </message>
    <message>
        <source>%1, %2 (%3 → %4)
T = %5   s = %6
p = %7   v = %8</source>
        <translation>%1, %2 (%3 → %4)
T = %5   s = %6
p = %7   v = %8</translation>
    </message>
    <message>
        <source>Baseline: %1</source>
        <translation>Basis: %1</translation>
    </message>
    <message>
        <source>Station %1</source>
        <translation>Station %1</translation>
    </message>
</context>
<context>
    <name>cw::gui::GuardedApplication</name>
    <message>
        <source>out of memory</source>
        <translation>Speicher erschöpft</translation>
    </message>
    <message>
        <source>An internal error interrupted the last action: %1</source>
        <translation>Ein interner Fehler hat die letzte Aktion abgebrochen: %1</translation>
    </message>
    <message>
        <source>Internal error</source>
        <translation>Interner Fehler</translation>
    </message>
    <message>
        <source>Cyclewright keeps running. Save your case under a new name to be safe, and please report what you did.</source>
        <translation>Cyclewright läuft weiter. Speichern Sie Ihren Fall sicherheitshalber unter einem neuen Namen, und melden Sie bitte, was Sie getan haben.</translation>
    </message>
</context>
<context>
    <name>cw::gui::ImageExportDialog</name>
    <message>
        <source>Export as PNG</source>
        <translation>Als PNG exportieren</translation>
    </message>
    <message>
        <source>Export as SVG</source>
        <translation>Als SVG exportieren</translation>
    </message>
    <message>
        <source>Export as PDF</source>
        <translation>Als PDF exportieren</translation>
    </message>
    <message>
        <source>White</source>
        <translation>Weiß</translation>
    </message>
    <message>
        <source>Transparent</source>
        <translation>Transparent</translation>
    </message>
    <message>
        <source>&amp;Background:</source>
        <translation>Hinter&amp;grund:</translation>
    </message>
    <message>
        <source>Show the selected component</source>
        <translation>Die gewählte Komponente zeigen</translation>
    </message>
    <message>
        <source>&amp;Selection:</source>
        <translation>Aus&amp;wahl:</translation>
    </message>
    <message>
        <source>The chart&apos;s own title</source>
        <translation>Der eigene Titel des Diagramms</translation>
    </message>
    <message>
        <source>&amp;Title:</source>
        <translation>&amp;Titel:</translation>
    </message>
    <message>
        <source>No subtitle</source>
        <translation>Kein Untertitel</translation>
    </message>
    <message>
        <source>None</source>
        <translation>Keine</translation>
    </message>
    <message>
        <source>Subt&amp;itle:</source>
        <translation>&amp;Untertitel:</translation>
    </message>
    <message>
        <source>As on screen</source>
        <translation>Wie am Bildschirm</translation>
    </message>
    <message>
        <source>Inside the plot</source>
        <translation>Im Diagramm</translation>
    </message>
    <message>
        <source>Outside, right</source>
        <translation>Außen, rechts</translation>
    </message>
    <message>
        <source>Below</source>
        <translation>Darunter</translation>
    </message>
    <message>
        <source>&amp;Legend:</source>
        <translation>&amp;Legende:</translation>
    </message>
    <message>
        <source> pt</source>
        <translation> pt</translation>
    </message>
    <message>
        <source>&amp;Font:</source>
        <translation>&amp;Schrift:</translation>
    </message>
    <message>
        <source>× </source>
        <translation>× </translation>
    </message>
    <message>
        <source>The lines&apos; widths as on screen times this factor</source>
        <translation>Die Linienbreiten wie am Bildschirm, mal diesem Faktor</translation>
    </message>
    <message>
        <source>Li&amp;ne widths:</source>
        <translation>Li&amp;nienbreiten:</translation>
    </message>
    <message>
        <source> px</source>
        <translation> px</translation>
    </message>
    <message>
        <source> dpi</source>
        <translation> dpi</translation>
    </message>
    <message>
        <source>Resolution: sets the size of text and lines in pixels.</source>
        <translation>Auflösung: bestimmt die Größe von Schrift und Linien in Pixeln.</translation>
    </message>
    <message>
        <source>&amp;Width:</source>
        <translation>&amp;Breite:</translation>
    </message>
    <message>
        <source>&amp;Height:</source>
        <translation>&amp;Höhe:</translation>
    </message>
    <message>
        <source>&amp;Resolution:</source>
        <translation>&amp;Auflösung:</translation>
    </message>
    <message>
        <source>mm</source>
        <translation>mm</translation>
    </message>
    <message>
        <source>in</source>
        <translation>in</translation>
    </message>
    <message>
        <source>&amp;Unit:</source>
        <translation>&amp;Einheit:</translation>
    </message>
    <message>
        <source> in</source>
        <translation> in</translation>
    </message>
    <message>
        <source> mm</source>
        <translation> mm</translation>
    </message>
</context>
<context>
    <name>cw::gui::LossOrderDialog</name>
    <message>
        <source>Waterfall Order</source>
        <translation>Reihenfolge des Wasserfalls</translation>
    </message>
    <message>
        <source>Drag the losses into the order in which the waterfall adds them to the ideal cycle. The steps depend on the order; their sum does not.</source>
        <translation>Ziehen Sie die Verluste in die Reihenfolge, in der der Wasserfall sie zum idealen Kreisprozess hinzufügt. Die Stufen hängen von der Reihenfolge ab, ihre Summe nicht.</translation>
    </message>
    <message>
        <source>&amp;Flow order</source>
        <translation>&amp;Strömungsreihenfolge</translation>
    </message>
    <message>
        <source>The losses in the order the flow meets them</source>
        <translation>Die Verluste in der Reihenfolge, in der die Strömung sie durchläuft</translation>
    </message>
</context>
<context>
    <name>cw::gui::MainWindow</name>
    <message>
        <source>Ready</source>
        <translation>Bereit</translation>
    </message>
    <message>
        <source>About Cyclewright</source>
        <translation>Über Cyclewright</translation>
    </message>
    <message>
        <source>&lt;b&gt;Cyclewright %1&lt;/b&gt;&lt;br&gt;A gas-turbine cycle explorer for conceptual design.</source>
        <translation>&lt;b&gt;Cyclewright %1&lt;/b&gt;&lt;br&gt;Ein Werkzeug zur Untersuchung von Gasturbinen-Kreisprozessen im Konzeptentwurf.</translation>
    </message>
    <message>
        <source>Stations</source>
        <translation>Stationen</translation>
    </message>
    <message>
        <source>With losses</source>
        <translation>Mit Verlusten</translation>
    </message>
    <message>
        <source>Ideal</source>
        <translation>Ideal</translation>
    </message>
    <message>
        <source>Difference (with losses − ideal)</source>
        <translation>Differenz (mit Verlusten − ideal)</translation>
    </message>
    <message>
        <source>Performance</source>
        <translation>Leistung</translation>
    </message>
    <message>
        <source>Temperature–entropy</source>
        <translation>Temperatur–Entropie</translation>
    </message>
    <message>
        <source>Pressure–volume</source>
        <translation>Druck–Volumen</translation>
    </message>
    <message>
        <source>Enthalpy–entropy</source>
        <translation>Enthalpie–Entropie</translation>
    </message>
    <message>
        <source>%1: %2 is outside the valid range %3</source>
        <translation>%1: %2 liegt außerhalb des gültigen Bereichs %3</translation>
    </message>
    <message>
        <source>Charts and tables show the last valid result (stale).</source>
        <translation>Diagramme und Tabellen zeigen das letzte gültige Ergebnis (veraltet).</translation>
    </message>
    <message>
        <source>There is no result for this case: the charts and tables are empty.</source>
        <translation>Für diesen Fall gibt es kein Ergebnis: Diagramme und Tabellen bleiben leer.</translation>
    </message>
    <message>
        <source>Stale result. %1
%2</source>
        <translation>Veraltetes Ergebnis. %1
%2</translation>
    </message>
    <message>
        <source>%1 (unlit)</source>
        <translation>%1 (nicht gezündet)</translation>
    </message>
    <message>
        <source>%1: stations %2</source>
        <translation>%1: Stationen %2</translation>
    </message>
    <message>
        <source>Loss audit</source>
        <translation>Verlustanalyse</translation>
    </message>
    <message>
        <source>&amp;Loss Audit</source>
        <translation>&amp;Verlustanalyse</translation>
    </message>
    <message>
        <source>Stations and performance</source>
        <translation>Stationen und Leistung</translation>
    </message>
    <message>
        <source>Trade study</source>
        <translation>Parameterstudie</translation>
    </message>
    <message>
        <source>Trade &amp;Study</source>
        <translation>&amp;Parameterstudie</translation>
    </message>
    <message>
        <source>&amp;Enthalpy–Entropy Chart Beside</source>
        <translation>&amp;Enthalpie–Entropie-Diagramm daneben</translation>
    </message>
    <message>
        <source>Difference from baseline (with losses − baseline)</source>
        <translation>Differenz zur Basis (mit Verlusten − Basis)</translation>
    </message>
    <message>
        <source>Baseline: %1</source>
        <translation>Basis: %1</translation>
    </message>
    <message>
        <source>There is no result to pin as the baseline.</source>
        <translation>Es gibt kein Ergebnis, das als Basis festgehalten werden kann.</translation>
    </message>
</context>
<context>
    <name>cw::gui::PerformanceModel</name>
    <message>
        <source>Net thrust</source>
        <translation>Nettoschub</translation>
    </message>
    <message>
        <source>Specific thrust</source>
        <translation>Spezifischer Schub</translation>
    </message>
    <message>
        <source>Thrust-specific fuel consumption</source>
        <translation>Schubspezifischer Kraftstoffverbrauch</translation>
    </message>
    <message>
        <source>Fuel-air ratio</source>
        <translation>Kraftstoff-Luft-Verhältnis</translation>
    </message>
    <message>
        <source>Fuel flow</source>
        <translation>Kraftstoffmassenstrom</translation>
    </message>
    <message>
        <source>Thermal efficiency</source>
        <translation>Thermischer Wirkungsgrad</translation>
    </message>
    <message>
        <source>Propulsive efficiency</source>
        <translation>Vortriebswirkungsgrad</translation>
    </message>
    <message>
        <source>Overall efficiency</source>
        <translation>Gesamtwirkungsgrad</translation>
    </message>
    <message>
        <source>Jet velocity</source>
        <translation>Strahlgeschwindigkeit</translation>
    </message>
    <message>
        <source>Performance</source>
        <translation>Leistung</translation>
    </message>
    <message>
        <source>With losses</source>
        <translation>Mit Verlusten</translation>
    </message>
    <message>
        <source>Ideal</source>
        <translation>Ideal</translation>
    </message>
    <message>
        <source>Difference</source>
        <translation>Differenz</translation>
    </message>
    <message>
        <source>Unit</source>
        <translation>Einheit</translation>
    </message>
    <message>
        <source>Baseline</source>
        <translation>Basis</translation>
    </message>
    <message>
        <source>Change from baseline</source>
        <translation>Änderung zur Basis</translation>
    </message>
    <message>
        <source>Change [%]</source>
        <translation>Änderung [%]</translation>
    </message>
    <message>
        <source>Δ</source>
        <translation>Δ</translation>
    </message>
    <message>
        <source>Δ [%]</source>
        <translation>Δ [%]</translation>
    </message>
    <message>
        <source>Change from the baseline: with losses minus the baseline, in the row&apos;s unit (baseline: %1)</source>
        <translation>Änderung zur Basis: mit Verlusten minus Basis, in der Einheit der Zeile (Basis: %1)</translation>
    </message>
    <message>
        <source>Change from the baseline in percent of the baseline (baseline: %1)</source>
        <translation>Änderung zur Basis in Prozent der Basis (Basis: %1)</translation>
    </message>
    <message>
        <source>Baseline: %1</source>
        <translation>Basis: %1</translation>
    </message>
</context>
<context>
    <name>cw::gui::PreferencesDialog</name>
    <message>
        <source>Preferences</source>
        <translation>Einstellungen</translation>
    </message>
    <message>
        <source>SI (K, kPa, kg/s, N)</source>
        <translation>SI (K, kPa, kg/s, N)</translation>
    </message>
    <message>
        <source>U.S. customary (°R, psia, lbm/s, lbf)</source>
        <translation>US-Einheiten (°R, psia, lbm/s, lbf)</translation>
    </message>
    <message>
        <source>Units for display and entry. Case files always store SI values.</source>
        <translation>Einheiten für Anzeige und Eingabe. Falldateien speichern stets SI-Werte.</translation>
    </message>
    <message>
        <source>&amp;Units:</source>
        <translation>&amp;Einheiten:</translation>
    </message>
    <message>
        <source>Side by side</source>
        <translation>Nebeneinander</translation>
    </message>
    <message>
        <source>Tabbed</source>
        <translation>In Reitern</translation>
    </message>
    <message>
        <source>&amp;Charts:</source>
        <translation>&amp;Diagramme:</translation>
    </message>
    <message>
        <source> s</source>
        <translation> s</translation>
    </message>
    <message>
        <source>Unsaved edits are saved for recovery after a crash 2 s after the last edit, and at the latest this many seconds after the first, even while you keep typing.</source>
        <translation>Ungespeicherte Änderungen werden für die Wiederherstellung nach einem Absturz 2 s nach der letzten Änderung automatisch gespeichert, spätestens aber so viele Sekunden nach der ersten, auch während Sie weitertippen.</translation>
    </message>
    <message>
        <source>&amp;Autosave edits within:</source>
        <translation>&amp;Automatisch speichern binnen:</translation>
    </message>
</context>
<context>
    <name>cw::gui::StationTableModel</name>
    <message>
        <source>Station</source>
        <translation>Station</translation>
    </message>
    <message>
        <source>Tt</source>
        <translation>Tt</translation>
    </message>
    <message>
        <source>pt</source>
        <translation>pt</translation>
    </message>
    <message>
        <source>Ts</source>
        <translation>Ts</translation>
    </message>
    <message>
        <source>ps</source>
        <translation>ps</translation>
    </message>
    <message>
        <source>M</source>
        <translation>M</translation>
    </message>
    <message>
        <source>V</source>
        <translation>V</translation>
    </message>
    <message>
        <source>W</source>
        <translation>W</translation>
    </message>
    <message>
        <source>f</source>
        <translation>f</translation>
    </message>
    <message>
        <source>s</source>
        <translation>s</translation>
    </message>
    <message>
        <source>A</source>
        <translation>A</translation>
    </message>
    <message>
        <source>Stations, cycle with losses</source>
        <translation>Stationen, Kreisprozess mit Verlusten</translation>
    </message>
    <message>
        <source>Stations, ideal cycle</source>
        <translation>Stationen, idealer Kreisprozess</translation>
    </message>
    <message>
        <source>Stations, difference (with losses − ideal)</source>
        <translation>Stationen, Differenz (mit Verlusten − ideal)</translation>
    </message>
    <message>
        <source>Stations, difference from the baseline (with losses − baseline)</source>
        <translation>Stationen, Differenz zur Basis (mit Verlusten − Basis)</translation>
    </message>
</context>
<context>
    <name>cw::gui::StudyAxisEditor</name>
    <message>
        <source>from</source>
        <translation>von</translation>
    </message>
    <message>
        <source>to</source>
        <translation>bis</translation>
    </message>
    <message>
        <source>values</source>
        <translation>Werte</translation>
    </message>
    <message>
        <source>Number of evenly spaced values from start to stop, both included (1 to %1)</source>
        <translation>Anzahl gleichmäßig verteilter Werte vom Anfang bis zum Ende, beide eingeschlossen (1 bis %1)</translation>
    </message>
    <message>
        <source>Valid range: %1</source>
        <translation>Gültiger Bereich: %1</translation>
    </message>
    <message>
        <source>First value [%1]. %2</source>
        <translation>Erster Wert [%1]. %2</translation>
    </message>
    <message>
        <source>Last value [%1]. %2</source>
        <translation>Letzter Wert [%1]. %2</translation>
    </message>
    <message>
        <source>Start: “%1” is not a number.</source>
        <translation>Anfang: „%1“ ist keine Zahl.</translation>
    </message>
    <message>
        <source>Stop: “%1” is not a number.</source>
        <translation>Ende: „%1“ ist keine Zahl.</translation>
    </message>
    <message>
        <source>The case has no numeric input to vary here.</source>
        <translation>Der Fall hat hier keine Zahleneingabe, die variiert werden kann.</translation>
    </message>
    <message>
        <source>Start = %1 is outside the valid range %2 of %3.</source>
        <translation>Anfang = %1 liegt außerhalb des gültigen Bereichs %2 von %3.</translation>
    </message>
    <message>
        <source>Stop = %1 is outside the valid range %2 of %3.</source>
        <translation>Ende = %1 liegt außerhalb des gültigen Bereichs %2 von %3.</translation>
    </message>
    <message>
        <source>One value takes the same start and stop; give 2 values or more for a range.</source>
        <translation>Ein einzelner Wert braucht gleichen Anfang und gleiches Ende; für einen Bereich 2 oder mehr Werte angeben.</translation>
    </message>
    <message>
        <source>Start and stop are the same: give a different stop, or 1 value.</source>
        <translation>Anfang und Ende sind gleich: ein anderes Ende oder 1 Wert angeben.</translation>
    </message>
</context>
<context>
    <name>cw::gui::StudyChangeEditor</name>
    <message>
        <source>The value of this input in the second study [%1]. %2</source>
        <translation>Der Wert dieser Eingabe in der zweiten Studie [%1]. %2</translation>
    </message>
    <message>
        <source>Valid range: %1</source>
        <translation>Gültiger Bereich: %1</translation>
    </message>
    <message>
        <source>Value: “%1” is not a number.</source>
        <translation>Wert: „%1“ ist keine Zahl.</translation>
    </message>
    <message>
        <source>The case has no numeric input to set.</source>
        <translation>Der Fall hat keine Zahleneingabe, die gesetzt werden kann.</translation>
    </message>
    <message>
        <source>%1 = %2 is outside the valid range %3.</source>
        <translation>%1 = %2 liegt außerhalb des gültigen Bereichs %3.</translation>
    </message>
</context>
<context>
    <name>cw::gui::StudyChart</name>
    <message>
        <source>Ideal twin, no losses (dashed)</source>
        <translation>Idealer Zwilling, ohne Verluste (gestrichelt)</translation>
    </message>
    <message>
        <source>With %1 (dashed)</source>
        <translation>Mit %1 (gestrichelt)</translation>
    </message>
    <message>
        <source>Carpet: specific thrust against TSFC</source>
        <translation>Teppichdiagramm: spezifischer Schub über spez. Verbrauch</translation>
    </message>
    <message>
        <source>%1 against %2</source>
        <translation>%1 über %2</translation>
    </message>
    <message>
        <source>TSFC</source>
        <translation>Spez. Verbrauch</translation>
    </message>
    <message>
        <source>Specific thrust F_s</source>
        <translation>Spezifischer Schub F_s</translation>
    </message>
    <message>
        <source>Stale: the case has changed since this study ran; press Run to redo it</source>
        <translation>Veraltet: der Fall wurde seit dieser Studie geändert; zum Neurechnen Starten drücken</translation>
    </message>
    <message>
        <source>Design point</source>
        <translation>Auslegungspunkt</translation>
    </message>
    <message>
        <source>Design point (the case as it is)</source>
        <translation>Auslegungspunkt (der Fall, wie er ist)</translation>
    </message>
    <message>
        <source>The ideal twin has no figure of its own for this output.</source>
        <translation>Der ideale Zwilling hat für diese Größe keinen eigenen Wert.</translation>
    </message>
    <message>
        <source>Press Run to compute the comparison.</source>
        <translation>Zum Berechnen des Vergleichs Starten drücken.</translation>
    </message>
    <message>
        <source>Cycle with losses</source>
        <translation>Kreisprozess mit Verlusten</translation>
    </message>
    <message>
        <source>Constant %1</source>
        <translation>Konstant: %1</translation>
    </message>
    <message>
        <source>No study yet: choose the inputs to vary and press Run.</source>
        <translation>Noch keine Studie: die zu variierenden Eingaben wählen und Starten drücken.</translation>
    </message>
    <message>
        <source>No point of this study has this figure.</source>
        <translation>Kein Punkt dieser Studie hat diese Größe.</translation>
    </message>
    <message>
        <source>with losses</source>
        <translation>mit Verlusten</translation>
    </message>
    <message>
        <source>ideal twin</source>
        <translation>idealer Zwilling</translation>
    </message>
    <message>
        <source>comparison</source>
        <translation>Vergleich</translation>
    </message>
    <message>
        <source>F_s</source>
        <translation>F_s</translation>
    </message>
    <message>
        <source>%1, step %2</source>
        <translation>%1, Schrittweite %2</translation>
    </message>
</context>
<context>
    <name>cw::gui::StudyNames</name>
    <message>
        <source>Net thrust</source>
        <translation>Nettoschub</translation>
    </message>
    <message>
        <source>Gross thrust</source>
        <translation>Bruttoschub</translation>
    </message>
    <message>
        <source>Ram drag</source>
        <translation>Einlaufimpulswiderstand</translation>
    </message>
    <message>
        <source>Specific thrust</source>
        <translation>Spezifischer Schub</translation>
    </message>
    <message>
        <source>TSFC</source>
        <translation>Spez. Verbrauch</translation>
    </message>
    <message>
        <source>Fuel flow</source>
        <translation>Kraftstoffmassenstrom</translation>
    </message>
    <message>
        <source>Fuel-air ratio</source>
        <translation>Kraftstoff-Luft-Verhältnis</translation>
    </message>
    <message>
        <source>Thermal efficiency</source>
        <translation>Thermischer Wirkungsgrad</translation>
    </message>
    <message>
        <source>Propulsive efficiency</source>
        <translation>Vortriebswirkungsgrad</translation>
    </message>
    <message>
        <source>Overall efficiency</source>
        <translation>Gesamtwirkungsgrad</translation>
    </message>
    <message>
        <source>Jet velocity</source>
        <translation>Strahlgeschwindigkeit</translation>
    </message>
    <message>
        <source>Nozzle choked (1 yes, 0 no)</source>
        <translation>Schubdüse kritisch (1 ja, 0 nein)</translation>
    </message>
    <message>
        <source>Air mass flow</source>
        <translation>Luftmassenstrom</translation>
    </message>
    <message>
        <source>Burner exit temperature</source>
        <translation>Brennkammeraustrittstemperatur</translation>
    </message>
    <message>
        <source>Inlet capture area</source>
        <translation>Einlauf-Fangfläche</translation>
    </message>
    <message>
        <source>Engine-face diameter</source>
        <translation>Durchmesser am Verdichtereintritt</translation>
    </message>
    <message>
        <source>Nozzle throat area</source>
        <translation>Halsfläche der Schubdüse</translation>
    </message>
    <message>
        <source>Nozzle exit area</source>
        <translation>Austrittsfläche der Schubdüse</translation>
    </message>
    <message>
        <source>TSFC change without %1</source>
        <translation>Änderung des spez. Verbrauchs ohne %1</translation>
    </message>
    <message>
        <source>Specific thrust gained without %1</source>
        <translation>Gewinn an spezifischem Schub ohne %1</translation>
    </message>
    <message>
        <source>Ideal twin: %1</source>
        <translation>Idealer Zwilling: %1</translation>
    </message>
    <message>
        <source>Cycle</source>
        <translation>Kreisprozess</translation>
    </message>
    <message>
        <source>Invalid input</source>
        <translation>Ungültige Eingabe</translation>
    </message>
    <message>
        <source>No cycle</source>
        <translation>Kein Kreisprozess</translation>
    </message>
    <message>
        <source>Not converged</source>
        <translation>Nicht konvergiert</translation>
    </message>
    <message>
        <source>Beyond the gas data</source>
        <translation>Außerhalb der Gasdaten</translation>
    </message>
    <message>
        <source>Not run</source>
        <translation>Nicht gerechnet</translation>
    </message>
</context>
<context>
    <name>cw::gui::StudyTableModel</name>
    <message>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <source>Why there is no cycle</source>
        <translation>Warum es keinen Kreisprozess gibt</translation>
    </message>
</context>
<context>
    <name>cw::gui::TradeStudyPanel</name>
    <message>
        <source>Vary:</source>
        <translation>Variieren:</translation>
    </message>
    <message>
        <source>And a second input (a carpet):</source>
        <translation>Und eine zweite Eingabe (ein Teppichdiagramm):</translation>
    </message>
    <message>
        <source>Vary two inputs: every value of the first with every value of the second</source>
        <translation>Zwei Eingaben variieren: jeder Wert der ersten mit jedem Wert der zweiten</translation>
    </message>
    <message>
        <source>Loss audit at every point</source>
        <translation>Verlustanalyse in jedem Punkt</translation>
    </message>
    <message>
        <source>Add each point&apos;s one-at-a-time loss audit (its outputs can then be plotted); slower</source>
        <translation>Die Einzelverlustanalyse jedes Punktes hinzufügen (ihre Größen lassen sich dann auftragen); langsamer</translation>
    </message>
    <message>
        <source>Compare with:</source>
        <translation>Vergleichen mit:</translation>
    </message>
    <message>
        <source>Nothing</source>
        <translation>Nichts</translation>
    </message>
    <message>
        <source>Ideal twin (the same points without losses)</source>
        <translation>Idealer Zwilling (dieselben Punkte ohne Verluste)</translation>
    </message>
    <message>
        <source>One input set differently:</source>
        <translation>Eine Eingabe anders gesetzt:</translation>
    </message>
    <message>
        <source>&amp;Run</source>
        <translation>&amp;Starten</translation>
    </message>
    <message>
        <source>Run the study in the background (a running one is cancelled)</source>
        <translation>Die Studie im Hintergrund rechnen (eine laufende wird abgebrochen)</translation>
    </message>
    <message>
        <source>Cancel</source>
        <translation>Abbrechen</translation>
    </message>
    <message>
        <source>Stop the running study; the points run so far are shown</source>
        <translation>Die laufende Studie anhalten; die bis dahin gerechneten Punkte werden gezeigt</translation>
    </message>
    <message>
        <source>Plot:</source>
        <translation>Auftragen:</translation>
    </message>
    <message>
        <source>The second input must differ from the first.</source>
        <translation>Die zweite Eingabe muss sich von der ersten unterscheiden.</translation>
    </message>
    <message>
        <source>%1 × %2 = %3 points is more than a study may have (%4).</source>
        <translation>%1 × %2 = %3 Punkte sind mehr, als eine Studie haben darf (%4).</translation>
    </message>
    <message>
        <source>This input is varied by the study; choose another one to set differently.</source>
        <translation>Diese Eingabe wird von der Studie variiert; eine andere zum abweichenden Setzen wählen.</translation>
    </message>
    <message>
        <source>Cannot run:
%1</source>
        <translation>Kann nicht rechnen:
%1</translation>
    </message>
    <message>
        <source>The comparison cannot run: %1</source>
        <translation>Der Vergleich kann nicht gerechnet werden: %1</translation>
    </message>
    <message>
        <source>Running…</source>
        <translation>Läuft…</translation>
    </message>
    <message>
        <source>The study cannot run: %1</source>
        <translation>Die Studie kann nicht gerechnet werden: %1</translation>
    </message>
    <message>
        <source>Carpet: specific thrust against TSFC</source>
        <translation>Teppichdiagramm: spezifischer Schub über spez. Verbrauch</translation>
    </message>
    <message>
        <source>Choose one input to vary (a sweep) or two (a carpet) and press Run.</source>
        <translation>Eine Eingabe zum Variieren wählen (eine Variation) oder zwei (ein Teppichdiagramm) und Starten drücken.</translation>
    </message>
    <message>
        <source>Stopped after %1 of %2 points.</source>
        <translation>Angehalten nach %1 von %2 Punkten.</translation>
    </message>
    <message>
        <source>Every point run has a cycle (%1 points).</source>
        <translation>Jeder gerechnete Punkt hat einen Kreisprozess (%1 Punkte).</translation>
    </message>
    <message>
        <source>%1 of %2 points have no cycle: they leave gaps in the lines; the table gives each reason.</source>
        <translation>%1 von %2 Punkten haben keinen Kreisprozess: sie lassen Lücken in den Linien; die Tabelle nennt jeweils den Grund.</translation>
    </message>
    <message>
        <source>Comparison: %1 of %2 points have no cycle.</source>
        <translation>Vergleich: %1 von %2 Punkten haben keinen Kreisprozess.</translation>
    </message>
    <message>
        <source>… and %1 other reasons</source>
        <translation>… und %1 weitere Gründe</translation>
    </message>
    <message>
        <source>%1 × %2</source>
        <translation>%1 × %2</translation>
    </message>
</context>
<context>
    <name>cw::gui::WindowActions</name>
    <message>
        <source>&amp;File</source>
        <translation>&amp;Datei</translation>
    </message>
    <message>
        <source>&amp;Quit</source>
        <translation>&amp;Beenden</translation>
    </message>
    <message>
        <source>&amp;Help</source>
        <translation>&amp;Hilfe</translation>
    </message>
    <message>
        <source>&amp;About Cyclewright</source>
        <translation>Ü&amp;ber Cyclewright</translation>
    </message>
    <message>
        <source>&amp;New</source>
        <translation>&amp;Neu</translation>
    </message>
    <message>
        <source>&amp;Open…</source>
        <translation>Ö&amp;ffnen…</translation>
    </message>
    <message>
        <source>&amp;Save</source>
        <translation>&amp;Speichern</translation>
    </message>
    <message>
        <source>Save &amp;As…</source>
        <translation>Speichern &amp;unter…</translation>
    </message>
    <message>
        <source>&amp;Preferences…</source>
        <translation>&amp;Einstellungen…</translation>
    </message>
    <message>
        <source>&amp;Undo</source>
        <translation>&amp;Rückgängig</translation>
    </message>
    <message>
        <source>&amp;Redo</source>
        <translation>&amp;Wiederholen</translation>
    </message>
    <message>
        <source>Undo</source>
        <translation>Rückgängig</translation>
    </message>
    <message>
        <source>Redo</source>
        <translation>Wiederholen</translation>
    </message>
    <message>
        <source>&amp;Reset Zoom</source>
        <translation>Zoom &amp;zurücksetzen</translation>
    </message>
    <message>
        <source>Show the whole cycle on both charts</source>
        <translation>Den ganzen Kreisprozess in beiden Diagrammen zeigen</translation>
    </message>
    <message>
        <source>&amp;Logarithmic Pressure–Volume Axes</source>
        <translation>&amp;Logarithmische Druck–Volumen-Achsen</translation>
    </message>
    <message>
        <source>Log p–v</source>
        <translation>Log p–v</translation>
    </message>
    <message>
        <source>Charts &amp;Side by Side</source>
        <translation>Diagramme &amp;nebeneinander</translation>
    </message>
    <message>
        <source>Side by Side</source>
        <translation>Nebeneinander</translation>
    </message>
    <message>
        <source>Charts in &amp;Tabs</source>
        <translation>Diagramme in &amp;Reitern</translation>
    </message>
    <message>
        <source>Tabs</source>
        <translation>Reiter</translation>
    </message>
    <message>
        <source>Copy &amp;Temperature–Entropy Chart</source>
        <translation>&amp;Temperatur–Entropie-Diagramm kopieren</translation>
    </message>
    <message>
        <source>Copy &amp;Pressure–Volume Chart</source>
        <translation>&amp;Druck–Volumen-Diagramm kopieren</translation>
    </message>
    <message>
        <source>Copy Station &amp;Table</source>
        <translation>Stations&amp;tabelle kopieren</translation>
    </message>
    <message>
        <source>Open &amp;Recent</source>
        <translation>&amp;Zuletzt geöffnet</translation>
    </message>
    <message>
        <source>&amp;Export</source>
        <translation>&amp;Exportieren</translation>
    </message>
    <message>
        <source>PNG Image…</source>
        <translation>PNG-Bild…</translation>
    </message>
    <message>
        <source>SVG Drawing…</source>
        <translation>SVG-Zeichnung…</translation>
    </message>
    <message>
        <source>PDF Document…</source>
        <translation>PDF-Dokument…</translation>
    </message>
    <message>
        <source>Temperature–Entropy Chart as %1</source>
        <translation>Temperatur–Entropie-Diagramm als %1</translation>
    </message>
    <message>
        <source>Pressure–Volume Chart as %1</source>
        <translation>Druck–Volumen-Diagramm als %1</translation>
    </message>
    <message>
        <source>Enthalpy–Entropy Chart as %1</source>
        <translation>Enthalpie–Entropie-Diagramm als %1</translation>
    </message>
    <message>
        <source>Station Table as CSV…</source>
        <translation>Stationstabelle als CSV…</translation>
    </message>
    <message>
        <source>Results as JSON…</source>
        <translation>Ergebnisse als JSON…</translation>
    </message>
    <message>
        <source>&amp;Edit</source>
        <translation>&amp;Bearbeiten</translation>
    </message>
    <message>
        <source>&amp;View</source>
        <translation>&amp;Ansicht</translation>
    </message>
    <message>
        <source>Main</source>
        <translation>Haupt</translation>
    </message>
    <message>
        <source>No recent files</source>
        <translation>Keine zuletzt geöffneten Dateien</translation>
    </message>
    <message>
        <source>Loss Audit Chart as %1</source>
        <translation>Verlustanalyse-Diagramm als %1</translation>
    </message>
    <message>
        <source>Loss Audit Table as CSV…</source>
        <translation>Verlustanalyse-Tabelle als CSV…</translation>
    </message>
    <message>
        <source>Copy Trade &amp;Study Table</source>
        <translation>Tabelle der &amp;Parameterstudie kopieren</translation>
    </message>
    <message>
        <source>Trade Study Chart as %1</source>
        <translation>Parameterstudien-Diagramm als %1</translation>
    </message>
    <message>
        <source>Trade Study as CSV…</source>
        <translation>Parameterstudie als CSV…</translation>
    </message>
    <message>
        <source>Trade Study as JSON…</source>
        <translation>Parameterstudie als JSON…</translation>
    </message>
    <message>
        <source>&amp;Pin as Baseline</source>
        <translation>Als &amp;Basis festhalten</translation>
    </message>
    <message>
        <source>Keep the shown result as the baseline the tables compare against</source>
        <translation>Das angezeigte Ergebnis als Basis festhalten, mit der die Tabellen vergleichen</translation>
    </message>
    <message>
        <source>Open &amp;Baseline…</source>
        <translation>&amp;Basis öffnen…</translation>
    </message>
    <message>
        <source>&amp;Clear Baseline</source>
        <translation>Basis &amp;entfernen</translation>
    </message>
    <message>
        <source>Copy &amp;Performance Table</source>
        <translation>&amp;Leistungstabelle kopieren</translation>
    </message>
    <message>
        <source>New</source>
        <translation>Neu</translation>
    </message>
    <message>
        <source>New turbojet case</source>
        <translation>Neuer Fall: Strahltriebwerk</translation>
    </message>
</context>
<context>
    <name>cw::gui::WindowAutosave</name>
    <message>
        <source>Autosave failed: %1</source>
        <translation>Automatisches Speichern fehlgeschlagen: %1</translation>
    </message>
    <message>
        <source>Recovered the autosaved case; save it to keep it.</source>
        <translation>Automatisch gespeicherter Fall wiederhergestellt; zum Behalten speichern.</translation>
    </message>
    <message>
        <source>Recover case</source>
        <translation>Fall wiederherstellen</translation>
    </message>
    <message>
        <source>Cannot recover: %1</source>
        <translation>Wiederherstellen nicht möglich: %1</translation>
    </message>
    <message>
        <source>Cannot recover case</source>
        <translation>Fall kann nicht wiederhergestellt werden</translation>
    </message>
    <message>
        <source>It was left where it is.</source>
        <translation>Er wurde an seinem Ort belassen.</translation>
    </message>
    <message>
        <source>It was kept as %1.</source>
        <translation>Er wurde als %1 aufbewahrt.</translation>
    </message>
    <message>
        <source>An autosaved case cannot be recovered. %1</source>
        <translation>Ein automatisch gespeicherter Fall kann nicht wiederhergestellt werden. %1</translation>
    </message>
    <message>
        <source>An autosaved case cannot be recovered: %1</source>
        <translation>Ein automatisch gespeicherter Fall kann nicht wiederhergestellt werden: %1</translation>
    </message>
    <message>
        <source>Cyclewright did not close normally. Recover the untitled case autosaved at %1?</source>
        <translation>Cyclewright wurde nicht normal beendet. Den um %1 automatisch gespeicherten unbenannten Fall wiederherstellen?</translation>
    </message>
    <message>
        <source>Cyclewright did not close normally. Recover the changes to %1 autosaved at %2?</source>
        <translation>Cyclewright wurde nicht normal beendet. Die um %2 automatisch gespeicherten Änderungen an %1 wiederherstellen?</translation>
    </message>
    <message>
        <source>No discards this autosave.</source>
        <translation>„Nein“ verwirft diese automatische Speicherung.</translation>
    </message>
</context>
<context>
    <name>cw::gui::WindowExports</name>
    <message>
        <source>PNG images (*.png)</source>
        <translation>PNG-Bilder (*.png)</translation>
    </message>
    <message>
        <source>SVG drawings (*.svg)</source>
        <translation>SVG-Zeichnungen (*.svg)</translation>
    </message>
    <message>
        <source>PDF documents (*.pdf)</source>
        <translation>PDF-Dokumente (*.pdf)</translation>
    </message>
    <message>
        <source>Export Chart</source>
        <translation>Diagramm exportieren</translation>
    </message>
    <message>
        <source>Exported %1</source>
        <translation>%1 exportiert</translation>
    </message>
    <message>
        <source>Cannot write %1</source>
        <translation>%1 kann nicht geschrieben werden</translation>
    </message>
    <message>
        <source>Export Station Table</source>
        <translation>Stationstabelle exportieren</translation>
    </message>
    <message>
        <source>Export Results</source>
        <translation>Ergebnisse exportieren</translation>
    </message>
    <message>
        <source>CSV files (*.csv)</source>
        <translation>CSV-Dateien (*.csv)</translation>
    </message>
    <message>
        <source>JSON files (*.json)</source>
        <translation>JSON-Dateien (*.json)</translation>
    </message>
    <message>
        <source>Exported %1 (SI units)</source>
        <translation>%1 exportiert (SI-Einheiten)</translation>
    </message>
    <message>
        <source>Chart copied to the clipboard</source>
        <translation>Diagramm in die Zwischenablage kopiert</translation>
    </message>
    <message>
        <source>Station table copied as tab-separated text</source>
        <translation>Stationstabelle als tabulatorgetrennter Text kopiert</translation>
    </message>
    <message>
        <source>Export Loss Audit</source>
        <translation>Verlustanalyse exportieren</translation>
    </message>
    <message>
        <source>There is no trade study to export yet: run one first.</source>
        <translation>Es gibt noch keine Parameterstudie zum Exportieren: zuerst eine rechnen.</translation>
    </message>
    <message>
        <source>Export Trade Study</source>
        <translation>Parameterstudie exportieren</translation>
    </message>
    <message>
        <source>Exported %1 (the units are in the column names)</source>
        <translation>%1 exportiert (die Einheiten stehen in den Spaltennamen)</translation>
    </message>
    <message>
        <source>Cannot write %1: %2</source>
        <translation>%1 kann nicht geschrieben werden: %2</translation>
    </message>
    <message>
        <source>There is no trade study to copy yet: run one first.</source>
        <translation>Es gibt noch keine Parameterstudie zum Kopieren: zuerst eine rechnen.</translation>
    </message>
    <message>
        <source>Trade-study table copied as tab-separated text</source>
        <translation>Tabelle der Parameterstudie als tabulatorgetrennter Text kopiert</translation>
    </message>
    <message>
        <source>Performance table copied as tab-separated text</source>
        <translation>Leistungstabelle als tabulatorgetrennter Text kopiert</translation>
    </message>
</context>
<context>
    <name>cw::gui::WindowFiles</name>
    <message>
        <source>Cannot open case</source>
        <translation>Fall kann nicht geöffnet werden</translation>
    </message>
    <message>
        <source>Cannot save %1: %2</source>
        <translation>%1 kann nicht gespeichert werden: %2</translation>
    </message>
    <message>
        <source>Cannot save</source>
        <translation>Speichern nicht möglich</translation>
    </message>
    <message>
        <source>Saved %1</source>
        <translation>%1 gespeichert</translation>
    </message>
    <message>
        <source>Open Case</source>
        <translation>Fall öffnen</translation>
    </message>
    <message>
        <source>Cyclewright cases (*.json);;All files (*)</source>
        <translation>Cyclewright-Fälle (*.json);;Alle Dateien (*)</translation>
    </message>
    <message>
        <source>Save Case As</source>
        <translation>Fall speichern unter</translation>
    </message>
    <message>
        <source>Cyclewright cases (*.json)</source>
        <translation>Cyclewright-Fälle (*.json)</translation>
    </message>
    <message>
        <source>Unsaved changes</source>
        <translation>Ungespeicherte Änderungen</translation>
    </message>
    <message>
        <source>The case has unsaved changes. Save them first?</source>
        <translation>Der Fall hat ungespeicherte Änderungen. Zuerst speichern?</translation>
    </message>
    <message>
        <source>Untitled</source>
        <translation>Unbenannt</translation>
    </message>
    <message>
        <source>Not opened: %1</source>
        <translation>Nicht geöffnet: %1</translation>
    </message>
    <message>
        <source>The case shown is unchanged.</source>
        <translation>Der angezeigte Fall bleibt unverändert.</translation>
    </message>
    <message>
        <source>Baseline: %1</source>
        <translation>Basis: %1</translation>
    </message>
    <message>
        <source>Open Baseline</source>
        <translation>Basis öffnen</translation>
    </message>
    <message>
        <source>Baseline not opened: %1</source>
        <translation>Basis nicht geöffnet: %1</translation>
    </message>
    <message>
        <source>Cannot open baseline</source>
        <translation>Basis kann nicht geöffnet werden</translation>
    </message>
    <message>
        <source>The baseline is unchanged.</source>
        <translation>Die Basis bleibt unverändert.</translation>
    </message>
    <message>
        <source>Opened %1, read as a version %2 single-spool turbojet case; saving writes version %3</source>
        <translation>%1 geöffnet, gelesen als Fall der Version %2 (einwelliges Strahltriebwerk); Speichern schreibt Version %3</translation>
    </message>
    <message>
        <source>Opened %1 (%2)</source>
        <translation>%1 geöffnet (%2)</translation>
    </message>
    <message>
        <source>Save as version %1</source>
        <translation>Als Version %1 speichern</translation>
    </message>
    <message>
        <source>%1 is a version %2 case file. Saving writes it as version %3, which older versions of Cyclewright cannot read. Save anyway?</source>
        <translation>%1 ist eine Falldatei der Version %2. Beim Speichern wird sie als Version %3 geschrieben, die ältere Versionen von Cyclewright nicht lesen können. Trotzdem speichern?</translation>
    </message>
    <message>
        <source>Not saved: %1 is kept as version %2</source>
        <translation>Nicht gespeichert: %1 bleibt Version %2</translation>
    </message>
    <message>
        <source>%1[*] — %2 — Cyclewright</source>
        <translation>%1[*] — %2 — Cyclewright</translation>
    </message>
    <message>
        <source>New case: %1</source>
        <translation>Neuer Fall: %1</translation>
    </message>
</context>
</TS>
