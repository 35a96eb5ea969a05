<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de_DE">
<context>
    <name>cw::gui::MainWindow</name>
    <message>
        <source>Cyclewright</source>
        <translation>Cyclewright</translation>
    </message>
    <message>
        <source>Ready</source>
        <translation>Bereit</translation>
    </message>
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
        <source>Temperature-entropy chart</source>
        <translation>Temperatur-Entropie-Diagramm</translation>
    </message>
    <message>
        <source>Specific entropy s [J/(kg·K)], zero at the free-stream static state</source>
        <translation>Spezifische Entropie s [J/(kg·K)], null im statischen Zustand der Anströmung</translation>
    </message>
    <message>
        <source>Temperature T [K]</source>
        <translation>Temperatur T [K]</translation>
    </message>
    <message>
        <source>Cannot open %1: %2</source>
        <translation>%1 kann nicht geöffnet werden: %2</translation>
    </message>
    <message>
        <source>%1 is not a Cyclewright case file</source>
        <translation>%1 ist keine Cyclewright-Falldatei</translation>
    </message>
    <message>
        <source>%1 — Cyclewright</source>
        <translation>%1 — Cyclewright</translation>
    </message>
    <message>
        <source>Opened %1</source>
        <translation>%1 geöffnet</translation>
    </message>
    <message>
        <source>Results are conceptual-design estimates. For anything that affects flight safety, defer to the engine manufacturer&apos;s data, your organisation&apos;s procedures and licensed engineering practice.</source>
        <translation>Die Ergebnisse sind Schätzungen für den Konzeptentwurf. Für alles, was die Flugsicherheit berührt, gelten die Daten des Triebwerksherstellers, die Verfahren Ihrer Organisation und die zugelassene Ingenieurpraxis.</translation>
    </message>
    <message>
        <source>About Cyclewright</source>
        <translation>Über Cyclewright</translation>
    </message>
    <message>
        <source>&lt;b&gt;Cyclewright %1&lt;/b&gt;&lt;br&gt;A gas-turbine cycle explorer for conceptual design.</source>
        <translation>&lt;b&gt;Cyclewright %1&lt;/b&gt;&lt;br&gt;Ein Werkzeug zur Untersuchung von Gasturbinen-Kreisprozessen im Konzeptentwurf.</translation>
    </message>
</context>
</TS>
