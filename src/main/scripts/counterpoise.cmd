@echo off
rem Counterpoise launcher for Windows: runs counterpoise.jar (beside this file, or else the one
rem mvn package copies this file beside it in target) with the JVM options for a short run; see the POSIX script
rem "counterpoise" beside it and docs/cli.md. The wizard (no argument, or one .json project file)
rem keeps the JVM defaults.
rem COUNTERPOISE_JAVA_OPTIONS adds options of your own; JAVA_HOME picks the Java to run.
setlocal
set "JAR=%~dp0counterpoise.jar"
if not exist "%JAR%" set "JAR=%~dp0..\..\..\target\counterpoise.jar"
if not exist "%JAR%" (
  echo error: counterpoise.jar is not beside this file; build it with mvn package and run target\counterpoise.cmd 1>&2
  exit /b 1
)
set "JAVA=java"
if defined JAVA_HOME set "JAVA=%JAVA_HOME%\bin\java"
set "QUICK=-XX:TieredStopAtLevel=1 -XX:+UseSerialGC -Xshare:auto"
if "%~1"=="" set "QUICK=-Xshare:auto"
if "%~2"=="" if /i "%~x1"==".json" set "QUICK=-Xshare:auto"
"%JAVA%" %QUICK% %COUNTERPOISE_JAVA_OPTIONS% -jar "%JAR%" %*
exit /b %ERRORLEVEL%
