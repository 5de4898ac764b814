package main

import (
	"os"
	"runtime"
	"runtime/pprof"
)

// startProfiles starts the CPU profile -cpuprofile asks for; the function
// it returns stops it and writes the heap profile -memprofile asks for,
// while what the run loaded is still live.
func startProfiles() (stop func() error, err error) {
	var cpu *os.File
	if *profileFlag != "" {
		if cpu, err = os.Create(*profileFlag); err != nil {
			return nil, err
		}
		if err := pprof.StartCPUProfile(cpu); err != nil {
			cpu.Close()
			return nil, err
		}
	}
	return func() error {
		if cpu != nil {
			pprof.StopCPUProfile()
			if err := cpu.Close(); err != nil {
				return err
			}
		}
		if *memProfFlag == "" {
			return nil
		}
		f, err := os.Create(*memProfFlag)
		if err != nil {
			return err
		}
		runtime.GC()
		if err := pprof.Lookup("heap").WriteTo(f, 0); err != nil {
			f.Close()
			return err
		}
		return f.Close()
	}, nil
}
