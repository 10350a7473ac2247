module github.com/gyprisk/gyprisk

go 1.26.8

require github.com/spf13/pflag v1.1.0

require (
	github.com/BurntSushi/toml v1.6.0
	github.com/jung-kurt/gofpdf v1.16.2
	github.com/mitchellh/colorstring v0.0.0-20190213212951-d06e56a500db // indirect
	github.com/rivo/uniseg v0.4.7 // indirect
	github.com/schollz/progressbar/v3 v3.19.1
	golang.org/x/image v0.48.0
	golang.org/x/sys v0.50.0 // indirect
	golang.org/x/term v0.44.0 // indirect
	gonum.org/v1/gonum v0.17.0
)
