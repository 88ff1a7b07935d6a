@echo off
rem mesolint launcher of the release archive: runs the command-line jar beside it with Java 17 or newer.
set "JAVA=java"
if defined JAVA_HOME set "JAVA=%JAVA_HOME%\bin\java"
"%JAVA%" -XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:NewRatio=1 -XX:MaxTenuringThreshold=0 -jar "%~dp0..\lib\mesolint.jar" %*
