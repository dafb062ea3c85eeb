@echo off
rem Beamfolio launcher for Windows: runs the jar beside this file with start-up options that suit
rem the command. The POSIX launcher `beamfolio` beside it gives the reasons for each option.
rem
rem One job: the quick compiler only, one compiler thread, a heap cap. A folder, several jobs or
rem watch: both compilers and a heap cap. A class-data archive, written by the first build into
rem %LOCALAPPDATA%\beamfolio (or BEAMFOLIO_CACHE) under a temporary name and moved into place, is
rem used only when its key file names this jar (size and time), this Java runtime and the
rem archive's own size, so a new jar or runtime or a damaged archive is never mapped.
rem
rem Environment: JAVA_HOME, BEAMFOLIO_CACHE, BEAMFOLIO_CDS=off, BEAMFOLIO_JAVA_OPTS.
setlocal EnableExtensions DisableDelayedExpansion

set "JAR=%~dp0beamfolio.jar"
if exist "%JAR%" goto jar_found
echo beamfolio: %JAR% is missing; build it with mvnw package 1>&2
exit /b 1
:jar_found

if not defined JAVA_HOME goto java_on_path
set "JAVA=%JAVA_HOME%\bin\java.exe"
if exist "%JAVA%" goto java_found
echo beamfolio: JAVA_HOME is %JAVA_HOME%, but %JAVA% does not exist; set JAVA_HOME to a Java 17 or newer, or unset it to use java on PATH 1>&2
exit /b 1
:java_on_path
set "JAVA="
for %%J in (java.exe) do set "JAVA=%%~$PATH:J"
if defined JAVA goto java_found
echo beamfolio: no Java found: install a Java 17 or newer and put it on PATH, or set JAVA_HOME 1>&2
exit /b 1
:java_found

rem the runtime's version from its release file; asking the runtime costs a second start
for %%D in ("%JAVA%\..\..") do set "RUNTIME=%%~fD"
set "VERSION="
set "BUILD="
if exist "%RUNTIME%\release" (
  for /f "usebackq tokens=1,* delims==" %%A in ("%RUNTIME%\release") do (
    if "%%A"=="JAVA_VERSION" set "VERSION=%%~B"
    if "%%A"=="JAVA_RUNTIME_VERSION" set "BUILD=%%~B"
  )
)
rem the first line of java -version reads: openjdk version "17.0.15" ...
if not defined VERSION (
  for /f "tokens=3" %%V in ('call "%JAVA%" -version 2^>^&1') do if not defined VERSION set "VERSION=%%~V"
)
set "BUILD=%BUILD%%VERSION%"
set "MAJOR="
set "MINOR="
for /f "tokens=1,2 delims=.-+_" %%A in ("%VERSION%") do (
  set "MAJOR=%%A"
  set "MINOR=%%B"
)
if "%MAJOR%"=="1" set "MAJOR=%MINOR%"
if not defined MAJOR goto too_old
set /a MAJOR_NUMBER=MAJOR 2>nul
if %MAJOR_NUMBER% GEQ 17 goto version_ok
:too_old
echo beamfolio: Beamfolio needs Java 17 or newer; %JAVA% is %VERSION%. Install a newer Java or set JAVA_HOME to one 1>&2
exit /b 1
:version_ok

rem one job is quick; a folder, several jobs or watch is long
set "COMMAND=%~1"
set "LONG="
set "JOBS=0"
if /i "%COMMAND%"=="watch" set "LONG=1"
if /i "%COMMAND%"=="build" goto count_jobs
if /i "%COMMAND%"=="check" goto count_jobs
goto counted
:count_jobs
shift
:next_argument
if "%~1"=="" goto counted
set "ARG=%~1"
if "%ARG%"=="--out" goto skip_value
if "%ARG%"=="--previous" goto skip_value
if "%ARG:~0,1%"=="-" goto next_shift
set /a JOBS+=1
if exist "%ARG%\*" set "LONG=1"
goto next_shift
:skip_value
shift
:next_shift
shift
goto next_argument
:counted
if %JOBS% GTR 1 set "LONG=1"

if defined LONG (
  set "OPTIONS=-Xmx256m"
) else (
  set "OPTIONS=-XX:TieredStopAtLevel=1 -XX:CICompilerCount=1 -Xmx256m"
)
set "OPTIONS=%OPTIONS% -XX:-UsePerfData -Xshare:auto -Xlog:disable -Xlog:all=error:stderr"

set "ARCHIVE_OPTION="
set "DUMP="
if /i "%BEAMFOLIO_CDS%"=="off" goto run
set "CACHE=%BEAMFOLIO_CACHE%"
if not defined CACHE set "CACHE=%LOCALAPPDATA%\beamfolio"
set "ARCHIVE=%CACHE%\beamfolio.jsa"
for %%F in ("%JAR%") do set "KEY=launcher 1; jar %%~fF %%~zF %%~tF; java %RUNTIME% %BUILD%"
for %%F in ("%RUNTIME%\lib\modules") do set "KEY=%KEY% %%~zF %%~tF"
set "RECORDED="
if exist "%ARCHIVE%.key" set /p RECORDED=<"%ARCHIVE%.key"
set "SIZE="
if exist "%ARCHIVE%" for %%F in ("%ARCHIVE%") do set "SIZE=%%~zF"
if not defined SIZE goto no_archive
if not "%RECORDED%"=="%KEY% size %SIZE%" goto no_archive
set "ARCHIVE_OPTION=-XX:SharedArchiveFile=%ARCHIVE%"
goto run
:no_archive
if /i not "%COMMAND%"=="build" goto run
if exist "%ARCHIVE%.none" goto run
if not exist "%CACHE%" mkdir "%CACHE%" 2>nul
if not exist "%CACHE%" goto run
set "DUMP=%ARCHIVE%.%RANDOM%%RANDOM%.part"
set "ARCHIVE_OPTION=-XX:ArchiveClassesAtExit=%DUMP%"

:run
if defined DUMP goto run_and_archive
if defined ARCHIVE_OPTION goto run_with_archive
"%JAVA%" %OPTIONS% %BEAMFOLIO_JAVA_OPTS% -jar "%JAR%" %*
exit /b %ERRORLEVEL%
:run_with_archive
"%JAVA%" %OPTIONS% "%ARCHIVE_OPTION%" %BEAMFOLIO_JAVA_OPTS% -jar "%JAR%" %*
exit /b %ERRORLEVEL%

:run_and_archive
"%JAVA%" %OPTIONS% "%ARCHIVE_OPTION%" %BEAMFOLIO_JAVA_OPTS% -jar "%JAR%" %*
set "STATUS=%ERRORLEVEL%"
if not "%STATUS%"=="0" if not "%STATUS%"=="3" goto archive_done
for %%F in ("%DUMP%") do set "DUMP_SIZE=%%~zF"
if not exist "%DUMP%" (
  type nul > "%ARCHIVE%.none" 2>nul
  goto archive_done
)
if "%DUMP_SIZE%"=="0" goto archive_done
> "%DUMP%.key" echo %KEY% size %DUMP_SIZE%
move /y "%DUMP%" "%ARCHIVE%" >nul 2>&1 && move /y "%DUMP%.key" "%ARCHIVE%.key" >nul 2>&1
:archive_done
if exist "%DUMP%" del /q "%DUMP%" 2>nul
if exist "%DUMP%.key" del /q "%DUMP%.key" 2>nul
exit /b %STATUS%
