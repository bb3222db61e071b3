import { provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';

import { fieldOverlaps } from '../../../ui/testing/field-overlaps';
import { ChangePassword } from './change-password';

describe('ChangePassword', () => {
  beforeEach(() => TestBed.configureTestingModule({ providers: [provideHttpClient()] }));

  it('keeps the two password fields apart, with their hints and errors showing', async () => {
    const fixture = TestBed.createComponent(ChangePassword);
    const element: HTMLElement = fixture.nativeElement;
    element.style.display = 'block';
    element.style.width = '360px';
    await fixture.whenStable();
    element.querySelector<HTMLButtonElement>('button[type="submit"]')!.click(); // both show "… is required"
    await fixture.whenStable();
    expect(element.querySelectorAll('mat-error').length).toBe(2);
    expect(element.querySelectorAll('mat-form-field').length).toBe(2);
    expect(fieldOverlaps(element, 8)).toEqual([]);
  });
});
