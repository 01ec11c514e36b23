package pdf

import (
	"runtime"
	"sync"
)

// zipPool compresses the page streams on every core while the painter
// draws the next pages. Each page is compressed alone by one
// reused compressor, so the bytes do not depend on which worker did it.
type zipPool struct {
	out  [][]byte
	jobs chan zipJob
	free chan []byte // drawn streams' buffers, for the next pages
	wg   sync.WaitGroup
	once sync.Once
	mu   sync.Mutex
	err  error
}

type zipJob struct {
	page int
	data []byte
	body *bodyStream // the page's body painted ahead, to follow data; nil: none
}

func newZipPool(pages int) *zipPool {
	// compressing a page takes about twice as long as painting it, so
	// every core compresses (the painter shares one)
	workers := max(1, runtime.GOMAXPROCS(0))
	zp := &zipPool{out: make([][]byte, pages), jobs: make(chan zipJob, 2*workers), free: make(chan []byte, 3*workers)}
	for range workers {
		zp.wg.Add(1)
		go func() {
			defer zp.wg.Done()
			z := newZipper()
			for j := range zp.jobs {
				var s []byte
				var err error
				if j.body != nil {
					s, err = z.join(j.data, j.body)
					j.body.z = nil // in s now
				} else {
					s, err = z.compress(j.data)
				}
				zp.out[j.page] = s
				if err != nil {
					zp.mu.Lock()
					zp.err = err
					zp.mu.Unlock()
				}
				select {
				case zp.free <- j.data[:0]:
				default:
				}
			}
		}()
	}
	return zp
}

// buffer is an empty buffer for the next page's stream.
func (zp *zipPool) buffer() []byte {
	select {
	case b := <-zp.free:
		return b
	default:
		return make([]byte, 0, 64<<10)
	}
}

// add queues page's stream (its furniture when b, the body painted
// ahead, is not nil); the pool owns data from here on.
func (zp *zipPool) add(page int, data []byte, b *bodyStream) { zp.jobs <- zipJob{page, data, b} }

// close ends the workers once the queue is done.
func (zp *zipPool) close() {
	zp.once.Do(func() {
		close(zp.jobs)
		zp.wg.Wait()
	})
}

// streams waits for every page and returns the compressed streams (nil
// for a page with none).
func (zp *zipPool) streams() ([][]byte, error) {
	zp.close()
	return zp.out, zp.err
}
